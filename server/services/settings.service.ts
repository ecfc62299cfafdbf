import type { DataSource } from 'typeorm';
import { DEFAULT_SETTINGS, settingsSchema, type Settings, type UpdateSettingsBody } from '../../shared/schemas/settings';
import { audit } from '../repositories/audit.repository';
import { readStoredSettings, SETTINGS_KEY, writeSettings } from '../repositories/settings.repository';

/**
 * Settings are read on every comparison, search and price-list intake, so each app server keeps
 * them in memory. A save here drops this server's copy at once; another server's copy lives at
 * most this long, so a change reaches every server within a few seconds without a connection of
 * its own to listen on.
 */
const CACHE_MS = 5_000;
const cache = new WeakMap<DataSource, { at: number; value: Settings }>();

/**
 * The admin's settings — the one way anything reads them. Stored as one JSON document; anything
 * not stored falls back to the defaults of shared/, so a new threshold needs no data migration.
 */
export async function getSettings(ds: DataSource): Promise<Settings> {
  const hit = cache.get(ds);
  if (hit && Date.now() - hit.at < CACHE_MS) return hit.value;
  const value = await readSettings(ds);
  cache.set(ds, { at: Date.now(), value });
  return value;
}

async function readSettings(ds: DataSource): Promise<Settings> {
  const stored = await readStoredSettings(ds.manager);
  const merged = {
    compat: {
      ...DEFAULT_SETTINGS.compat,
      ...(stored.compat ?? {}),
      loadPoints: { ...DEFAULT_SETTINGS.compat.loadPoints, ...(stored.compat?.loadPoints ?? {}) },
    },
    priceList: { ...DEFAULT_SETTINGS.priceList, ...(stored.priceList ?? {}) },
    store: { ...DEFAULT_SETTINGS.store, ...(stored.store ?? {}) },
  };
  const parsed = settingsSchema.safeParse(merged);
  return parsed.success ? parsed.data : DEFAULT_SETTINGS;
}

/** PUT /api/settings: saved with its audit row, and this server's cached copy dropped. */
export async function saveSettings(ds: DataSource, actorId: string, body: UpdateSettingsBody['settings']): Promise<Settings> {
  const settings: Settings = { ...body, store: body.store ?? (await readSettings(ds)).store };
  await ds.transaction(async (m) => {
    await writeSettings(m, settings);
    await audit(m, { actorId, action: 'settings.update', entityType: 'setting', entityId: SETTINGS_KEY, data: { settings } });
  });
  cache.delete(ds);
  return getSettings(ds);
}

/** What the price-list intake takes from the settings: the file size limit in bytes and the flag threshold. */
export interface IntakeSettings {
  maxFileBytes: number;
  flagThresholdPct: number;
}

export async function intakeSettings(ds: DataSource): Promise<IntakeSettings> {
  const { priceList } = await getSettings(ds);
  return { maxFileBytes: Math.round(priceList.maxFileMb * 1024 * 1024), flagThresholdPct: priceList.flagThresholdPct };
}
