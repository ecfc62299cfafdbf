import { z } from 'zod';
import { compatSettingsSchema, DEFAULT_COMPAT_SETTINGS } from '../compat/settings';
import { PRICE_LIST_LIMITS } from '../price-list/fields';
import { text } from './text';

/** Price-list intake settings an admin can change. */
export const priceListSettingsSchema = z.object({
  /** A cost or list move above this percent is flagged in the preview. */
  flagThresholdPct: z.number().min(0).max(1000),
  maxFileMb: z.number().positive().max(500),
});
export type PriceListSettings = z.infer<typeof priceListSettingsSchema>;

export const DEFAULT_PRICE_LIST_SETTINGS: PriceListSettings = {
  flagThresholdPct: 15,
  maxFileMb: PRICE_LIST_LIMITS.maxFileBytes / (1024 * 1024),
};

/** The store as fit reports name it to customers: its name and how to reach it. */
export const storeSettingsSchema = z.object({
  name: text({ min: 1, max: 120 }),
  phone: text({ max: 40 }),
  address: text({ max: 300, multiline: true }),
});
export type StoreSettings = z.infer<typeof storeSettingsSchema>;

/** The invented demo store (555-01xx numbers are set aside for fiction in the North American plan, from memory). */
export const DEFAULT_STORE_SETTINGS: StoreSettings = {
  name: 'Quillmere Auto Parts',
  phone: '(555) 010-4477',
  address: '12 Tanner Row, Quillmere',
};

export const settingsSchema = z
  .object({ compat: compatSettingsSchema, priceList: priceListSettingsSchema, store: storeSettingsSchema })
  .meta({ id: 'Settings' });
export type Settings = z.infer<typeof settingsSchema>;

export const DEFAULT_SETTINGS: Settings = {
  compat: DEFAULT_COMPAT_SETTINGS,
  priceList: DEFAULT_PRICE_LIST_SETTINGS,
  store: DEFAULT_STORE_SETTINGS,
};

/** GET and PUT /api/settings. */
export const settingsResponseSchema = z.object({ settings: settingsSchema });
export type SettingsResponse = z.infer<typeof settingsResponseSchema>;

/** PUT /api/settings: the store's details may be left out (they are kept as they are). */
export const updateSettingsBodySchema = z.object({ settings: settingsSchema.extend({ store: storeSettingsSchema.optional() }) });
export type UpdateSettingsBody = z.infer<typeof updateSettingsBodySchema>;
