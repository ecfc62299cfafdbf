import { createSupplierBodySchema } from '@shared/schemas/suppliers';
import { Button } from '@/components/ui/button';
import { Field, Form, useSchemaForm } from '@/components/ui/form';
import { useCreateSupplier } from '../api/create-supplier';

const EMPTY = { name: '', key: undefined, contactEmail: null, phone: null };

/** Adds a supplier; only the name is needed, the key is made from it when left empty. */
export function SupplierForm() {
  const form = useSchemaForm(createSupplierBodySchema, { defaultValues: EMPTY });
  const create = useCreateSupplier();
  return (
    <Form
      form={form}
      onSubmit={(body) => create.mutate(body, { onSuccess: () => form.reset(EMPTY) })}
      serverError={create.error}
      aria-label="Add a supplier"
      className="grid gap-3 sm:grid-cols-2 lg:grid-cols-[2fr_1fr_2fr_1fr_auto] lg:items-start"
    >
      <Field name="name" label="Name" required maxLength={120} />
      <Field name="key" label="Key" blank="absent" maxLength={40} hint="Made from the name if left empty" />
      <Field name="contactEmail" label="Contact e-mail" type="email" blank="null" />
      <Field name="phone" label="Phone" type="tel" blank="null" maxLength={40} />
      <Button type="submit" disabled={create.isPending} className="lg:mt-[22px]">
        Add supplier
      </Button>
      {/* Said only while the form is as the add left it: typing the next supplier takes it away. */}
      {create.isSuccess && !form.formState.isDirty && (
        <p role="status" className="text-sm text-go sm:col-span-2 lg:col-span-5">
          Added {create.data.name}.
        </p>
      )}
    </Form>
  );
}
