import { useEffect, useMemo, useRef, useState } from 'react';
import { useDebounce } from 'use-debounce';
import type { PartKind } from '@shared/schemas/specs';
import { useUser } from '@/app/use-user';
import { Button } from '@/components/ui/button';
import { ErrorNote, PageHeader, Panel } from '@/components/ui/panel';
import { isEmptySearch, useSearchParts, type PartSearch, type SpecFilters as Filters } from '@/features/counter/api/search-parts';
import { KindChoice } from '@/features/counter/components/kind-choice';
import { ResultsTable, type ResultsTableHandle } from '@/features/counter/components/results-table';
import { SearchBox } from '@/features/counter/components/search-box';
import { SpecFilters } from '@/features/counter/components/spec-filters';
import { orderHits } from '@/features/counter/order-hits';
import { useSlashToSearch } from '@/features/counter/use-slash-to-search';
import { PartSheet } from '@/features/parts/components/part-sheet';
import { AskForPart } from '@/features/transfers/components/ask-for-part';
import { EngineFitments } from '@/features/vehicles/components/engine-fitments';
import { PartVerdict } from '@/features/vehicles/components/part-verdict';
import { NO_VEHICLE, VehiclePicker, vehicleName, type VehicleChoice } from '@/features/vehicles/components/vehicle-picker';

const RESULT_LIMIT = 50;
const TYPING_PAUSE_MS = 150;

function ResultsSummary({ shown, total, fetching }: { shown: number; total: number; fetching: boolean }) {
  return (
    <span className="text-sm text-ink-soft" role="status">
      {fetching ? 'searching… ' : ''}
      {total > shown ? `first ${shown} of ${total}` : `${total} found`}
    </span>
  );
}

/**
 * The search workspace: one box for any number, words or a barcode; a vehicle picker; spec
 * filters; the results. The chosen part opens in a sheet over them, in view on a phone too.
 */
export function CounterPage() {
  const user = useUser();
  const [text, setText] = useState('');
  // The search follows typing at a calm pace; Enter (or a barcode scanner's Enter) flushes it at once.
  const [settledText, typing] = useDebounce(text, TYPING_PAUSE_MS);
  const [kind, setKind] = useState<PartKind | null>(null);
  const [filters, setFilters] = useState<Filters>({});
  const [vehicle, setVehicle] = useState<VehicleChoice>(NO_VEHICLE);
  const [openPartId, setOpenPartId] = useState<string | null>(null);
  // Set by Enter: when that search finds exactly one part (a scanned barcode), it opens.
  const [openIfSingle, setOpenIfSingle] = useState<string | null>(null);
  const table = useRef<ResultsTableHandle>(null);
  const searchInput = useRef<HTMLInputElement>(null);
  useSlashToSearch(searchInput);

  const engineId = vehicle.engine?.id ?? null;
  const search = useMemo<PartSearch>(
    () => ({ q: settledText, kind, filters, limit: RESULT_LIMIT, engineId }),
    [settledText, kind, filters, engineId],
  );
  const results = useSearchParts(search);
  // Facet counts from the same words and kind without the spec filters, so no choice disappears.
  const facetSearch = useMemo<PartSearch>(
    () =>
      kind ? { q: settledText, kind, filters: {}, limit: 1, facets: true } : { q: '', kind: null, filters: {}, limit: 1, facets: true },
    [settledText, kind],
  );
  const facets = useSearchParts(facetSearch);

  useEffect(() => {
    if (openIfSingle === null || openIfSingle !== settledText || !results.data || results.isPlaceholderData) return;
    const [only, ...rest] = results.data.hits;
    if (only && rest.length === 0) setOpenPartId(only.partId);
    setOpenIfSingle(null);
  }, [openIfSingle, settledText, results.data, results.isPlaceholderData]);

  const chooseKind = (next: PartKind | null) => {
    setKind(next);
    setFilters({});
  };

  const searching = !isEmptySearch(search);
  const hits = useMemo(() => orderHits(results.data?.hits ?? []), [results.data]);
  const firstName = user.name.split(' ')[0] ?? user.name;
  const canAskStores = user.role !== 'technician' && user.homeLocationId !== null;

  return (
    <>
      <PageHeader title="Counter">
        <p className="text-sm text-ink-soft">Good to see you, {firstName}.</p>
      </PageHeader>
      <div className="flex min-w-0 flex-col gap-4">
        <div className="grid grid-cols-1 items-start gap-4 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
          <Panel title="Find a part">
            <div className="flex flex-col gap-3">
              <SearchBox
                inputRef={searchInput}
                value={text}
                onChange={setText}
                onSubmit={() => {
                  typing.flush();
                  setOpenIfSingle(text);
                }}
                onArrowDown={() => table.current?.focusSelected()}
                busy={results.isFetching}
              />
              <KindChoice value={kind} onChange={chooseKind} />
              {kind ? (
                <SpecFilters kind={kind} filters={filters} facets={facets.data?.facets} onChange={setFilters} />
              ) : (
                <p className="text-sm text-ink-faint">Choose coils or plugs to search by spec.</p>
              )}
            </div>
          </Panel>
          <Panel
            title="By vehicle"
            actions={
              vehicle.year !== null && (
                <Button variant="ghost" className="!py-0.5" onClick={() => setVehicle(NO_VEHICLE)}>
                  Clear
                </Button>
              )
            }
          >
            <VehiclePicker value={vehicle} onChange={setVehicle} />
          </Panel>
        </div>

        {searching && (
          <Panel
            title="Results"
            actions={results.data && <ResultsSummary shown={hits.length} total={results.data.total} fetching={results.isFetching} />}
          >
            <ErrorNote error={results.error} />
            {results.isPending && <p className="text-ink-faint">Searching…</p>}
            {results.data && hits.length === 0 && <p className="text-ink-soft">Nothing matches. Try fewer words or fewer filters.</p>}
            {hits.length > 0 && (
              <ResultsTable
                ref={table}
                hits={hits}
                query={search.q}
                openPartId={openPartId}
                onOpen={setOpenPartId}
                onLeaveTop={() => searchInput.current?.focus()}
              />
            )}
            {hits.length > 0 && (
              <p className="mt-2 hidden text-sm text-ink-faint sm:block">↑ ↓ move, Enter opens the part, / goes back to the search box.</p>
            )}
          </Panel>
        )}

        {vehicle.engine && (
          <Panel title={`Fits ${vehicleName(vehicle)} · ${vehicle.engine.code}`}>
            <EngineFitments engineId={vehicle.engine.id} openPartId={openPartId} onOpenPart={setOpenPartId} />
          </Panel>
        )}
      </div>

      <PartSheet
        partId={openPartId}
        engineId={engineId}
        typed={settledText}
        verdict={(part) => <PartVerdict part={part} engineId={engineId} onOpenPart={setOpenPartId} />}
        onOpenPart={setOpenPartId}
        onClose={() => setOpenPartId(null)}
        stockActions={({ part, stock }) =>
          // Only the store's staff with a home store ask for parts: the transfer comes to that store.
          canAskStores && 'here' in stock ? <AskForPart part={part} elsewhere={stock.elsewhere} /> : null
        }
      />
    </>
  );
}
