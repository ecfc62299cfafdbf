/**
 * One index: its documents keyed by primary key, its settings, and the text index built from
 * them. The text index is kept up to date on every document change; it is rebuilt only when the
 * list of searchable fields changes (a new field under `searchableAttributes: ["*"]`, or a settings
 * update) or when stale entries from rewrites pile up, so loading 100,000 documents in batches
 * touches each document once.
 */
import type { DocumentRecord } from './document-record';
import { documentIdOf, inferPrimaryKey } from './document-ids';
import type { JsonObject } from './field-paths';
import { FieldStore } from './field-store';
import type { DocumentPredicate } from './filter-evaluator';
import { applySettingsPatch, defaultSettings, resolveSettings, type ResolvedSettings } from './index-settings';
import { MeiliError } from './meili-error';
import { TextIndex } from './text-index';

export type WriteMode = 'replace' | 'update';

/** How many stale text-index slots are tolerated beyond the live documents before a rebuild. */
const STALE_SLOT_ALLOWANCE = 50_000;
const MAX_CACHED_ORDERS = 8;

export interface IndexInfo {
  uid: string;
  primaryKey: string | null;
  createdAt: string;
  updatedAt: string;
}

export class StandinIndex {
  primaryKey: string | null;
  readonly createdAt = new Date();
  updatedAt = new Date();
  /** Insertion order is `seq` order: a replaced document keeps its place, as in Meilisearch. */
  readonly records = new Map<string, DocumentRecord>();
  readonly bySeq = new Map<number, DocumentRecord>();
  private settingsObject: JsonObject = defaultSettings();
  private resolvedSettings: ResolvedSettings = resolveSettings(this.settingsObject);
  /** Top-level fields in order of first appearance: the searchable list under `["*"]`. */
  private readonly fieldOrder: string[] = [];
  private readonly knownFields = new Set<string>();
  private textIndex: TextIndex | null = null;
  private nextSeq = 0;
  /** Placeholder-search orders (by sort criteria), valid until the next change. */
  private readonly orderCache = new Map<string, DocumentRecord[]>();
  /** Field values by document for filters and facets, kept in step with every write. */
  readonly fieldStore = new FieldStore(() => this.records.values());

  constructor(
    readonly uid: string,
    primaryKey: string | null = null,
  ) {
    this.primaryKey = primaryKey;
  }

  get settings(): JsonObject {
    return this.settingsObject;
  }

  get resolved(): ResolvedSettings {
    return this.resolvedSettings;
  }

  get documentCount(): number {
    return this.records.size;
  }

  /** Top-level fields seen so far, for `facets: ["*"]` and stats. */
  get fields(): readonly string[] {
    return this.fieldOrder;
  }

  info(): IndexInfo {
    return {
      uid: this.uid,
      primaryKey: this.primaryKey,
      createdAt: this.createdAt.toISOString(),
      updatedAt: this.updatedAt.toISOString(),
    };
  }

  private touch(): void {
    this.updatedAt = new Date();
    this.orderCache.clear();
  }

  /**
   * All records in the order a placeholder search with these sort criteria returns them. Sorting
   * 100,000 records per query took tens of milliseconds; documents change far less often.
   */
  orderedRecords(key: string, sortAll: () => DocumentRecord[]): DocumentRecord[] {
    let ordered = this.orderCache.get(key);
    if (!ordered) {
      if (this.orderCache.size >= MAX_CACHED_ORDERS) this.orderCache.clear();
      ordered = sortAll();
      this.orderCache.set(key, ordered);
    }
    return ordered;
  }

  text(): TextIndex {
    const fields = this.searchableFields();
    if (!this.textIndex || !sameList(this.textIndex.fields, fields)) {
      this.textIndex = new TextIndex(fields, this.resolvedSettings.typoDisabledAttributes);
      this.textIndex.addAll(this.records.values());
    }
    return this.textIndex;
  }

  private searchableFields(): string[] {
    return this.resolvedSettings.searchableAttributes ?? [...this.fieldOrder];
  }

  updateSettings(patch: JsonObject): void {
    this.settingsObject = applySettingsPatch(this.settingsObject, patch);
    this.resolvedSettings = resolveSettings(this.settingsObject);
    // The typo-disabled attributes live inside the text index, so any settings change rebuilds it
    // lazily through text(); dropping it here keeps that rule in one place.
    this.textIndex = null;
    this.text();
    this.touch();
  }

  resetSettings(): void {
    this.updateSettings(defaultSettings());
  }

