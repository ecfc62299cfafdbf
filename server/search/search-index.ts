import { Meilisearch, type Index, type Task } from 'meilisearch';
import type { DataSource } from 'typeorm';
import { affectedPartIds, FILTERABLE_ATTRIBUTES, loadPartDocuments, SEARCHABLE_ATTRIBUTES, type PartDocument } from './part-document';

const BATCH = 10_000;

/** The Meilisearch SDK does not throw on a failed task: check it. */
function ensureSucceeded(task: Task): void {
  if (task.status !== 'succeeded') throw new Error(`search index task ${task.uid} ${task.status}: ${task.error?.message ?? ''}`);
}

/**
 * The one parts index, through the meilisearch SDK (a real Meilisearch, or the local stand-in).
 * PostgreSQL stays the source of truth: rebuild() reloads everything, refresh() the parts a
 * catalog change touched.
 */
export class PartSearchIndex {
  readonly client: Meilisearch;
  readonly index: Index<PartDocument>;

  constructor(
    host: string,
    apiKey: string | undefined,
    readonly uid: string,
  ) {
    this.client = new Meilisearch({ host, apiKey });
    this.index = this.client.index<PartDocument>(uid);
  }

  async configure(): Promise<void> {
    const existing = await this.client.getIndex(this.uid).catch(() => null);
    if (!existing) ensureSucceeded(await this.client.createIndex(this.uid, { primaryKey: 'id' }).waitTask());
    ensureSucceeded(
      await this.index
        .updateSettings({
          searchableAttributes: SEARCHABLE_ATTRIBUTES,
          filterableAttributes: FILTERABLE_ATTRIBUTES,
          sortableAttributes: ['partNumber', 'onHand'],
        })
        .waitTask(),
    );
  }

  async rebuild(ds: DataSource): Promise<number> {
    await this.configure();
    const docs = await loadPartDocuments(ds);
    ensureSucceeded(await this.index.deleteAllDocuments().waitTask());
    for (let i = 0; i < docs.length; i += BATCH) {
      ensureSucceeded(await this.index.addDocuments(docs.slice(i, i + BATCH), { primaryKey: 'id' }).waitTask({ timeout: 120_000 }));
    }
    return docs.length;
  }

  /** Re-reads the given parts (and those their supersession chains touch) from PostgreSQL. */
  async refresh(ds: DataSource, partIds: string[]): Promise<void> {
    if (partIds.length === 0) return;
    const ids = await affectedPartIds(ds, partIds);
    const docs = await loadPartDocuments(ds, ids);
    const found = new Set(docs.map((d) => d.id));
    const gone = ids.filter((id) => !found.has(id));
    if (docs.length) ensureSucceeded(await this.index.addDocuments(docs, { primaryKey: 'id' }).waitTask());
    if (gone.length) ensureSucceeded(await this.index.deleteDocuments(gone).waitTask());
  }
}
