import { PageHeader } from '@/components/ui/panel';
import { BenchTest } from '@/features/bench/components/bench-test';

/** Bench test: is a coil on the bench still inside its resistance windows? */
export function BenchPage() {
  return (
    <>
      <PageHeader title="Bench test" />
      <BenchTest />
    </>
  );
}
