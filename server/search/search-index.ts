import { Meilisearch, type Index, type SearchParams, type SearchResponse, type Task } from 'meilisearch';
import type { DataSource } from 'typeorm';
import { affectedPartIds, FILTERABLE_ATTRIBUTES, loadPartDocuments, SEARCHABLE_ATTRIBUTES, type PartDocument } from './part-document';
import { asSearchUnavailable } from './search-unavailable';

const BATCH = 10_000;

/**
 * Meilisearch's default rules, then the document's `rankBoost` (spec and stock) before exactness, so
 * a part with a spec and stock comes above a stub row that matched the same words in the same field.
 */
export const RANKING_RULES = ['words', 'typo', 'proximity', 'attribute', 'sort', 'rankBoost:desc', 'exactness'];

/** The Meilisearch SDK does not throw on a failed task: check it. */
function ensureSucceeded(task: Task): void {
  if (task.status !== 'succeeded') throw new Error(`search index task ${task.uid} ${task.status}: ${task.error?.message ?? ''}`);
}

/** Runs a call to the search service, turning "down" and "refused the key" into SearchUnavailableError. */
async function guarded<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (err) {
    throw asSearchUnavailable(err);
  }
}

/**
 * The one parts index, through the meilisearch SDK (a real Meilisearch, or the local stand-in).
 * PostgreSQL stays the source of truth: rebuild() builds a fresh index beside the live one and swaps
 * it in, so searches meanwhile answer from the old one; refresh() rewrites the parts a change touched.
 * A search service that is down or refuses the key throws SearchUnavailableError.
 */
export class PartSearchIndex {
  readonly client: Meilisearch;
  readonly index: Index<PartDocument>;
  private rebuilding: Promise<unknown> = Promise.resolve();

  constructor(
    host: string,
    apiKey: string | undefined,
    readonly uid: string,
  ) {
    this.client = new Meilisearch({ host, apiKey });
    this.index = this.client.index<PartDocument>(uid);
  }

  /** Creates the index `uid` (the live one by default) where missing and applies the settings. */
  configure(uid = this.uid): Promise<void> {
    return guarded(async () => {
      const existing = await this.client.getIndex(uid).catch((err: unknown) => {
        if ((err as { cause?: { code?: string } }).cause?.code === 'index_not_found') return null;
        throw err;
      });
      if (!existing) ensureSucceeded(await this.client.createIndex(uid, { primaryKey: 'id' }).waitTask());
      const settings = {
        searchableAttributes: SEARCHABLE_ATTRIBUTES,
        filterableAttributes: FILTERABLE_ATTRIBUTES,
        sortableAttributes: ['partNumber', 'onHand'],
        rankingRules: RANKING_RULES,
      };
      ensureSucceeded(await this.client.index(uid).updateSettings(settings).waitTask());
    });
  }

  search(q: string, params: SearchParams): Promise<SearchResponse<PartDocument>> {
    return guarded(() => this.index.search(q, params));
  }

  /**
   * Every part into a new index, swapped with the live one, then the old one deleted. Rebuilds
   * from this process wait for each other. The new index has one fixed name, so what a process
   * killed mid-rebuild left behind is deleted by the next rebuild rather than piling up; app
   * servers sharing one search service should therefore not rebuild at the same moment.
   */
  rebuild(ds: DataSource): Promise<number> {
    const run = this.rebuilding.then(() => this.rebuildNow(ds));
    this.rebuilding = run.catch(() => undefined);
    return run;
  }

  private rebuildNow(ds: DataSource): Promise<number> {
    return guarded(async () => {
      const next = `${this.uid}__next`;
      await this.configure(this.uid);
      // What a rebuild killed midway left; the task fails, harmlessly, when there is none.
      await this.client.deleteIndex(next).waitTask();
      await this.configure(next);
      try {
        const docs = await loadPartDocuments(ds);
        const target = this.client.index<PartDocument>(next);
        for (let i = 0; i < docs.length; i += BATCH) {
          ensureSucceeded(await target.addDocuments(docs.slice(i, i + BATCH), { primaryKey: 'id' }).waitTask({ timeout: 120_000 }));
        }
        ensureSucceeded(await this.client.swapIndexes([{ indexes: [this.uid, next], rename: false }]).waitTask());
        return docs.length;
      } finally {
        // After the swap `next` holds the old documents; after a failure, the half-built index.
        await this.client
          .deleteIndex(next)
          .waitTask()
          .catch((err: unknown) => console.warn(`[arcwise] could not delete search index ${next}:`, err));
      }
    });
  }

  /** Re-reads the given parts (and those their supersession chains touch) from PostgreSQL. */
  async refresh(ds: DataSource, partIds: string[]): Promise<void> {
    if (partIds.length === 0) return;
    const ids = await affectedPartIds(ds, partIds);
    const docs = await loadPartDocuments(ds, ids);
    const found = new Set(docs.map((d) => d.id));
    const gone = ids.filter((id) => !found.has(id));
    await guarded(async () => {
      if (docs.length) ensureSucceeded(await this.index.addDocuments(docs, { primaryKey: 'id' }).waitTask());
      if (gone.length) ensureSucceeded(await this.index.deleteDocuments(gone).waitTask());
    });
  }
}
