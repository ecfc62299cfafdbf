import { JOB_LABELS, type JobSummary } from '@shared/schemas/jobs';
import { Button } from '@/components/ui/button';
import { ErrorNote } from '@/components/ui/panel';
import { useRetryJob } from '../api/retry-job';
import { formatDateTime } from '@shared/format';

const when = (iso: string | null) => (iso ? formatDateTime(iso) : '—');

export function JobsTable({ jobs }: { jobs: JobSummary[] }) {
  const retry = useRetryJob();
  return (
    <>
      <ErrorNote error={retry.error} />
      <table className="w-full text-left text-[15px]" aria-label="Jobs">
        <thead className="border-b border-ink/10 text-xs uppercase tracking-wide text-ink-soft">
          <tr>
            <th className="py-2 pr-3">Job</th>
            <th className="py-2 pr-3">State</th>
            <th className="py-2 pr-3">Attempts</th>
            <th className="py-2 pr-3">Last error</th>
            <th className="py-2 pr-3">Queued</th>
            <th className="py-2 pr-3">Last attempt</th>
            <th className="py-2" />
          </tr>
        </thead>
        <tbody>
          {jobs.map((j) => (
            <tr key={j.id} className="border-b border-ink/5 align-top">
              <td className="py-2 pr-3">
                <span className="font-medium">{JOB_LABELS[j.name]}</span>
                <span className="block text-sm text-ink-soft">{j.summary}</span>
              </td>
              <td className="py-2 pr-3">
                {j.state === 'failed' ? (
                  <span className="text-nogo">failed</span>
                ) : (
                  <span className="text-review">retrying at {when(j.nextAttemptAt)}</span>
                )}
              </td>
              <td className="py-2 pr-3 tabular-nums">
                {j.attempts} of {j.maxAttempts}
              </td>
              <td className="max-w-md py-2 pr-3 text-sm break-words text-ink-soft">{j.lastError ?? '—'}</td>
              <td className="py-2 pr-3 text-sm text-ink-soft">{when(j.createdAt)}</td>
              <td className="py-2 pr-3 text-sm text-ink-soft">{when(j.lastAttemptAt)}</td>
              <td className="py-2 text-right">
                {j.state === 'failed' && (
                  <Button
                    variant="secondary"
                    disabled={retry.isPending && retry.variables === j.id}
                    onClick={() => retry.mutate(j.id)}
                    aria-label={`Retry ${JOB_LABELS[j.name]}: ${j.summary}`}
                  >
                    Retry
                  </Button>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </>
  );
}
