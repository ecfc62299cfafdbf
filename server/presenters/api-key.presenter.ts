import type { ApiKey, ApiKeyList, CreatedApiKey } from '../../shared/schemas/api-keys';
import type { ApiKeyEntity } from '../entities';

/** A key as listed: its hash never leaves, and the key itself is not kept to leave. */
export function presentApiKey(k: ApiKeyEntity): ApiKey {
  return {
    id: k.id,
    name: k.name,
    scope: k.scope,
    prefix: k.prefix,
    createdBy: k.creator ? { id: k.creator.id, name: k.creator.name } : null,
    createdAt: k.createdAt.toISOString(),
    lastUsedAt: k.lastUsedAt?.toISOString() ?? null,
    revokedAt: k.revokedAt?.toISOString() ?? null,
  };
}

export const presentApiKeys = (keys: ApiKeyEntity[]): ApiKeyList => ({ apiKeys: keys.map(presentApiKey) });

/** The answer to creating a key: the one time the key is shown. */
export function presentCreatedApiKey(k: ApiKeyEntity, key: string): CreatedApiKey {
  return { id: k.id, name: k.name, scope: k.scope, key };
}
