/**
 * One stored document. `seq` is its internal number: it orders placeholder results the way
 * Meilisearch's internal ids do, and it is the id the text index knows the document by.
 */
import { fieldFacts, type FieldFacts, type JsonObject } from './field-paths';

export interface DocumentRecord {
  seq: number;
  id: string;
  doc: JsonObject;
  /** Per-field facts, filled the first time a filter, facet or sort reads the field. */
  facts: Map<string, FieldFacts> | null;
}

export function factsOf(record: DocumentRecord, path: string): FieldFacts {
  record.facts ??= new Map();
  let facts = record.facts.get(path);
  if (!facts) {
    facts = fieldFacts(record.doc, path);
    record.facts.set(path, facts);
  }
  return facts;
}
