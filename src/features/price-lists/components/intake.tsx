import { useState } from 'react';
import type { Mapping } from '@shared/price-list/mapping';
import { priceListFileRefusalDetailsSchema, type PriceList, type PriceListCounts } from '@shared/schemas/price-lists';
import { DELIMITER_LABELS, DELIMITERS, isDelimiter, type Delimiter } from '@shared/price-list/delimiters';
import { counterPricesMessage, type CounterPrices } from '@shared/schemas/sell-price';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/dialog';
import { SelectField } from '@/components/ui/field';
import { ErrorNote, Panel } from '@/components/ui/panel';
import { ApiError } from '@/lib/api-client';
import { useCommitPriceList } from '../api/commit-price-list';
import { useDiscardPriceList } from '../api/discard-price-list';
import { usePriceList } from '../api/get-price-list';
import { useUploadProgress } from '../api/get-upload-progress';
import { usePreviewPriceList } from '../api/preview-price-list';
import { newUploadId, useUploadPriceList, type UploadProgress } from '../api/upload-price-list';
import { formatBytes, formatCount } from '@shared/format';
import { FileDrop } from './file-drop';
import { MappingTable, mappingProblems } from './mapping-table';
import { PreviewCounts } from './preview-counts';
import { PreviewTabs } from './preview-tabs';
import { ProgressBar } from './progress-bar';

const sameMapping = (a: Mapping, b: Mapping): boolean => {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  return [...keys].every((k) => (a[k] ?? null) === (b[k] ?? null));
};

const MAPPABLE_REFUSALS = new Set(['missing-column', 'invalid-mapping']);

const MAPPING_SOURCE: Record<PriceList['mappingSource'], string> = {
  guessed: 'Guessed from the headers of the file. Check each column, then apply.',
  remembered: 'As confirmed for this supplier’s last file. Check any new column, then apply.',
  given: 'As you set it. Change a field and apply to preview again.',
};

/** The server's side of the work: rows read against the bytes it has, then the comparison with the catalog. */
function ServerProgress({ list }: { list: PriceList }) {
  const p = list.progress;
  if (p.phase === 'comparing')
    return <ProgressBar label="Comparing with the catalog" value={null} detail={`${formatCount(p.rowsDone)} rows`} />;
  return (
    <ProgressBar
      label="Reading and checking the rows"
      value={p.bytesTotal > 0 ? p.bytesRead / p.bytesTotal : null}
      detail={`${formatCount(p.rowsDone)} rows read`}
    />
  );
}

function UploadBars({ progress, uploadId }: { progress: UploadProgress; uploadId: string | null }) {
  const server = useUploadProgress(uploadId);
  const list = server.data ?? null;
  return (
    <div className="flex flex-col gap-2">
      <ProgressBar
        label={progress.sent ? 'Uploaded' : 'Uploading'}
        value={progress.total > 0 ? progress.loaded / progress.total : null}
        detail={`${formatBytes(progress.loaded)} of ${formatBytes(progress.total)}`}
      />
      {list ? <ServerProgress list={list} /> : progress.sent && <ProgressBar label="Reading and checking the rows" value={null} />}
    </div>
  );
}

