import { useSearchParams } from 'react-router-dom';
import type { Role } from '@shared/roles';
import { useUser } from '@/app/use-user';
import { ErrorNote, PageHeader, Panel } from '@/components/ui/panel';
import { Tabs, type TabItem } from '@/components/ui/tabs';
import { useBrands } from '@/features/catalog-edit/api/get-brands';
import { BrandForm } from '@/features/catalog-edit/components/brand-form';
import { BrandList } from '@/features/catalog-edit/components/brand-list';
import { NewPartForm } from '@/features/catalog-edit/components/new-part-form';
import { PartEditor } from '@/features/catalog-edit/components/part-editor';
import { PartFinder } from '@/features/catalog-edit/components/part-finder';

type View = 'parts' | 'new' | 'brands';
const TABS: readonly TabItem<View>[] = [
  { value: 'parts', label: 'Parts' },
  { value: 'new', label: 'New part' },
  { value: 'brands', label: 'Brands' },
];
// As the API's route table has it for every catalog edit.
const EDITORS: readonly Role[] = ['buyer', 'admin'];
const isView = (v: string | null): v is View => TABS.some((t) => t.value === v);

function PartsView({ partId, open }: { partId: string | null; open: (id: string | null) => void }) {
  return (
    <div className="grid grid-cols-[minmax(0,1fr)] items-start gap-4 xl:grid-cols-[20rem_minmax(0,1fr)]">
      <div className="xl:sticky xl:top-4">
        <Panel title="Find a part">
          <div className="flex flex-col gap-2">
            <PartFinder label="Number or words" placeholder="e.g. QW-SP 1406 or iridium" onPick={(hit) => open(hit.partId)} />
            <p className="text-xs text-ink-faint">Finds parts of our lines by any brand&rsquo;s number. ↓ into the hits, Enter opens.</p>
          </div>
        </Panel>
      </div>
      {partId ? (
        <PartEditor partId={partId} onOpenPart={open} onClose={() => open(null)} />
      ) : (
        <Panel title="Part">
          <p className="text-[15px] text-ink-soft">
            Open a part to change its description, status, GTIN or spec, set what supersedes it, or add another brand&rsquo;s number that
            leads to it. A part not yet in the catalog goes in under New part.
          </p>
        </Panel>
      )}
    </div>
  );
}

/** Catalog upkeep for buyers and admins: parts, their specs and cross-references, and brands with their heat tables. */
export function CatalogPage() {
  const user = useUser();
  const [params, setParams] = useSearchParams();
  const brands = useBrands();
  const partId = params.get('part');
  const asked = params.get('view');
  const view: View = isView(asked) ? asked : 'parts';

  const go = (next: { view?: View; part?: string | null }) =>
    setParams((prev) => {
      const p = new URLSearchParams(prev);
      if (next.view) {
        if (next.view === 'parts') p.delete('view');
        else p.set('view', next.view);
      }
      if (next.part !== undefined) {
        if (next.part) p.set('part', next.part);
        else p.delete('part');
      }
      return p;
    });
  const openPart = (id: string | null) => go({ view: 'parts', part: id });

  if (!EDITORS.includes(user.role)) {
    return (
      <>
        <PageHeader title="Catalog" />
        <Panel>
          <p className="text-ink-soft">Catalog edits are for buyers and admins.</p>
        </Panel>
      </>
    );
  }

  return (
    <>
      <PageHeader title="Catalog">
        <p className="text-sm text-ink-soft">Every save goes straight to the Counter&rsquo;s search.</p>
      </PageHeader>
      <Tabs label="Catalog" items={TABS} value={view} onValueChange={(v) => go({ view: v })}>
        {view === 'parts' && <PartsView partId={partId} open={openPart} />}
        {view === 'new' && (
          <Panel title="New part">
            <ErrorNote error={brands.error} />
            {brands.isPending ? (
              <p className="text-ink-faint">Loading brands…</p>
            ) : (
              <NewPartForm brands={brands.data ?? []} onOpen={openPart} />
            )}
          </Panel>
        )}
        {view === 'brands' && (
          <div className="grid grid-cols-[minmax(0,1fr)] items-start gap-4 xl:grid-cols-[minmax(0,1fr)_32rem]">
            <Panel title="Brands on file">
              <ErrorNote error={brands.error} />
              {brands.isPending ? <p className="text-ink-faint">Loading brands…</p> : <BrandList brands={brands.data ?? []} />}
            </Panel>
            <Panel title="Add a brand">
              <BrandForm />
            </Panel>
          </div>
        )}
      </Tabs>
    </>
  );
}
