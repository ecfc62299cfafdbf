import { useState, type FormEvent } from 'react';
import { ROLES, type Role } from '@shared/roles';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { ErrorNote } from '@/components/ui/panel';
import { useShops } from '../api/get-shops';
import { useInviteUser } from '../api/invite-user';

export function InviteForm() {
  const [email, setEmail] = useState('');
  const [name, setName] = useState('');
  const [role, setRole] = useState<Role>('clerk');
  const [shopId, setShopId] = useState('');
  const shops = useShops();
  const invite = useInviteUser();

  const submit = (e: FormEvent) => {
    e.preventDefault();
    invite.mutate(
      { email, name, role, shopId: role === 'technician' ? shopId : null },
      {
        onSuccess: () => {
          setEmail('');
          setName('');
        },
      },
    );
  };
  return (
    <form onSubmit={submit} className="grid gap-3 sm:grid-cols-2 lg:grid-cols-5 lg:items-end" aria-label="Invite a user">
      <TextField label="Name" required value={name} onChange={(e) => setName(e.target.value)} />
      <TextField label="E-mail" type="email" required value={email} onChange={(e) => setEmail(e.target.value)} />
      <SelectField label="Role" value={role} onChange={(e) => setRole(e.target.value as Role)}>
        {ROLES.map((r) => (
          <option key={r} value={r}>
            {r}
          </option>
        ))}
      </SelectField>
      <SelectField
        label="Shop"
        value={shopId}
        disabled={role !== 'technician'}
        required={role === 'technician'}
        onChange={(e) => setShopId(e.target.value)}
      >
        <option value="">{role === 'technician' ? 'Choose a shop' : '— (store staff)'}</option>
        {shops.data?.map((s) => (
          <option key={s.id} value={s.id}>
            {s.name}
          </option>
        ))}
      </SelectField>
      <Button type="submit" disabled={invite.isPending}>
        Send invitation
      </Button>
      <div className="sm:col-span-2 lg:col-span-5">
        <ErrorNote error={invite.error} />
        {invite.isSuccess && (
          <p className="text-sm text-go" role="status">
            Invitation sent. The link works once, for 72 hours.
          </p>
        )}
      </div>
    </form>
  );
}
