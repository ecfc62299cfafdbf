import type { KeyboardEvent, Ref } from 'react';
import { TextField } from '@/components/ui/field';

/**
 * The Counter's one search box. Enter searches at once (a barcode scanner types the GTIN and
 * Enter), ↓ moves into the results, Escape clears; "/" anywhere on the page comes back here.
 */
export function SearchBox({
  value,
  onChange,
  onSubmit,
  onArrowDown,
  busy,
  inputRef,
}: {
  value: string;
  onChange: (value: string) => void;
  onSubmit: () => void;
  onArrowDown: () => void;
  busy: boolean;
  inputRef?: Ref<HTMLInputElement>;
}) {
  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'Enter') {
      e.preventDefault();
      onSubmit();
    } else if (e.key === 'ArrowDown') {
      e.preventDefault();
      onArrowDown();
    } else if (e.key === 'Escape' && value !== '') {
      e.preventDefault();
      onChange('');
    }
  };
  return (
    <div className="flex flex-col gap-1">
      <TextField
        ref={inputRef}
        label="Number, words or barcode"
        type="search"
        autoFocus
        autoComplete="off"
        spellCheck={false}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        onKeyDown={onKeyDown}
        placeholder="Press / to search · SPF 52.135 · scan"
        aria-keyshortcuts="/"
        aria-busy={busy || undefined}
        className="!py-2.5 font-mono !text-xl"
      />
      <p className="text-sm text-ink-soft">
        Any brand&apos;s number, any spacing. Enter searches at once; ↓ goes to the results; / comes back here.
      </p>
    </div>
  );
}
