import { ErrorNote, PageHeader, Panel } from '@/components/ui/panel';
import { useJobs } from '@/features/jobs/api/get-jobs';
import { JobsTable } from '@/features/jobs/components/jobs-table';

/** Follow-up work (search index, e-mail) that did not go through at once: retrying on its own, or failed. */
export function JobsPage() {
  const jobs = useJobs();
  return (
    <>
      <PageHeader title="Jobs" />
      <p className="mb-4 max-w-3xl text-sm text-ink-soft">
        After a change is saved, Arcwise updates the search index and sends e-mail in the background. Work that did not go through is
        retried on its own, waiting longer each time; work out of attempts stays here until you retry it.
      </p>
      <Panel>
        <ErrorNote error={jobs.error} />
        {jobs.data?.length === 0 && <p className="text-ink-soft">Nothing is waiting or failed.</p>}
        {jobs.data && jobs.data.length > 0 && <JobsTable jobs={jobs.data} />}
      </Panel>
    </>
  );
}
