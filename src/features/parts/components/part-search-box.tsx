import { useId, useRef, type KeyboardEvent } from 'react';
import type { SearchHit } from '@shared/schemas/search';

/** How long typing pauses before a picker's search box asks: once per pause, not per key. */
export const SEARCH_PAUSE_MS = 200;

/**
 * A search box with its hits, keyboard-operable: ↓ from the box into the list, ↑ ↓ within it,
 * Enter picks (Enter in the box picks the first hit). The feature using it owns the query.
 */
export function PartSearchBox({
  label,
  placeholder,
  value,
  onChange,
  hits,
  searched,
  error,
  noneText,
  onPick,
}: {
  label: string;
  placeholder?: string;
  value: string;
  onChange: (q: string) => void;
  hits: readonly SearchHit[];
  /** An answer for the current words has arrived (so "no match" can be said). */
  searched: boolean;
  error: Error | null;
  noneText: string;
  onPick: (hit: SearchHit) => void;
}) {
  const id = useId();
  const list = useRef<HTMLUListElement>(null);
  const buttons = () => Array.from(list.current?.querySelectorAll<HTMLButtonElement>('button') ?? []);
  const focusHit = (index: number) => {
    const all = buttons();
    all[Math.max(0, Math.min(index, all.length - 1))]?.focus();
  };
  const onInputKey = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'ArrowDown') {
      e.preventDefault();
      focusHit(0);
    } else if (e.key === 'Enter' && hits[0]) {
      e.preventDefault();
      onPick(hits[0]);
    }
  };
  const onListKey = (e: KeyboardEvent<HTMLUListElement>) => {
    const at = buttons().indexOf(document.activeElement as HTMLButtonElement);
    if (e.key === 'ArrowDown') {
      e.preventDefault();
      focusHit(at + 1);
    } else if (e.key === 'ArrowUp') {
      e.preventDefault();
      if (at <= 0) document.getElementById(id)?.focus();
      else focusHit(at - 1);
    }
  };
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="text-xs font-semibold uppercase tracking-wide text-ink-soft">
        {label}
      </label>
      <input
        id={id}
        type="search"
        value={value}
        onChange={(e) => onChange(e.target.value)}
        onKeyDown={onInputKey}
        placeholder={placeholder}
        autoComplete="off"
        className="w-full rounded-md border border-ink/20 bg-paper-raised px-2.5 py-1.5 text-[15px] text-ink placeholder:text-ink-faint focus:border-accent"
      />
      {error && <p className="text-sm text-nogo">Search failed: {error.message}</p>}
      {searched && !error && hits.length === 0 && <p className="text-sm text-ink-soft">{noneText}</p>}
      {hits.length > 0 && (
        <ul
          ref={list}
          onKeyDown={onListKey}
          aria-label={`${label}: results`}
          className="flex max-h-72 flex-col overflow-y-auto rounded-md border border-ink/15"
        >
          {hits.map((h) => (
            <li key={h.partId} className="border-b border-ink/10 last:border-b-0">
              <button
                type="button"
                onClick={() => onPick(h)}
                className="flex w-full flex-col items-start px-2.5 py-1.5 text-left hover:bg-accent-soft focus:bg-accent-soft"
              >
                <span className="text-[15px] font-semibold text-ink">
                  {h.brand} {h.partNumber}
                  {!h.hasSpec && <span className="ml-2 text-xs font-normal text-review">no spec on file</span>}
                </span>
                <span className="text-sm text-ink-soft">{h.description}</span>
              </button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
