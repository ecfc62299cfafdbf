import { describe, expect, it } from 'vitest';
import { DEFAULT_COMPAT_SETTINGS, compatSettingsSchema } from '../../../shared/compat/settings';

describe('compat settings', () => {
  it('holds the defaults of compat-model.md', () => {
    expect(compatSettingsSchema.parse(DEFAULT_COMPAT_SETTINGS)).toEqual(DEFAULT_COMPAT_SETTINGS);
    expect(DEFAULT_COMPAT_SETTINGS).toMatchObject({
      crankingVoltageV: 10,
      chargingVoltageV: 14.5,
      flybackPeakV: 400,
      wearAllowanceMm: 0.2,
      primaryWindowWidenPct: 10,
      driverCurrentReviewPct: 15,
      energyGoRatio: 0.9,
      energyReviewRatio: 0.75,
      reserveGoPct: 20,
      availableReviewRatio: 0.9,
      turnsRatioTolerancePct: 15,
      reachToleranceMm: 0.3,
      gapToleranceMm: 0.05,
      requiredReviewRatio: 1.1,
      polytropicN: 1.3,
      shortFractionOfLow: 0.1,
      copperAlphaPerK: 0.00393,
    });
    expect(DEFAULT_COMPAT_SETTINGS.loadPoints).toEqual({
      idle: { mapKpa: 35, advanceDeg: 12, tempK: 330 },
      cruise: { mapKpa: 60, advanceDeg: 30, tempK: 320 },
      full: { mapKpa: 98, advanceDeg: 22, tempK: 310 },
      boost: { mapKpaAboveFull: 0, advanceDeg: 15, tempK: 320 },
    });
  });

  it('rejects a review ratio above the go ratio and out-of-range values', () => {
    expect(compatSettingsSchema.safeParse({ ...DEFAULT_COMPAT_SETTINGS, energyReviewRatio: 0.95 }).success).toBe(false);
    expect(compatSettingsSchema.safeParse({ ...DEFAULT_COMPAT_SETTINGS, polytropicN: 0.5 }).success).toBe(false);
    expect(compatSettingsSchema.safeParse({ ...DEFAULT_COMPAT_SETTINGS, requiredReviewRatio: 0.9 }).success).toBe(false);
    expect(compatSettingsSchema.safeParse({ ...DEFAULT_COMPAT_SETTINGS, crankingVoltageV: Number.NaN }).success).toBe(false);
  });
});
