export const settingsKeys = { all: ['settings'] as const };
