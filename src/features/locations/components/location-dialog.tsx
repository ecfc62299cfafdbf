import { locationBodySchema, type Location } from '@shared/schemas/locations';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Field, Form, useSchemaForm } from '@/components/ui/form';
import { useCreateLocation } from '../api/create-location';
import { useUpdateLocation } from '../api/update-location';

export interface LocationDialogProps {
  /** The store to edit; null adds a new one. */
  location: Location | null;
  open: boolean;
  onOpenChange: (open: boolean) => void;
}

/** Add a store to the chain or edit one, in a dialog: checked with the API's own schema before it is sent. */
export function LocationDialog({ location, open, onOpenChange }: LocationDialogProps) {
  return (
    <Dialog
      title={location ? `Edit ${location.name}` : 'Add a store'}
      description={location ? undefined : 'Its staff see its stock as “here”; the other stores see what it holds.'}
      open={open}
      onOpenChange={onOpenChange}
    >
      {/* Mounted only while open, so each opening starts from the store as it is now. */}
      {open && <LocationForm key={location?.id ?? 'new'} location={location} onDone={() => onOpenChange(false)} />}
    </Dialog>
  );
}

function LocationForm({ location, onDone }: { location: Location | null; onDone: () => void }) {
  const form = useSchemaForm(locationBodySchema, {
    defaultValues: {
      name: location?.name ?? '',
      address: location?.address ?? '',
      phone: location?.phone ?? '',
      openingHours: location?.openingHours ?? '',
    },
  });
  const create = useCreateLocation();
  const update = useUpdateLocation();
  const saving = create.isPending || update.isPending;
  return (
    <Form
      form={form}
      serverError={location ? update.error : create.error}
      onSubmit={(body) =>
        location ? update.mutate({ id: location.id, body }, { onSuccess: onDone }) : create.mutate(body, { onSuccess: onDone })
      }
      aria-label={location ? 'Edit the store' : 'Add a store'}
      className="flex flex-col gap-3"
    >
      <Field name="name" label="Name" autoComplete="off" />
      <Field name="address" label="Address" autoComplete="off" />
      <div className="grid gap-3 sm:grid-cols-2">
        <Field name="phone" label="Phone" type="tel" autoComplete="off" />
        <Field name="openingHours" label="Opening hours" autoComplete="off" hint="As the customers read it: Mon–Fri 8:00–18:00" />
      </div>
      <div className="mt-2 flex flex-wrap justify-end gap-2">
        <Button variant="secondary" onClick={onDone} disabled={saving}>
          Cancel
        </Button>
        <Button type="submit" disabled={saving} aria-busy={saving || undefined}>
          {location ? 'Save the store' : 'Add the store'}
        </Button>
      </div>
    </Form>
  );
}
