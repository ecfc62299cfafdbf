import { IsNull, type EntityManager } from 'typeorm';
import type { ApiKeyScope } from '../../shared/schemas/api-keys';
import { execute, type Executor } from '../db/executor';
import { ApiKeyEntity } from '../entities';

/** True when a key not revoked has this name, in any case. */
export function liveKeyNamed(ex: EntityManager, name: string): Promise<boolean> {
  return ex.createQueryBuilder(ApiKeyEntity, 'k').where('lower(k.name) = lower(:name) AND k.revoked_at IS NULL', { name }).getExists();
}

export interface NewApiKey {
  name: string;
  scope: ApiKeyScope;
  keyHash: string;
  prefix: string;
  createdBy: string;
}

export function insertApiKey(ex: EntityManager, key: NewApiKey): Promise<ApiKeyEntity> {
  const repo = ex.getRepository(ApiKeyEntity);
  return repo.save(repo.create(key));
}

/** Live keys first, then the revoked ones, newest first, each with the admin who made it. */
export function listApiKeys(ex: EntityManager): Promise<ApiKeyEntity[]> {
  return ex
    .getRepository(ApiKeyEntity)
    .find({ relations: { creator: true }, order: { revokedAt: { direction: 'DESC', nulls: 'FIRST' }, createdAt: 'DESC' } });
}

export function findApiKey(ex: EntityManager, id: string): Promise<ApiKeyEntity | null> {
  return ex.getRepository(ApiKeyEntity).findOneBy({ id });
}

export async function markRevoked(ex: EntityManager, id: string): Promise<void> {
  await ex.getRepository(ApiKeyEntity).update({ id }, { revokedAt: () => 'now()' });
}

export function findLiveKeyByHash(ex: EntityManager, keyHash: string): Promise<ApiKeyEntity | null> {
  return ex.getRepository(ApiKeyEntity).findOneBy({ keyHash, revokedAt: IsNull() });
}

/** Last use, kept to the minute: one write a minute per busy key, not one per call. */
export async function touchLastUsed(ex: Executor, id: string): Promise<void> {
  await execute(
    ex,
    `UPDATE api_key SET last_used_at = now() WHERE id = $1 AND (last_used_at IS NULL OR last_used_at < now() - interval '1 minute')`,
    [id],
  );
}
