import type { Settings, SettingsResponse } from '../../shared/schemas/settings';

/** GET and PUT /api/settings: the settings in force, defaults filled in. */
export const presentSettings = (settings: Settings): SettingsResponse => ({ settings });
