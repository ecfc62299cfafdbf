import { z } from 'zod';

/**
 * Every threshold and load point of the compatibility model, as an admin may change them in
 * Settings. Values are in trade units (V, mm, kPa, degrees, K, %) like the rest of the settings
 * page; the model converts them through shared/units.ts.
 */

const loadPointSchema = z.object({
  mapKpa: z.number().positive().max(400),
  advanceDeg: z.number().min(0).max(60),
  tempK: z.number().min(200).max(500),
});

const boostLoadPointSchema = z.object({
  /** Extra manifold pressure on top of full-load MAP plus the engine's peak boost (normally 0). */
  mapKpaAboveFull: z.number().min(0).max(200),
  advanceDeg: z.number().min(0).max(60),
  tempK: z.number().min(200).max(500),
});

const ratio = z.number().positive().max(5);
const pct = z.number().min(0).max(200);

export const compatSettingsSchema = z
  .object({
    crankingVoltageV: z.number().positive().max(60),
    chargingVoltageV: z.number().positive().max(60),
    flybackPeakV: z.number().positive().max(2_000),
    wearAllowanceMm: z.number().min(0).max(2),
    primaryWindowWidenPct: pct,
    driverCurrentReviewPct: pct,
    energyGoRatio: ratio,
    energyReviewRatio: ratio,
    reserveGoPct: pct,
    availableReviewRatio: ratio,
    turnsRatioTolerancePct: pct,
    reachToleranceMm: z.number().min(0).max(5),
    gapToleranceMm: z.number().min(0).max(1),
    requiredReviewRatio: ratio,
    polytropicN: z.number().min(1).max(1.67),
    shortFractionOfLow: z.number().min(0).max(1),
    copperAlphaPerK: z.number().positive().max(0.01),
    loadPoints: z.object({
      idle: loadPointSchema,
      cruise: loadPointSchema,
      full: loadPointSchema,
      boost: boostLoadPointSchema,
    }),
  })
  .superRefine((s, ctx) => {
    if (s.energyReviewRatio > s.energyGoRatio) {
      ctx.addIssue({
        code: 'custom',
        path: ['energyReviewRatio'],
        message: 'energyReviewRatio must not exceed energyGoRatio',
      });
    }
    if (s.availableReviewRatio > 1) {
      ctx.addIssue({
        code: 'custom',
        path: ['availableReviewRatio'],
        message: 'availableReviewRatio must not exceed 1',
      });
    }
    if (s.requiredReviewRatio < 1) {
      ctx.addIssue({
        code: 'custom',
        path: ['requiredReviewRatio'],
        message: 'requiredReviewRatio must be at least 1',
      });
    }
  });

export type CompatSettings = z.infer<typeof compatSettingsSchema>;

/** The defaults of compat-model.md; sources are named there. */
export const DEFAULT_COMPAT_SETTINGS: CompatSettings = {
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
  loadPoints: {
    idle: { mapKpa: 35, advanceDeg: 12, tempK: 330 },
    cruise: { mapKpa: 60, advanceDeg: 30, tempK: 320 },
    full: { mapKpa: 98, advanceDeg: 22, tempK: 310 },
    boost: { mapKpaAboveFull: 0, advanceDeg: 15, tempK: 320 },
  },
};
