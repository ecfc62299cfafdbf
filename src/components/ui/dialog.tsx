import * as D from '@radix-ui/react-dialog';
import { useState, type ReactElement, type ReactNode } from 'react';
import { Button } from './button';
import { ErrorNote } from './panel';

/**
 * Dialogs on Radix UI's Dialog: focus moves in and is held there, Escape and Cancel close,
 * and focus returns to what opened it. Give `trigger` (a button) or drive `open` yourself.
 */

export interface DialogProps {
  title: ReactNode;
  /** One sentence under the title, read out when the dialog opens. */
  description?: ReactNode;
  open?: boolean;
  onOpenChange?: (open: boolean) => void;
  /** The element that opens it (a Button): focus returns to it on close. */
  trigger?: ReactElement;
  children?: ReactNode;
  /** The buttons, right-aligned under the content. */
  footer?: ReactNode;
}

export function Dialog({ title, description, open, onOpenChange, trigger, children, footer }: DialogProps) {
  return (
    <D.Root open={open} onOpenChange={onOpenChange}>
      {trigger && <D.Trigger asChild>{trigger}</D.Trigger>}
      <D.Portal>
        {/* Above a Sheet (z-50): a dialog opened from the part panel dims the panel too. */}
        <D.Overlay className="fixed inset-0 z-60 bg-ink/40" />
        <D.Content
          {...(description ? {} : { 'aria-describedby': undefined })}
          className="fixed top-1/2 left-1/2 z-60 max-h-[calc(100dvh-2rem)] w-[min(32rem,calc(100vw-2rem))] -translate-x-1/2 -translate-y-1/2 overflow-y-auto rounded-lg border border-ink/10 bg-paper-raised p-5 shadow-xl"
        >
          <D.Title className="text-lg font-semibold text-ink">{title}</D.Title>
          {description && <D.Description className="mt-1 text-[15px] text-ink-soft">{description}</D.Description>}
          {children && <div className="mt-3 text-[15px] text-ink">{children}</div>}
          {footer && <div className="mt-5 flex flex-wrap justify-end gap-2">{footer}</div>}
        </D.Content>
      </D.Portal>
    </D.Root>
  );
}

export interface ConfirmDialogProps extends Omit<DialogProps, 'footer'> {
  /** The button's words: the action itself ("Commit 1,204 prices"), never just "OK". */
  confirmLabel: string;
  cancelLabel?: string;
  /** 'danger' for what cannot be undone or takes something away. */
  tone?: 'primary' | 'danger';
  /** Runs the action. A promise (a mutation's mutateAsync) keeps the dialog open until it settles; a failure is shown in it. */
  onConfirm: () => unknown;
}

/**
 * "Are you sure" with the facts: the title says what, the children say what will happen with
 * the counts, Cancel is focused first so Enter never confirms by accident.
 */
export function ConfirmDialog({
  confirmLabel,
  cancelLabel = 'Cancel',
  tone = 'primary',
  onConfirm,
  open,
  onOpenChange,
  ...props
}: ConfirmDialogProps) {
  const [ownOpen, setOwnOpen] = useState(false);
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<unknown>(null);
  const isOpen = open ?? ownOpen;
  const setOpen = (next: boolean) => {
    if (pending) return;
    if (!next) setError(null);
    setOwnOpen(next);
    onOpenChange?.(next);
  };
  const confirm = async () => {
    setPending(true);
    setError(null);
    try {
      await onConfirm();
      setPending(false);
      setOwnOpen(false);
      onOpenChange?.(false);
    } catch (e) {
      setPending(false);
      setError(e);
    }
  };
  return (
    <Dialog
      {...props}
      open={isOpen}
      onOpenChange={setOpen}
      footer={
        <>
          {error ? (
            <div className="w-full">
              <ErrorNote error={error} />
            </div>
          ) : null}
          <Button variant="secondary" onClick={() => setOpen(false)} disabled={pending}>
            {cancelLabel}
          </Button>
          <Button
            variant={tone === 'danger' ? 'danger' : 'primary'}
            onClick={() => void confirm()}
            disabled={pending}
            aria-busy={pending || undefined}
          >
            {confirmLabel}
          </Button>
        </>
      }
    />
  );
}
