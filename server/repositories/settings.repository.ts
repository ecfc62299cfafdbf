import { z } from 'zod';
import { execute, queryOne, type Executor } from '../db/executor';

/**
 * The admin's settings are one JSON document under one key. What is stored may be older than the
 * code (a threshold added since): each part is an open object here, merged with the defaults and
 * checked whole by the settings service.
 */
const storedSettingsSchema = z.object({
  compat: z.looseObject({ loadPoints: z.looseObject({}).optional() }).optional(),
  priceList: z.looseObject({}).optional(),
  store: z.looseObject({}).optional(),
});
export type StoredSettings = z.infer<typeof storedSettingsSchema>;

/** The settings' one row; the audit log files a change under it. */
export const SETTINGS_KEY = 'app';
const settingRowSchema = z.object({ value: storedSettingsSchema });

export async function readStoredSettings(ex: Executor): Promise<StoredSettings> {
  return (await queryOne(ex, settingRowSchema, `SELECT value FROM setting WHERE key = $1`, [SETTINGS_KEY]))?.value ?? {};
}

export async function writeSettings(ex: Executor, settings: object): Promise<void> {
  await execute(
    ex,
    `INSERT INTO setting (key, value, updated_at) VALUES ($1, $2, now()) ON CONFLICT (key) DO UPDATE SET value = EXCLUDED.value, updated_at = now()`,
    [SETTINGS_KEY, JSON.stringify(settings)],
  );
}
