import { useState } from 'react';
import { API_KEY_NAME_MAX, API_KEY_SCOPES, createApiKeyBodySchema, type CreatedApiKey } from '@shared/schemas/api-keys';
import { Button } from '@/components/ui/button';
import { Field, FieldSelect, Form, useSchemaForm } from '@/components/ui/form';
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

/** A key for another system: named and scoped on the API's own schema; the key itself is shown once below. */
export function CreateKeyForm() {
  const form = useSchemaForm(createApiKeyBodySchema, { defaultValues: { name: '', scope: 'read' } });
  const create = useCreateApiKey();
  return (
    <div className="flex flex-col gap-3">
      <Form
        form={form}
        onSubmit={(body) => create.mutate(body, { onSuccess: () => form.reset({ name: '', scope: body.scope }) })}
        serverError={create.error}
        className="grid gap-3 sm:grid-cols-[1fr_2fr_auto] sm:items-start"
        aria-label="Create an API key"
      >
        <Field name="name" label="Name" required maxLength={API_KEY_NAME_MAX} placeholder="The system that will use it" />
        <FieldSelect name="scope" label="Scope" options={API_KEY_SCOPES.map((s) => ({ value: s, label: SCOPE_LABELS[s] }))} />
        <Button type="submit" disabled={create.isPending} className="sm:mt-[22px]">
          Create key
        </Button>
      </Form>
      {create.data && <NewKey created={create.data} />}
    </div>
  );
}
