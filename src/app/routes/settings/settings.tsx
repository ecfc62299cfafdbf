import { ErrorNote, PageHeader } from '@/components/ui/panel';
import { useSettings } from '@/features/settings/api/get-settings';
import { useUpdateSettings } from '@/features/settings/api/update-settings';
import { SettingsForm } from '@/features/settings/components/settings-form';

/** Settings (admin): the compatibility thresholds, the load points and the price-list settings. */
export function SettingsPage() {
  const settings = useSettings();
  const update = useUpdateSettings();
  return (
    <>
      <PageHeader title="Settings" />
      <p className="mb-4 max-w-3xl text-sm text-ink-soft">
        Every threshold the verdicts are judged by. Changes apply to comparisons made from now on; saved fit reports keep the verdict they
        were saved with.
      </p>
      <ErrorNote error={settings.error} />
      {settings.isPending && <p className="text-ink-soft">Loading…</p>}
      {settings.data && (
        <SettingsForm
          initial={settings.data}
          saving={update.isPending}
          saveError={update.error}
          saved={update.isSuccess}
          onSave={(s) => update.mutate(s)}
        />
      )}
    </>
  );
}
