import { useCallback, useState } from 'react';
import type { Location } from '@shared/schemas/locations';
import { Button } from '@/components/ui/button';
import { ErrorNote, PageHeader, Panel } from '@/components/ui/panel';
import { useLocations } from '@/features/locations/api/get-locations';
import { LocationDialog } from '@/features/locations/components/location-dialog';
import { LocationsTable } from '@/features/locations/components/locations-table';

/** The admin's list of the chain's stores: add one, or edit how customers reach it. */
export function StoresPage() {
  const locations = useLocations();
  // null: adding a store; a store: editing it; undefined: the dialog is closed.
  const [editing, setEditing] = useState<Location | null | undefined>(undefined);
  const edit = useCallback((l: Location) => setEditing(l), []);
  return (
    <>
      <PageHeader title="Stores">
        <Button onClick={() => setEditing(null)}>Add a store</Button>
      </PageHeader>
      <Panel title="The chain’s stores">
        <ErrorNote error={locations.error} />
        {locations.isPending && <p className="text-ink-faint">Loading the stores…</p>}
        {locations.data && <LocationsTable locations={locations.data} onEdit={edit} />}
      </Panel>
      <LocationDialog location={editing ?? null} open={editing !== undefined} onOpenChange={(open) => !open && setEditing(undefined)} />
    </>
  );
}
