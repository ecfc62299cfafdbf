import { z } from 'zod';
import { compatSettingsSchema, DEFAULT_COMPAT_SETTINGS } from '../compat/settings';
import { PRICE_LIST_LIMITS } from '../price-list/fields';

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

export const settingsSchema = z.object({ compat: compatSettingsSchema, priceList: priceListSettingsSchema }).meta({ id: 'Settings' });
export type Settings = z.infer<typeof settingsSchema>;

export const DEFAULT_SETTINGS: Settings = { compat: DEFAULT_COMPAT_SETTINGS, priceList: DEFAULT_PRICE_LIST_SETTINGS };

/** GET and PUT /api/settings. */
export const settingsResponseSchema = z.object({ settings: settingsSchema });
export type SettingsResponse = z.infer<typeof settingsResponseSchema>;

export const updateSettingsBodySchema = settingsResponseSchema;
export type UpdateSettingsBody = z.infer<typeof updateSettingsBodySchema>;