/** Step one: the file. A refusal for an unmapped required column opens the mapping here. */
function NewFile({ supplierId, onStaged }: { supplierId: string; onStaged: (id: string) => void }) {
  const upload = useUploadPriceList();
  const [file, setFile] = useState<File | null>(null);
  const [uploadId, setUploadId] = useState<string | null>(null);
  const [draft, setDraft] = useState<Mapping | null>(null);

  const send = (f: File, mapping?: Mapping) => {
    const id = newUploadId();
    setFile(f);
    setUploadId(id);
    upload.mutate({ file: f, supplierId, uploadId: id, ...(mapping ? { mapping } : {}) }, { onSuccess: (list) => onStaged(list.id) });
  };

  const details = upload.error instanceof ApiError ? priceListFileRefusalDetailsSchema.safeParse(upload.error.details) : null;
  // Only a mapping problem can be fixed here; a duplicate header or a header-only file needs a new file.
  const refusal =
    details?.success && MAPPABLE_REFUSALS.has(details.data.reason) && details.data.headers && details.data.headers.length > 0
      ? details.data
      : null;
  const mapping = draft ?? refusal?.mapping ?? {};

  return (
    <div className="flex flex-col gap-3">
      <FileDrop
        disabled={upload.isPending}
        onFile={(f) => {
          setDraft(null);
          send(f);
        }}
      />
      {upload.isPending && upload.progress && (
        <div className="flex flex-col gap-1">
          <p className="truncate text-sm font-medium text-ink">{file?.name}</p>
          <UploadBars progress={upload.progress} uploadId={uploadId} />
        </div>
      )}
      {/* A mapping refusal is shown once, as the mapping table's own problems; any other refusal as a note. */}
      {!(refusal?.headers && file) && <ErrorNote error={upload.error} />}
      {refusal?.headers && file && (
        <div className="flex max-w-2xl flex-col gap-3 rounded-md border border-ink/10 p-3">
          <p className="text-sm text-ink">Map the columns of {file.name} and upload it again.</p>
          <MappingTable columns={refusal.headers} mapping={mapping} onChange={setDraft} />
          <div>
            <Button disabled={mappingProblems(refusal.headers, mapping).length > 0 || upload.isPending} onClick={() => send(file, mapping)}>
              Upload with this mapping
            </Button>
          </div>
        </div>
      )}
    </div>
  );
}

const plural = (n: number, one: string, many: string): string => `${formatCount(n)} ${n === 1 ? one : many}`;

function countsSentence(counts: PriceListCounts): string {
  return [
    plural(counts.new, 'new part', 'new parts'),
    plural(counts.changed, 'price change', 'price changes'),
    plural(counts.supersessions, 'supersession', 'supersessions'),
    `${formatCount(counts.unchanged)} unchanged`,
    plural(counts.rejected, 'row rejected', 'rows rejected'),
  ].join(', ');
}

