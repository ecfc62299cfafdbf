import { createHash, randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import type { CreateApiKeyBody } from '../../shared/schemas/api-keys';
import type { ApiKeyEntity } from '../entities';
import { AppError } from '../errors';
import {
  findApiKey,
  findLiveKeyByHash,
  insertApiKey,
  listApiKeys as keyRows,
  liveKeyNamed,
  markRevoked,
  touchLastUsed,
} from '../repositories/api-keys.repository';
import { audit } from '../repositories/audit.repository';

/** Marks the text as an Arcwise key, so a leaked one is recognisable in logs and secret scanners. */
const KEY_MARK = 'arc_';
/** The mark and 8 characters of the random part: enough to tell keys apart, far too few to guess the rest. */
const PREFIX_CHARS = KEY_MARK.length + 8;

/**
 * SHA-256 is enough for these keys, unlike passwords: each holds 256 random bits, so there is no
 * dictionary to try, and a fast hash keeps every API call cheap.
 */
const hashKey = (key: string): string => createHash('sha256').update(key).digest('hex');

/** Makes a key; the caller shows it once. The row keeps only its hash and its prefix. */
export async function createApiKey(
  ds: DataSource,
  actorId: string,
  body: CreateApiKeyBody,
): Promise<{ entity: ApiKeyEntity; key: string }> {
  const key = `${KEY_MARK}${randomBytes(32).toString('base64url')}`;
  const entity = await ds.transaction(async (m) => {
    if (await liveKeyNamed(m, body.name))
      throw AppError.conflict(`A key named “${body.name}” exists already: revoke it first or choose another name.`);
    const saved = await insertApiKey(m, {
      name: body.name,
      scope: body.scope,
      keyHash: hashKey(key),
      prefix: key.slice(0, PREFIX_CHARS),
      createdBy: actorId,
    });
    await audit(m, {
      actorId,
      action: 'api-key.create',
      entityType: 'api_key',
      entityId: saved.id,
      data: { name: body.name, scope: body.scope },
    });
    return saved;
  });
  return { entity, key };
}

export function listApiKeys(ds: DataSource): Promise<ApiKeyEntity[]> {
  return keyRows(ds.manager);
}

/** Revoking is final: the key is refused from its next call on. Revoking a revoked key changes nothing. */
export async function revokeApiKey(ds: DataSource, actorId: string, id: string): Promise<void> {
  await ds.transaction(async (m) => {
    const key = await findApiKey(m, id);
    if (!key) throw AppError.notFound('API key');
    if (key.revokedAt) return;
    await markRevoked(m, id);
    await audit(m, { actorId, action: 'api-key.revoke', entityType: 'api_key', entityId: id, data: { name: key.name } });
  });
}

/** The live key a caller presented, or null for an unknown or revoked one. */
export async function findLiveKey(ds: DataSource, presented: string): Promise<ApiKeyEntity | null> {
  if (!presented.startsWith(KEY_MARK)) return null;
  return findLiveKeyByHash(ds.manager, hashKey(presented));
}

export interface KeyCall {
  method: string;
  path: string;
  status: number;
}

/** Audit writes of key calls still under way: each starts when its answer has gone out. */
const recording = new Set<Promise<void>>();

/** Every call made with a key goes into the audit log under the key's name; last use is kept to the minute. */
export function recordKeyCall(ds: DataSource, key: Pick<ApiKeyEntity, 'id' | 'name'>, call: KeyCall): Promise<void> {
  const write = (async () => {
    await audit(ds.manager, {
      actorId: null,
      action: 'api-key.call',
      entityType: 'api_key',
      entityId: key.id,
      data: { key: key.name, method: call.method, path: call.path.slice(0, 500), status: call.status },
    });
    await touchLastUsed(ds.manager, key.id);
  })();
  recording.add(write);
  void write.finally(() => recording.delete(write)).catch(() => undefined);
  return write;
}

/** Waits for the audit rows of calls already answered, so a shutdown does not lose them. */
export async function keyCallsRecorded(): Promise<void> {
  await Promise.allSettled([...recording]);
}
