import { useUser } from '@/app/use-user';
import { PageHeader } from '@/components/ui/panel';

export function CounterPage() {
  const user = useUser();
  return (
    <>
      <PageHeader title="Counter" />
      <p className="text-lg text-ink-soft">Good to see you, {user.name.split(' ')[0]}.</p>
    </>
  );
}
