import { ROLES, type Role } from '@shared/roles';
import type { TeamMember } from '@shared/schemas/users';
import { Button } from '@/components/ui/button';
import { ErrorNote } from '@/components/ui/panel';
import { useUpdateUser } from '../api/update-user';

export function TeamTable({ users, selfId }: { users: TeamMember[]; selfId: string }) {
  const update = useUpdateUser();
  return (
    <>
      <ErrorNote error={update.error} />
      <table className="w-full text-left text-[15px]">
        <thead className="border-b border-ink/10 text-xs uppercase tracking-wide text-ink-soft">
          <tr>
            <th className="py-2 pr-3">Name</th>
            <th className="py-2 pr-3">E-mail</th>
            <th className="py-2 pr-3">Role</th>
            <th className="py-2 pr-3">Shop</th>
            <th className="py-2 pr-3">Status</th>
            <th className="py-2" />
          </tr>
        </thead>
        <tbody>
          {users.map((u) => (
            <tr key={u.id} className="border-b border-ink/5">
              <td className="py-2 pr-3 font-medium">{u.name}</td>
              <td className="py-2 pr-3 text-ink-soft">{u.email}</td>
              <td className="py-2 pr-3">
                <label className="sr-only" htmlFor={`role-${u.id}`}>
                  Role of {u.name}
                </label>
                <select
                  id={`role-${u.id}`}
                  value={u.role}
                  disabled={u.id === selfId || u.role === 'technician'}
                  onChange={(e) => update.mutate({ id: u.id, role: e.target.value as Role })}
                  className="rounded border border-ink/20 bg-paper-raised px-2 py-1"
                >
                  {ROLES.filter((r) => r !== 'technician' || u.role === 'technician').map((r) => (
                    <option key={r} value={r}>
                      {r}
                    </option>
                  ))}
                </select>
              </td>
              <td className="py-2 pr-3 text-ink-soft">{u.shopName ?? '—'}</td>
              <td className="py-2 pr-3">
                {u.disabled ? (
                  <span className="text-nogo">disabled</span>
                ) : u.invitePending ? (
                  <span className="text-review">invited</span>
                ) : (
                  'active'
                )}
              </td>
              <td className="py-2 text-right">
                {u.id !== selfId && (
                  <Button variant={u.disabled ? 'secondary' : 'danger'} onClick={() => update.mutate({ id: u.id, disabled: !u.disabled })}>
                    {u.disabled ? 'Enable' : 'Disable'}
                  </Button>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </>
  );
}