function CommitSummary({ counts, supplierName }: { counts: PriceListCounts; supplierName: string }) {
  const rows: [string, number][] = [
    ['New parts', counts.new],
    ['Price changes', counts.changed],
    ['Unchanged', counts.unchanged],
    ['Supersessions', counts.supersessions],
    ['Rows refused (not written)', counts.rejected],
  ];
  return (
    <div className="flex flex-col gap-2">
      <p>
        This writes {supplierName}’s prices into the live catalog in one step. The Counter sells at them only where the sell-price rule
        picks this supplier.
      </p>
      <dl aria-label="What the commit writes" className="grid grid-cols-[1fr_auto] gap-x-6 gap-y-0.5">
        {rows.map(([label, n]) => (
          <div key={label} className="contents">
            <dt>{label}</dt>
            <dd className="text-right tabular-nums">{formatCount(n)}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}

/** Steps two to four for a staged list: columns, preview, commit or discard. */
function StagedList({
  list,
  onClose,
  onCommitted,
}: {
  list: PriceList;
  onClose: () => void;
  onCommitted: (done: { notices: string[]; counterPrices: CounterPrices }) => void;
}) {
  const [draft, setDraft] = useState<Mapping>(list.mapping);
  const preview = usePreviewPriceList();
  const commit = useCommitPriceList();
  const discard = useDiscardPriceList();

  const problems = mappingProblems(list.columns, draft);
  const dirty = !sameMapping(draft, list.mapping);
  const counts = list.counts;
  const valid = counts ? counts.total - counts.rejected : 0;
  const busy = preview.isPending || commit.isPending || discard.isPending;
  const blocked = list.stale ? 'stale' : dirty ? 'dirty' : valid === 0 ? 'empty' : null;
  // The select shows the buyer's last choice even when reading with it failed, so choosing back works.
  const [delimiter, setDelimiter] = useState<Delimiter>(isDelimiter(list.delimiter) ? list.delimiter : ',');

  return (
    <div className="grid grid-cols-1 gap-4 lg:grid-cols-[minmax(340px,380px)_minmax(0,1fr)] lg:items-start">
      <Panel title="Columns">
        <div className="flex flex-col gap-3">
          <SelectField
            label="Delimiter"
            hint="Guessed from the first lines of the file. Choose another to read the file again."
            value={delimiter}
            disabled={busy}
            onChange={(e) => {
              const next = e.target.value;
              if (!isDelimiter(next)) return;
              setDelimiter(next);
              preview.mutate({ id: list.id, delimiter: next });
            }}
          >
            {DELIMITERS.map((d) => (
              <option key={d} value={d}>
                {DELIMITER_LABELS[d]}
              </option>
            ))}
          </SelectField>
          <p className="text-sm text-ink-soft">
            {MAPPING_SOURCE[list.mappingSource]} The mapping is remembered for this supplier’s next file.
          </p>
          <MappingTable columns={list.columns} mapping={draft} onChange={setDraft} disabled={busy} />
          <div className="flex items-center gap-2">
            <Button onClick={() => preview.mutate({ id: list.id, mapping: draft })} disabled={busy || problems.length > 0}>
              Apply mapping
            </Button>
            {dirty && (
              <Button variant="ghost" onClick={() => setDraft(list.mapping)} disabled={busy}>
                Undo changes
              </Button>
            )}
          </div>
          <ErrorNote error={preview.error} />
        </div>
      </Panel>

      <Panel
        title="Preview"
        actions={
          <div className="flex items-center gap-2">
            <ConfirmDialog
              title={`Discard ${list.fileName}?`}
              confirmLabel="Discard the file"
              tone="danger"
              trigger={
                <Button variant="danger" disabled={busy}>
                  Discard
                </Button>
              }
              onConfirm={() => discard.mutateAsync({ id: list.id, supplierId: list.supplierId })}
            >
              <p>The staged rows and the kept file are removed. The catalog stays as it is; the file stays in the history as discarded.</p>
            </ConfirmDialog>
            {counts && (
              <ConfirmDialog
                title={`Commit ${list.fileName}?`}
                confirmLabel={`Commit ${formatCount(valid)} rows`}
                trigger={
                  <Button disabled={busy || blocked !== null}>
                    {commit.isPending ? 'Committing…' : `Commit ${formatCount(valid)} rows`}
                  </Button>
                }
                onConfirm={async () => {
                  const committed = await commit.mutateAsync({ id: list.id, supplierId: list.supplierId });
                  onCommitted({ notices: committed.notices, counterPrices: committed.counterPrices });
                }}
              >
                <CommitSummary counts={counts} supplierName={list.supplierName} />
              </ConfirmDialog>
            )}
          </div>
        }
      >
        <div className="flex flex-col gap-3">
          <p className="text-sm text-ink-soft">
            <span className="font-medium text-ink">{list.fileName}</span> · {formatBytes(list.sizeBytes)} ·{' '}
            <button type="button" className="text-accent underline-offset-2 hover:underline" onClick={onClose}>
              set aside and upload another file
            </button>
          </p>
          {blocked === 'stale' && (
            <div
              role="status"
              className="flex flex-wrap items-center gap-3 rounded-md border border-review/40 bg-review-soft px-3 py-2 text-sm"
            >
              <span className="text-ink">
                Another file for this supplier was committed after this preview. Preview again against today’s prices before committing.
              </span>
              <Button variant="secondary" disabled={busy} onClick={() => preview.mutate({ id: list.id, mapping: list.mapping })}>
                Preview again
              </Button>
            </div>
          )}
          {blocked === 'dirty' && (
            <p role="status" className="rounded-md border border-review/40 bg-review-soft px-3 py-2 text-sm text-ink">
              The column mapping has changed. Apply it to see the preview it gives before committing.
            </p>
          )}
          {blocked === 'empty' && <p className="text-sm text-nogo">No row of this file can be committed.</p>}
          {preview.isPending && <ProgressBar label="Reading the file again" value={null} />}
          {counts && (
            <>
              <PreviewCounts counts={counts} flagged={list.flagged} thresholdPct={list.flagThresholdPct} />
              <PreviewTabs listId={list.id} counts={counts} />
            </>
          )}
        </div>
      </Panel>
    </div>
  );
}

interface CommitDone {
  notices: string[];
  counterPrices: CounterPrices | null;
}

function Finished({ list, done, onClose }: { list: PriceList; done: CommitDone; onClose: () => void }) {
  const { notices, counterPrices } = done;
  const committed = list.status === 'committed';
  return (
    <Panel>
      <div className="flex flex-col gap-2">
        <div role="status" className="flex flex-wrap items-center justify-between gap-3">
          <div className="flex items-start gap-3">
            {committed && (
              <svg aria-hidden viewBox="0 0 20 20" className="mt-0.5 h-6 w-6 shrink-0 text-go">
                <circle cx="10" cy="10" r="9" fill="currentColor" />
                <path d="m6 10.5 2.5 2.5L14 7.5" fill="none" stroke="#fff" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" />
              </svg>
            )}
            <div>
              <p className="text-lg font-semibold text-ink">{committed ? `Committed ${list.fileName}` : `Discarded ${list.fileName}`}</p>
              <p className="text-[15px] text-ink-soft">
                {committed && list.counts ? `${countsSentence(list.counts)}.` : 'Nothing in the catalog changed.'}
                {committed && counterPrices && ` ${counterPricesMessage(counterPrices)}`}
              </p>
              {committed && list.applied && (
                <p className="text-sm text-ink-soft">
                  Written to the catalog: {plural(list.applied.pricesWritten, 'price', 'prices')},{' '}
                  {plural(list.applied.partsCreated, 'new part', 'new parts')}, {plural(list.applied.specsStored, 'spec', 'specs')},{' '}
                  {plural(list.applied.supersessionsLinked, 'supersession link', 'supersession links')}.
                </p>
              )}
            </div>
          </div>
          <Button onClick={onClose}>Upload another file</Button>
        </div>
        {notices.length > 0 && (
          <ul className="rounded-md border border-review/40 bg-review-soft px-3 py-2 text-sm text-ink">
            {notices.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        )}
      </div>
    </Panel>
  );
}

/**
 * The intake for one supplier. The list being worked on lives in the page's URL, so a reload or
 * a link keeps the buyer's place.
 */
export function PriceListIntake({
  supplierId,
  listId,
  onListChange,
}: {
  supplierId: string;
  listId: string | null;
  onListChange: (id: string | null) => void;
}) {
  const list = usePriceList(listId);
  const [done, setDone] = useState<CommitDone>({ notices: [], counterPrices: null });
  const close = () => {
    setDone({ notices: [], counterPrices: null });
    onListChange(null);
  };

  if (listId === null) {
    return (
      <Panel title="New price list">
        <NewFile supplierId={supplierId} onStaged={onListChange} />
      </Panel>
    );
  }
  if (list.error) {
    return (
      <Panel title="Price list">
        <div className="flex flex-col items-start gap-3">
          <ErrorNote error={list.error} />
          <Button onClick={close}>Upload another file</Button>
        </div>
      </Panel>
    );
  }
  if (!list.data) return <p className="text-ink-soft">Loading…</p>;
  const l = list.data;
  if (l.status === 'processing') {
    return (
      <Panel title={l.fileName}>
        <ServerProgress list={l} />
      </Panel>
    );
  }
  if (l.status === 'failed') {
    return (
      <Panel title={l.fileName}>
        <div className="flex flex-col items-start gap-3">
          <p className="text-nogo">The server could not finish reading this file. Upload it again; if it fails again, check the file.</p>
          <Button onClick={close}>Upload another file</Button>
        </div>
      </Panel>
    );
  }
  if (l.status === 'staged')
    return <StagedList key={`${l.id}:${l.delimiter ?? ''}:${JSON.stringify(l.mapping)}`} list={l} onClose={close} onCommitted={setDone} />;
  return <Finished list={l} done={done} onClose={close} />;
}
