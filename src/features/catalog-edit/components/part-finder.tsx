import { useState } from 'react';
import type { SearchHit } from '@shared/schemas/search';
import type { PartKind } from '@shared/schemas/specs';
import { useDebounce } from 'use-debounce';
import { PartSearchBox, SEARCH_PAUSE_MS } from '@/features/parts/components/part-search-box';
import { MIN_SEARCH_CHARS, useSearchParts } from '../api/search-parts';

/**
 * Finds a part of our lines by any number — ours, another brand's, a superseded one — or words.
 * ↓ from the box into the hits, Enter picks. `kind` keeps the hits to coils or plugs; `exclude`
 * drops one part (a part cannot be superseded by itself).
 */
export function PartFinder({
  label,
  placeholder,
  kind = null,
  exclude,
  onPick,
}: {
  label: string;
  placeholder?: string;
  kind?: PartKind | null;
  exclude?: string;
  onPick: (hit: SearchHit) => void;
}) {
  const [q, setQ] = useState('');
  const [settled] = useDebounce(q, SEARCH_PAUSE_MS);
  const search = useSearchParts(settled, kind);
  const active = settled.trim().length >= MIN_SEARCH_CHARS;
  const found = active ? (search.data ?? []) : [];
  const hits = found.filter((h) => h.partId !== exclude);
  // Search follows supersession to the current part, so an older number can lead back here.
  const onlyItself = found.length > 0 && hits.length === 0;
  return (
    <PartSearchBox
      label={label}
      placeholder={placeholder}
      value={q}
      onChange={setQ}
      hits={hits}
      searched={active && search.isSuccess && !search.isPlaceholderData}
      error={search.error}
      noneText={
        onlyItself
          ? 'Only this part itself matches (by its own number or one it supersedes).'
          : kind
            ? `No ${kind}s of our lines match.`
            : 'No part of our lines matches.'
      }
      onPick={onPick}
    />
  );
}
