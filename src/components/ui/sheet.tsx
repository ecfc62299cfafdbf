import * as D from '@radix-ui/react-dialog';
import type { ReactNode } from 'react';

/**
 * A panel over the page, on Radix UI's Dialog: from the right on a wide screen, from the bottom
 * on a phone, always in view when it opens (it is fixed to the viewport, not placed in the page's
 * flow), focus held inside until it closes and returned to what opened it.
 */
export interface SheetProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  title: ReactNode;
  description?: ReactNode;
  children: ReactNode;
}

export function Sheet({ open, onOpenChange, title, description, children }: SheetProps) {
  return (
    <D.Root open={open} onOpenChange={onOpenChange}>
      <D.Portal>
        <D.Overlay className="fixed inset-0 z-40 bg-ink/30" />
        <D.Content
          {...(description ? {} : { 'aria-describedby': undefined })}
          className="sheet fixed inset-x-0 bottom-0 z-50 flex max-h-[88dvh] flex-col rounded-t-xl border border-ink/10 bg-paper-raised shadow-xl sm:inset-y-0 sm:right-0 sm:left-auto sm:max-h-none sm:w-[min(40rem,92vw)] sm:rounded-none sm:rounded-l-xl"
        >
          <header className="flex items-start justify-between gap-3 border-b border-ink/10 px-4 py-3">
            <div className="min-w-0">
              <D.Title className="text-lg font-semibold text-ink">{title}</D.Title>
              {description && <D.Description className="text-sm text-ink-soft">{description}</D.Description>}
            </div>
            <D.Close className="rounded-md px-2 py-1 text-sm font-medium text-ink-soft hover:bg-paper-sunk">
              Close<span aria-hidden="true"> ×</span>
            </D.Close>
          </header>
          <div className="min-h-0 flex-1 overflow-y-auto p-4">{children}</div>
        </D.Content>
      </D.Portal>
    </D.Root>
  );
}
