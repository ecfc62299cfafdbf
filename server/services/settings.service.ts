import type { DataSource } from 'typeorm';
import { DEFAULT_SETTINGS, settingsSchema, type Settings } from '../../shared/schemas/settings';
import { audit } from './audit.service';

const KEY = 'app';
/** Settings are read on every comparison; a few seconds of caching spares a query per request. */
const CACHE_MS = 5_000;
const cache = new WeakMap<DataSource, { at: number; value: Settings }>();

/**
 * The admin's settings, stored as one JSON document; anything not stored falls back to the
 * defaults of shared/, so a new threshold needs no data migration.
 */
export async function getSettings(ds: DataSource): Promise<Settings> {
  const hit = cache.get(ds);
  if (hit && Date.now() - hit.at < CACHE_MS) return hit.value;
  const value = await readSettings(ds);
  cache.set(ds, { at: Date.now(), value });
  return value;
}

async function readSettings(ds: DataSource): Promise<Settings> {
  const rows = (await ds.query(`SELECT value FROM setting WHERE key = $1`, [KEY])) as { value: Partial<Settings> }[];
  const stored = rows[0]?.value ?? {};
  const merged = {
    compat: {
      ...DEFAULT_SETTINGS.compat,
      ...(stored.compat ?? {}),
      loadPoints: { ...DEFAULT_SETTINGS.compat.loadPoints, ...(stored.compat?.loadPoints ?? {}) },
    },
    priceList: { ...DEFAULT_SETTINGS.priceList, ...(stored.priceList ?? {}) },
  };
  const parsed = settingsSchema.safeParse(merged);
  return parsed.success ? parsed.data : DEFAULT_SETTINGS;
}

export async function saveSettings(ds: DataSource, actorId: string, settings: Settings): Promise<Settings> {
  await ds.transaction(async (m) => {
    await m.query(
      `INSERT INTO setting (key, value, updated_at) VALUES ($1, $2, now()) ON CONFLICT (key) DO UPDATE SET value = EXCLUDED.value, updated_at = now()`,
      [KEY, JSON.stringify(settings)],
    );
    await audit(m, { actorId, action: 'settings.update', entityType: 'setting', entityId: KEY, data: { settings } });
  });
  cache.delete(ds);
  return getSettings(ds);
}
