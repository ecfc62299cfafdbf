import { useId, useRef, useState } from 'react';
import { Button } from '@/components/ui/button';

/** The report's unguessable read-only link, with a copy button. */
export function ShareLink({ url }: { url: string }) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const [copied, setCopied] = useState<'yes' | 'select' | null>(null);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(url);
      setCopied('yes');
    } catch {
      // No clipboard permission (plain http, an old browser): leave the link selected to copy by hand.
      input.current?.select();
      setCopied('select');
    }
  };
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-semibold uppercase tracking-wide text-ink-soft">
        Share link (read-only, no sign-in)
      </label>
      <div className="flex gap-2">
        <input
          id={id}
          ref={input}
          readOnly
          value={url}
          onFocus={(e) => e.target.select()}
          className="w-full min-w-0 rounded-md border border-ink/20 bg-paper-sunk px-2.5 py-1.5 font-mono text-sm text-ink"
        />
        <Button variant="secondary" onClick={() => void copy()} className="shrink-0 whitespace-nowrap">
          Copy link
        </Button>
      </div>
      <p role="status" className="min-h-4 text-xs text-ink-soft">
        {copied === 'yes' ? 'Copied.' : copied === 'select' ? 'Selected: press Ctrl+C to copy.' : ''}
      </p>
    </div>
  );
}
