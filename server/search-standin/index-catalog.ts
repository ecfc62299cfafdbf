/** All indexes of one stand-in instance, by uid. */
import { badRequest, indexNotFound, MeiliError } from './meili-error';
import { StandinIndex } from './standin-index';

const VALID_UID = /^[a-zA-Z0-9_-]{1,400}$/;

export function assertValidIndexUid(uid: unknown): string {
  if (typeof uid !== 'string' || !VALID_UID.test(uid)) {
    throw badRequest(
      'invalid_index_uid',
      `\`${String(uid)}\` is not a valid index uid. Index uid can be an integer or a string containing only alphanumeric characters, hyphens (-) and underscores (_), and can not be more than 400 bytes.`,
    );
  }
  return uid;
}

export class IndexCatalog {
  private readonly indexes = new Map<string, StandinIndex>();

  find(uid: string): StandinIndex | undefined {
    return this.indexes.get(uid);
  }

  get(uid: string): StandinIndex {
    const index = this.indexes.get(uid);
    if (!index) throw indexNotFound(uid);
    return index;
  }

  /** Document and settings writes create a missing index, as they do in Meilisearch. */
  getOrCreate(uid: string, primaryKey: string | null = null): StandinIndex {
    let index = this.indexes.get(uid);
    if (!index) {
      index = new StandinIndex(uid, primaryKey);
      this.indexes.set(uid, index);
    }
    return index;
  }

  create(uid: string, primaryKey: string | null): StandinIndex {
    if (this.indexes.has(uid)) {
      throw new MeiliError(409, 'index_already_exists', `Index \`${uid}\` already exists.`);
    }
    return this.getOrCreate(uid, primaryKey);
  }

  delete(uid: string): number {
    const index = this.get(uid);
    this.indexes.delete(uid);
    return index.documentCount;
  }

  list(): StandinIndex[] {
    return [...this.indexes.values()].sort((a, b) => (a.uid < b.uid ? -1 : a.uid > b.uid ? 1 : 0));
  }
}