  setPrimaryKey(primaryKey: string): void {
    if (this.primaryKey !== null && this.primaryKey !== primaryKey && this.records.size > 0) {
      throw primaryKeyAlreadyExists(this.uid, this.primaryKey);
    }
    this.primaryKey = primaryKey;
    this.touch();
  }

  /** Applies one document addition task; throws (and changes nothing) if any document is invalid. */
  writeDocuments(documents: JsonObject[], mode: WriteMode, requestedPrimaryKey: string | null): number {
    let primaryKey = this.primaryKey;
    if (requestedPrimaryKey !== null) {
      if (primaryKey !== null && primaryKey !== requestedPrimaryKey) throw primaryKeyAlreadyExists(this.uid, primaryKey);
      primaryKey = requestedPrimaryKey;
    }
    if (documents.length === 0) return 0;
    primaryKey ??= inferPrimaryKey(this.uid, documents[0] as JsonObject);

    // Validate every id first so a bad document fails the whole task, as in Meilisearch.
    const incoming = new Map<string, JsonObject>();
    for (const doc of documents) {
      const id = documentIdOf(this.uid, primaryKey, doc);
      const earlier = incoming.get(id);
      incoming.set(id, mode === 'update' && earlier ? { ...earlier, ...doc } : doc);
    }
    this.primaryKey = primaryKey;

    const fieldsBefore = this.fieldOrder.length;
    const changed: DocumentRecord[] = [];
    for (const [id, doc] of incoming) {
      this.noteFields(doc);
      const existing = this.records.get(id);
      if (existing) {
        this.textIndex?.discard(existing.seq);
        existing.doc = mode === 'update' ? { ...existing.doc, ...doc } : doc;
        existing.facts = null;
        changed.push(existing);
      } else {
        const record: DocumentRecord = { seq: this.nextSeq++, id, doc, facts: null };
        this.records.set(id, record);
        this.bySeq.set(record.seq, record);
        changed.push(record);
      }
    }
    for (const record of changed) this.fieldStore.written(record);
    const searchableChanged = this.resolvedSettings.searchableAttributes === null && this.fieldOrder.length !== fieldsBefore;
    if (this.textIndex && !searchableChanged) this.textIndex.addAll(changed);
    else this.text();
    this.compactTextIfStale();
    this.touch();
    return incoming.size;
  }

  /** Rewritten and deleted documents leave stale postings; rebuild once they dominate. */
  private compactTextIfStale(): void {
    if (this.textIndex && this.textIndex.slotCount > 2 * this.records.size + STALE_SLOT_ALLOWANCE) {
      this.textIndex = null;
      this.text();
    }
  }

  private noteFields(doc: JsonObject): void {
    for (const key of Object.keys(doc)) {
      if (!this.knownFields.has(key)) {
        this.knownFields.add(key);
        this.fieldOrder.push(key);
      }
    }
  }

  deleteDocuments(ids: Iterable<string>): number {
    let deleted = 0;
    for (const id of ids) {
      const record = this.records.get(id);
      if (!record) continue;
      this.records.delete(id);
      this.bySeq.delete(record.seq);
      this.textIndex?.discard(record.seq);
      this.fieldStore.deleted(record.seq);
      deleted++;
    }
    if (deleted > 0) {
      this.compactTextIfStale();
      this.touch();
    }
    return deleted;
  }

  deleteMatching(predicate: DocumentPredicate): number {
    const ids: string[] = [];
    for (const record of this.records.values()) if (predicate(record)) ids.push(record.id);
    return this.deleteDocuments(ids);
  }

  deleteAll(): number {
    const deleted = this.records.size;
    this.records.clear();
    this.bySeq.clear();
    this.textIndex = null;
    this.fieldStore.clear();
    this.touch();
    return deleted;
  }

  /** How many documents hold each top-level field, for the stats route. */
  fieldDistribution(): Record<string, number> {
    const counts: Record<string, number> = {};
    for (const record of this.records.values()) {
      for (const key of Object.keys(record.doc)) counts[key] = (counts[key] ?? 0) + 1;
    }
    return counts;
  }
}

function sameList(left: readonly string[], right: readonly string[]): boolean {
  return left.length === right.length && left.every((value, i) => value === right[i]);
}

function primaryKeyAlreadyExists(indexUid: string, primaryKey: string): MeiliError {
  return new MeiliError(
    400,
    'index_primary_key_already_exists',
    `Index \`${indexUid}\`: Index already has a primary key: \`${primaryKey}\`.`,
  );
}
