import { useUser } from '@/app/use-user';
import { ErrorNote, PageHeader, Panel } from '@/components/ui/panel';
import { useLocations } from '@/features/locations/api/get-locations';
import { useUsers } from '@/features/team/api/get-users';
import { InviteForm } from '@/features/team/components/invite-form';
import { TeamTable } from '@/features/team/components/team-table';

export function TeamPage() {
  const me = useUser();
  const users = useUsers();
  const stores = useLocations();
  return (
    <>
      <PageHeader title="Team" />
      <div className="flex flex-col gap-4">
        <Panel title="Invite someone">
          <ErrorNote error={stores.error} />
          {/* The home store picker starts on a store, so the form waits for the list of stores. */}
          {stores.isPending ? (
            <p className="text-ink-faint">Loading the stores…</p>
          ) : (
            <InviteForm stores={stores.data ?? []} defaultStoreId={me.homeLocationId} />
          )}
        </Panel>
        <Panel title="People">
          <ErrorNote error={users.error} />
          {users.data && <TeamTable users={users.data} selfId={me.id} stores={stores.data ?? []} />}
        </Panel>
      </div>
    </>
  );
}
