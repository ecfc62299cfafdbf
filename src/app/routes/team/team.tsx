import { useUser } from '@/app/use-user';
import { ErrorNote, PageHeader, Panel } from '@/components/ui/panel';
import { useUsers } from '@/features/team/api/get-users';
import { InviteForm } from '@/features/team/components/invite-form';
import { TeamTable } from '@/features/team/components/team-table';

export function TeamPage() {
  const me = useUser();
  const users = useUsers();
  return (
    <>
      <PageHeader title="Team" />
      <div className="flex flex-col gap-4">
        <Panel title="Invite someone">
          <InviteForm />
        </Panel>
        <Panel title="People">
          <ErrorNote error={users.error} />
          {users.data && <TeamTable users={users.data} selfId={me.id} />}
        </Panel>
      </div>
    </>
  );
}
