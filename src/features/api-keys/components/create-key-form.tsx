import { useState, type FormEvent } from 'react';
import { API_KEY_NAME_MAX, API_KEY_SCOPES, type ApiKeyScope, type CreatedApiKey } from '@shared/schemas/api-keys';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { ErrorNote } from '@/components/ui/panel';
import { useCreateApiKey } from '../api/create-api-key';
import { SCOPE_LABELS } from '../scope-labels';

/** The key as made: shown here once, with a copy button; the server keeps only its hash. */
function NewKey({ created }: { created: CreatedApiKey }) {
  const [copied, setCopied] = useState(false);
  const copy = () => {
    void navigator.clipboard.writeText(created.key).then(() => setCopied(true));
  };
  return (
    <div className="flex flex-col gap-2 rounded-md border border-go/30 bg-go-soft p-3" role="status" aria-label="New API key">
      <p className="text-sm">
        Key <b>{created.name}</b> ({created.scope}). Copy it now: it is shown this once and cannot be shown again.
      </p>
      <div className="flex flex-wrap items-center gap-2">
        <code className="break-all rounded bg-paper-raised px-2 py-1 font-mono text-sm" aria-label="API key">
          {created.key}
        </code>
        <Button variant="secondary" onClick={copy}>
          {copied ? 'Copied' : 'Copy'}
        </Button>
      </div>
    </div>
  );
}

export function CreateKeyForm() {
  const [name, setName] = useState('');
  const [scope, setScope] = useState<ApiKeyScope>('read');
  const create = useCreateApiKey();

  const submit = (e: FormEvent) => {
    e.preventDefault();
    create.mutate({ name, scope }, { onSuccess: () => setName('') });
  };
  return (
    <div className="flex flex-col gap-3">
      <form onSubmit={submit} className="grid gap-3 sm:grid-cols-[1fr_2fr_auto] sm:items-end" aria-label="Create an API key">
        <TextField
          label="Name"
          required
          maxLength={API_KEY_NAME_MAX}
          placeholder="The system that will use it"
          value={name}
          onChange={(e) => setName(e.target.value)}
        />
        <SelectField label="Scope" value={scope} onChange={(e) => setScope(e.target.value as ApiKeyScope)}>
          {API_KEY_SCOPES.map((s) => (
            <option key={s} value={s}>
              {SCOPE_LABELS[s]}
            </option>
          ))}
        </SelectField>
        <Button type="submit" disabled={create.isPending}>
          Create key
        </Button>
      </form>
      <ErrorNote error={create.error} />
      {create.data && <NewKey created={create.data} />}
    </div>
  );
}
