import { useEffect, type RefObject } from 'react';

const NOT_TEXT = new Set(['checkbox', 'radio', 'button', 'submit', 'reset']);

/** Where a typed "/" is text, not a command: a form control, an editable region, an open dialog. */
function typingOrInDialog(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable || target.closest('[role="dialog"]')) return true;
  if (target instanceof HTMLInputElement) return !NOT_TEXT.has(target.type);
  return target instanceof HTMLTextAreaElement || target instanceof HTMLSelectElement;
}

/**
 * "/" brings the keyboard back to the search box from anywhere on the page (the results, the
 * vehicle picker's surroundings, a link), as on many sites with one main search; not while typing
 * in another field, and not inside the part sheet, which holds the focus until it is closed.
 */
export function useSlashToSearch(input: RefObject<HTMLInputElement | null>): void {
  useEffect(() => {
    const onKeyDown = (e: KeyboardEvent) => {
      if (e.key !== '/' || e.ctrlKey || e.metaKey || e.altKey || e.defaultPrevented || typingOrInDialog(e.target)) return;
      e.preventDefault();
      input.current?.focus();
      input.current?.select();
    };
    document.addEventListener('keydown', onKeyDown);
    return () => document.removeEventListener('keydown', onKeyDown);
  }, [input]);
}
