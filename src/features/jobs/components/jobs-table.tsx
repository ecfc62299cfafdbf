import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { JOB_LABELS, type JobSummary } from '@shared/schemas/jobs';
import { formatDateTime } from '@shared/format';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { ErrorNote } from '@/components/ui/panel';
import { useRetryJob } from '../api/retry-job';

/** The server lists up to 200 jobs; a page holds this many. */
const PAGE = 25;

const when = (iso: string | null) => (iso ? formatDateTime(iso) : '—');
// A moment as a number to sort by; a job that has none sorts last either way.
const sortTime = (iso: string | null) => (iso ? Date.parse(iso) : undefined);

const col = createColumnHelper<JobSummary>();
const time = (key: 'createdAt' | 'lastAttemptAt', header: string) =>
  col.accessor((j) => sortTime(j[key]), {
    id: key,
    header,
    enableSorting: true,
    sortUndefined: 'last',
    cell: (c) => when(c.row.original[key]),
    meta: { cellClassName: 'whitespace-nowrap text-sm text-ink-soft' },
  });

/** Jobs out of attempts first, newest first: the ones that wait for someone. */
const INITIAL_SORTING = [
  { id: 'state', desc: false },
  { id: 'createdAt', desc: true },
];

export function JobsTable({ jobs }: { jobs: JobSummary[] }) {
  const retry = useRetryJob();
  const { mutate, isPending, variables } = retry;
  const retrying = isPending ? variables : undefined;
  const columns = useMemo(
    () => [
      col.accessor((j) => JOB_LABELS[j.name], {
        id: 'job',
        header: 'Job',
        enableSorting: true,
        cell: ({ row: { original: j } }) => (
          <>
            <span className="font-medium">{JOB_LABELS[j.name]}</span>
            <span className="block text-sm text-ink-soft">{j.summary}</span>
          </>
        ),
      }),
      // "failed" before "retry": the failed ones need someone, the others come back on their own.
      col.accessor('state', {
        header: 'State',
        enableSorting: true,
        cell: ({ row: { original: j } }) =>
          j.state === 'failed' ? (
            <span className="text-nogo">failed</span>
          ) : (
            <span className="text-review">retrying at {when(j.nextAttemptAt)}</span>
          ),
      }),
      col.accessor('attempts', {
        header: 'Attempts',
        cell: ({ row: { original: j } }) => `${j.attempts} of ${j.maxAttempts}`,
        meta: { cellClassName: 'whitespace-nowrap tabular-nums' },
      }),
      col.accessor((j) => j.lastError ?? '—', {
        id: 'lastError',
        header: 'Last error',
        meta: { cellClassName: 'min-w-48 max-w-md text-sm break-words text-ink-soft' },
      }),
      time('createdAt', 'Queued'),
      time('lastAttemptAt', 'Last attempt'),
      col.display({
        id: 'retry',
        header: () => <span className="sr-only">Retry</span>,
        meta: { align: 'right' },
        cell: ({ row: { original: j } }) =>
          j.state === 'failed' && (
            <Button
              variant="secondary"
              disabled={retrying === j.id}
              onClick={() => mutate(j.id)}
              aria-label={`Retry ${JOB_LABELS[j.name]}: ${j.summary}`}
            >
              Retry
            </Button>
          ),
      }),
    ],
    [mutate, retrying],
  );
  return (
    <>
      <ErrorNote error={retry.error} />
      <DataTable label="Jobs" data={jobs} columns={columns} getRowId={(j) => j.id} initialSorting={INITIAL_SORTING} pageSize={PAGE} />
    </>
  );
}
