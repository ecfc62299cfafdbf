import { createHash, randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { IsNull } from 'typeorm';
import type { CreateApiKeyBody } from '../../shared/schemas/api-keys';
import { ApiKeyEntity } from '../entities';
import { AppError } from '../errors';
import { audit } from './audit.service';

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
    const live = await m
      .createQueryBuilder(ApiKeyEntity, 'k')
      .where('lower(k.name) = lower(:name) AND k.revoked_at IS NULL', { name: body.name })
      .getExists();
    if (live) throw AppError.conflict(`A key named “${body.name}” exists already: revoke it first or choose another name.`);
    const saved = await m.save(
      ApiKeyEntity,
      m.create(ApiKeyEntity, {
        name: body.name,
        scope: body.scope,
        keyHash: hashKey(key),
        prefix: key.slice(0, PREFIX_CHARS),
        createdBy: actorId,
      }),
    );
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

export async function listApiKeys(ds: DataSource): Promise<ApiKeyEntity[]> {
  return ds
    .getRepository(ApiKeyEntity)
    .find({ relations: { creator: true }, order: { revokedAt: { direction: 'DESC', nulls: 'FIRST' }, createdAt: 'DESC' } });
}

/** Revoking is final: the key is refused from its next call on. Revoking a revoked key changes nothing. */
export async function revokeApiKey(ds: DataSource, actorId: string, id: string): Promise<void> {
  await ds.transaction(async (m) => {
    const key = await m.findOneBy(ApiKeyEntity, { id });
    if (!key) throw AppError.notFound('API key');
    if (key.revokedAt) return;
    await m.update(ApiKeyEntity, { id }, { revokedAt: () => 'now()' });
    await audit(m, { actorId, action: 'api-key.revoke', entityType: 'api_key', entityId: id, data: { name: key.name } });
  });
}

/** The live key a caller presented, or null for an unknown or revoked one. */
export async function findLiveKey(ds: DataSource, presented: string): Promise<ApiKeyEntity | null> {
  if (!presented.startsWith(KEY_MARK)) return null;
  return ds.getRepository(ApiKeyEntity).findOneBy({ keyHash: hashKey(presented), revokedAt: IsNull() });
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
    await ds.query(
      `UPDATE api_key SET last_used_at = now() WHERE id = $1 AND (last_used_at IS NULL OR last_used_at < now() - interval '1 minute')`,
      [key.id],
    );
  })();
  recording.add(write);
  void write.finally(() => recording.delete(write)).catch(() => undefined);
  return write;
}

/** Waits for the audit rows of calls already answered, so a shutdown does not lose them. */
export async function keyCallsRecorded(): Promise<void> {
  await Promise.allSettled([...recording]);
}
