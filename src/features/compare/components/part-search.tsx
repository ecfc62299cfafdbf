import { useState } from 'react';
import type { PartKind } from '@shared/schemas/specs';
import type { SearchHit } from '@shared/schemas/search';
import { useDebounce } from 'use-debounce';
import { PartSearchBox, SEARCH_PAUSE_MS } from '@/features/parts/components/part-search-box';
import { useSearchParts } from '../api/search-parts';

/** The catalog's parts of one kind, by any brand's number or words. */
export function PartSearch({ kind, label, onPick }: { kind: PartKind; label: string; onPick: (hit: SearchHit) => void }) {
  const [q, setQ] = useState('');
  const [debounced] = useDebounce(q, SEARCH_PAUSE_MS);
  const search = useSearchParts(kind, debounced);
  const active = debounced.trim().length >= 2;
  return (
    <PartSearchBox
      label={label}
      placeholder={kind === 'coil' ? 'e.g. QW-IC 3102, or coil-on-plug 3-pin' : 'e.g. NR/IR 4406, or iridium'}
      value={q}
      onChange={setQ}
      hits={active ? (search.data ?? []) : []}
      searched={active && search.isSuccess && !search.isPlaceholderData}
      error={search.error}
      noneText={`No ${kind}s match.`}
      onPick={onPick}
    />
  );
}
