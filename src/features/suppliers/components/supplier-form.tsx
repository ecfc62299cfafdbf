import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNote } from '@/components/ui/panel';
import { useCreateSupplier } from '../api/create-supplier';

const blankToUndefined = (s: string): string | undefined => (s.trim() === '' ? undefined : s.trim());

/** Adds a supplier; only the name is needed, the key is made from it when left empty. */
export function SupplierForm() {
  const [name, setName] = useState('');
  const [key, setKey] = useState('');
  const [contactEmail, setContactEmail] = useState('');
  const [phone, setPhone] = useState('');
  const create = useCreateSupplier();

  const submit = (e: FormEvent) => {
    e.preventDefault();
    create.mutate(
      { name: name.trim(), key: blankToUndefined(key), contactEmail: blankToUndefined(contactEmail), phone: blankToUndefined(phone) },
      {
        onSuccess: () => {
          setName('');
          setKey('');
          setContactEmail('');
          setPhone('');
        },
      },
    );
  };

  return (
    <form
      onSubmit={submit}
      aria-label="Add a supplier"
      className="grid gap-3 sm:grid-cols-2 lg:grid-cols-[2fr_1fr_2fr_1fr_auto] lg:items-start"
    >
      <TextField label="Name" required maxLength={120} value={name} onChange={(e) => setName(e.target.value)} />
      <TextField label="Key" maxLength={40} value={key} onChange={(e) => setKey(e.target.value)} hint="Made from the name if left empty" />
      <TextField label="Contact e-mail" type="email" value={contactEmail} onChange={(e) => setContactEmail(e.target.value)} />
      <TextField label="Phone" type="tel" maxLength={40} value={phone} onChange={(e) => setPhone(e.target.value)} />
      <Button type="submit" disabled={create.isPending} className="lg:mt-[22px]">
        Add supplier
      </Button>
      <div className="sm:col-span-2 lg:col-span-5">
        <ErrorNote error={create.error} />
        {create.isSuccess && (
          <p role="status" className="text-sm text-go">
            Added {create.data.name}.
          </p>
        )}
      </div>
    </form>
  );
}
