import { useState } from 'react';
import type { SearchHit } from '@shared/schemas/search';
import { useDebounce } from 'use-debounce';
import { PartSearchBox, SEARCH_PAUSE_MS } from '@/features/parts/components/part-search-box';
import { useSearchCoils } from '../api/search-coils';

export function CoilSearch({ onPick }: { onPick: (hit: SearchHit) => void }) {
  const [q, setQ] = useState('');
  const [debounced] = useDebounce(q, SEARCH_PAUSE_MS);
  const search = useSearchCoils(debounced);
  const active = debounced.trim().length >= 2;
  return (
    <PartSearchBox
      label="Find the coil"
      placeholder="e.g. QW-IC 3101, or any brand's number"
      value={q}
      onChange={setQ}
      hits={active ? (search.data ?? []) : []}
      searched={active && search.isSuccess && !search.isPlaceholderData}
      error={search.error}
      noneText="No coils match."
      onPick={onPick}
    />
  );
}
