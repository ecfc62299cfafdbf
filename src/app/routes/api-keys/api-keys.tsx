import { ErrorNote, PageHeader, Panel } from '@/components/ui/panel';
import { useApiKeys } from '@/features/api-keys/api/get-api-keys';
import { CreateKeyForm } from '@/features/api-keys/components/create-key-form';
import { KeyTable } from '@/features/api-keys/components/key-table';

export function ApiKeysPage() {
  const keys = useApiKeys();
  return (
    <>
      <PageHeader title="API keys" />
      <div className="flex flex-col gap-4">
        <Panel title="Create a key for another system">
          <CreateKeyForm />
        </Panel>
        <Panel title="Keys">
          <ErrorNote error={keys.error} />
          {keys.data && <KeyTable apiKeys={keys.data} />}
        </Panel>
      </div>
    </>
  );
}
