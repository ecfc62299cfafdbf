import { inviteBodySchema } from '@shared/schemas/users';
import { ROLES } from '@shared/roles';
import { Button } from '@/components/ui/button';
import { Field, FieldSelect, Form, useSchemaForm } from '@/components/ui/form';
import { useShops } from '../api/get-shops';
import { useInviteUser } from '../api/invite-user';

/** Invite someone by e-mail: checked with the API's own schema before it is sent. */
export function InviteForm() {
  const form = useSchemaForm(inviteBodySchema, { defaultValues: { name: '', email: '', role: 'clerk', shopId: null } });
  const shops = useShops();
  const invite = useInviteUser();
  const role = form.watch('role');
  const technician = role === 'technician';

  return (
    <Form
      form={form}
      serverError={invite.error}
      onSubmit={(body) =>
        invite.mutate(
          { ...body, shopId: body.role === 'technician' ? body.shopId : null },
          { onSuccess: () => form.reset({ name: '', email: '', role: body.role, shopId: body.shopId ?? null }) },
        )
      }
      aria-label="Invite a user"
      className="grid gap-3 sm:grid-cols-2 lg:grid-cols-[repeat(4,minmax(0,1fr))_auto] lg:items-start"
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
      <Button type="submit" disabled={invite.isPending} className="lg:mt-5">
        Send invitation
      </Button>
      {invite.isSuccess && !form.formState.isDirty && (
        <p className="text-sm text-go sm:col-span-2 lg:col-span-5" role="status">
          Invitation sent. The link works once, for 72 hours.
        </p>
      )}
    </Form>
  );
}
