import { createColumnHelper } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { ROLES, type Role } from '@shared/roles';
import type { Location } from '@shared/schemas/locations';
import type { TeamMember } from '@shared/schemas/users';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { ConfirmDialog } from '@/components/ui/dialog';
import { ErrorNote } from '@/components/ui/panel';
import { useUpdateUser } from '../api/update-user';

const column = createColumnHelper<TeamMember>();

/** What an admin is about to do to someone, waiting for the confirmation. */
type Pending = { user: TeamMember; role: Role } | { user: TeamMember; disable: true };

function Status({ user }: { user: TeamMember }) {
  if (user.disabled) return <span className="text-nogo">disabled</span>;
  if (user.invitePending) return <span className="text-review">invited</span>;
  return <>active</>;
}

export interface TeamTableProps {
  users: TeamMember[];
  selfId: string;
  /** The chain's stores, for each person's home store (the page reads them). */
  stores: readonly Pick<Location, 'id' | 'name'>[];
}

/**
 * The people of the stores and the shops, sortable by name and role. A role change or a
 * disable signs the person out at once, so each asks first; enabling does not, nor does moving
 * someone to another home store (their next page shows that store's stock as "here").
 */
export function TeamTable({ users, selfId, stores }: TeamTableProps) {
  const update = useUpdateUser();
  const { mutate } = update;
  // While a move is on its way, its select shows the store chosen rather than snapping back.
  const moving = update.isPending && update.variables.homeLocationId ? update.variables : null;
  const [pending, setPending] = useState<Pending | null>(null);

  const columns = useMemo(
    () => [
      column.accessor('name', { header: 'Name', enableSorting: true, meta: { cellClassName: 'font-medium' } }),
      column.accessor('email', { header: 'E-mail', meta: { cellClassName: 'text-ink-soft' } }),
      column.accessor('role', {
        header: 'Role',
        enableSorting: true,
        cell: ({ row: { original: u } }) => (
          <>
            <label className="sr-only" htmlFor={`role-${u.id}`}>
              Role of {u.name}
            </label>
            <select
              id={`role-${u.id}`}
              value={u.role}
              disabled={u.id === selfId || u.role === 'technician'}
              onChange={(e) => setPending({ user: u, role: e.target.value as Role })}
              className="rounded border border-ink/20 bg-paper-raised px-2 py-1"
            >
              {ROLES.filter((r) => r !== 'technician' || u.role === 'technician').map((r) => (
                <option key={r} value={r}>
                  {r}
                </option>
              ))}
            </select>
          </>
        ),
      }),
      column.accessor((u) => stores.find((l) => l.id === u.homeLocationId)?.name ?? '', {
        id: 'home',
        header: 'Home store',
        enableSorting: true,
        cell: ({ row: { original: u } }) =>
          u.role === 'technician' ? (
            <span className="text-ink-soft">—</span>
          ) : (
            <>
              <label className="sr-only" htmlFor={`home-${u.id}`}>
                Home store of {u.name}
              </label>
              <select
                id={`home-${u.id}`}
                value={(moving?.id === u.id ? moving.homeLocationId : u.homeLocationId) ?? ''}
                onChange={(e) => mutate({ id: u.id, homeLocationId: e.target.value })}
                className="rounded border border-ink/20 bg-paper-raised px-2 py-1"
              >
                {u.homeLocationId === null && <option value="">—</option>}
                {stores.map((l) => (
                  <option key={l.id} value={l.id}>
                    {l.name}
                  </option>
                ))}
              </select>
            </>
          ),
      }),
      column.accessor((u) => u.shopName ?? '—', { id: 'shop', header: 'Shop', meta: { cellClassName: 'text-ink-soft' } }),
      column.display({ id: 'status', header: 'Status', cell: ({ row }) => <Status user={row.original} /> }),
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        meta: { align: 'right' },
        cell: ({ row: { original: u } }) =>
          u.id === selfId ? null : u.disabled ? (
            <Button variant="secondary" onClick={() => mutate({ id: u.id, disabled: false })}>
              Enable
            </Button>
          ) : (
            <Button variant="danger" onClick={() => setPending({ user: u, disable: true })}>
              Disable
            </Button>
          ),
      }),
    ],
    [selfId, mutate, stores, moving],
  );

  const name = pending?.user.name ?? '';
  return (
    <>
      <DataTable label="People" data={users} columns={columns} getRowId={(u) => u.id} initialSorting={[{ id: 'name', desc: false }]} />
      {/* A failed enable; a confirmed change that fails says so in its dialog. */}
      {!pending && <ErrorNote error={update.error} />}
      <ConfirmDialog
        open={pending !== null}
        onOpenChange={(open) => {
          if (open) return;
          setPending(null);
          update.reset();
        }}
        title={pending && 'role' in pending ? `Make ${name} ${article(pending.role)} ${pending.role}?` : `Disable ${name}?`}
        confirmLabel={pending && 'role' in pending ? `Make ${pending.role}` : `Disable ${name}`}
        tone={pending && 'role' in pending ? 'primary' : 'danger'}
        onConfirm={() =>
          pending &&
          update.mutateAsync('role' in pending ? { id: pending.user.id, role: pending.role } : { id: pending.user.id, disabled: true })
        }
      >
        {pending && 'role' in pending ? (
          <p>
            {name} is signed out at once and signs in again as {article(pending.role)} {pending.role}, with what that role may see and do.
          </p>
        ) : (
          <p>{name} is signed out at once and cannot sign in until an admin enables them again. Nothing they did is removed.</p>
        )}
      </ConfirmDialog>
    </>
  );
}

const article = (word: string): string => (/^[aeiou]/.test(word) ? 'an' : 'a');
