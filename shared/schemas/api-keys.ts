import { z } from 'zod';
import { text } from './text';

/**
 * API keys for the store's other systems (point of sale, web shop). `read` reaches search,
 * vehicles, engines, parts and compatibility; `write` also catalog edits and price lists.
 */
export const API_KEY_SCOPES = ['read', 'write'] as const;
export type ApiKeyScope = (typeof API_KEY_SCOPES)[number];

/** Whether a key of scope `held` may call a route that needs `needed`: write includes read. */
export const scopeCovers = (held: ApiKeyScope, needed: ApiKeyScope): boolean =>
  API_KEY_SCOPES.indexOf(held) >= API_KEY_SCOPES.indexOf(needed);

export const API_KEY_NAME_MAX = 80;

export const createApiKeyBodySchema = z.object({
  name: text({ max: API_KEY_NAME_MAX }).min(1, 'give the key a name, such as the system that will use it'),
  scope: z.enum(API_KEY_SCOPES),
});
export type CreateApiKeyBody = z.infer<typeof createApiKeyBodySchema>;

const apiKeyBaseSchema = z.object({ id: z.string().uuid(), name: z.string(), scope: z.enum(API_KEY_SCOPES) });

/** POST /api/api-keys: the key itself, shown this once; only its hash is kept. */
export const createdApiKeySchema = apiKeyBaseSchema.extend({ key: z.string() });
export type CreatedApiKey = z.infer<typeof createdApiKeySchema>;

/** A key as listed: never the key, only its first characters to recognise it by. */
export const apiKeySchema = apiKeyBaseSchema.extend({
  prefix: z.string(),
  createdBy: z.object({ id: z.string().uuid(), name: z.string() }).nullable(),
  createdAt: z.string(),
  lastUsedAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
});
export type ApiKey = z.infer<typeof apiKeySchema>;

export const apiKeyListSchema = z.object({ apiKeys: z.array(apiKeySchema) });
export type ApiKeyList = z.infer<typeof apiKeyListSchema>;

export const apiKeyIdParamSchema = z.object({ id: z.string().uuid() });
