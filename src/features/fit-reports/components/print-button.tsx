import { Button } from '@/components/ui/button';

/** Prints the report; the print styles leave out the navigation and the controls. */
export function PrintButton() {
  return (
    <Button variant="secondary" onClick={() => window.print()} className="print:hidden">
      <svg aria-hidden viewBox="0 0 20 20" className="h-4 w-4" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinejoin="round">
        <path d="M5 7V2.5h10V7M5 14H3V8h14v6h-2M6 11.5h8V17.5H6z" />
      </svg>
      Print
    </Button>
  );
}
