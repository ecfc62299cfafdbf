import type { Location } from '@shared/schemas/locations';
import { inviteBodySchema } from '@shared/schemas/users';
import { ROLES } from '@shared/roles';
import { Button } from '@/components/ui/button';
import { Field, FieldSelect, Form, useSchemaForm } from '@/components/ui/form';
import { useShops } from '../api/get-shops';
import { useInviteUser } from '../api/invite-user';

export interface InviteFormProps {
  /** The chain's stores, for the home store of the store's staff (the page reads them). */
  stores: readonly Pick<Location, 'id' | 'name'>[];
  /** The store chosen at first: the inviting admin's own. */
  defaultStoreId: string | null;
}

/** Invite someone by e-mail: checked with the API's own schema before it is sent. */
export function InviteForm({ stores, defaultStoreId }: InviteFormProps) {
  const form = useSchemaForm(inviteBodySchema, {
    defaultValues: { name: '', email: '', role: 'clerk', shopId: null, homeLocationId: defaultStoreId },
  });
  const shops = useShops();
  const invite = useInviteUser();
  const role = form.watch('role');
  const technician = role === 'technician';

  return (
    <Form
      form={form}
      serverError={invite.error}
      onSubmit={({ homeLocationId, ...body }) =>
        invite.mutate(
          // A shop's technician has a shop and no home store; the store's staff the other way round.
          body.role === 'technician' ? body : { ...body, shopId: null, homeLocationId },
          {
            onSuccess: () =>
              form.reset({ name: '', email: '', role: body.role, shopId: body.shopId ?? null, homeLocationId: homeLocationId ?? null }),
          },
        )
      }
      aria-label="Invite a user"
      className="grid gap-3 sm:grid-cols-2 lg:grid-cols-[repeat(5,minmax(0,1fr))_auto] lg:items-start"
    >
      <Field name="name" label="Name" autoComplete="off" />
      <Field name="email" label="E-mail" type="email" autoComplete="off" />
      <FieldSelect name="role" label="Role" options={ROLES} />
      <FieldSelect
        name="shopId"
        label="Shop"
        blank="null"
        disabled={!technician}
        placeholder={technician ? 'Choose a shop' : '— (store staff)'}
        options={(shops.data ?? []).map((s) => ({ value: s.id, label: s.name }))}
      />
      <FieldSelect
        name="homeLocationId"
        label="Home store"
        blank="null"
        disabled={technician}
        placeholder={technician ? '— (a shop’s technician)' : 'The chain’s first store'}
        options={stores.map((s) => ({ value: s.id, label: s.name }))}
      />
      <Button type="submit" disabled={invite.isPending} className="lg:mt-5">
        Send invitation
      </Button>
      {invite.isSuccess && !form.formState.isDirty && (
        <p className="text-sm text-go sm:col-span-2 lg:col-span-6" role="status">
          Invitation sent. The link works once, for 72 hours.
        </p>
      )}
    </Form>
  );
}
