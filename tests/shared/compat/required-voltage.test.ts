import { describe, expect, it } from 'vitest';
import { CompatInputError } from '../../../shared/compat/errors';
import { loadPointConditions, requiredVoltageAtLoadPoints } from '../../../shared/compat/required-voltage';
import { DEFAULT_COMPAT_SETTINGS } from '../../../shared/compat/settings';
import type { LoadPointName } from '../../../shared/compat/types';
import { makeEngine } from './factories';

const settings = DEFAULT_COMPAT_SETTINGS;

function requiredKv(points: ReturnType<typeof requiredVoltageAtLoadPoints>, name: LoadPointName): number {
  const point = points.find((p) => p.name === name);
  if (!point) throw new Error(`no ${name} load point`);
  return point.requiredKv;
}

describe('required secondary voltage', () => {
  // 10:1 engine, rod ratio 3.5, 0.8 mm spec gap + 0.2 mm wear allowance = 1.0 mm effective
  const worked = requiredVoltageAtLoadPoints({ engine: makeEngine({ specGapMm: 0.8 }), settings });

  it('matches the worked example: about 11.6 kV at idle and 24.3 kV at full load', () => {
    // compat-model.md §3 worked example, arithmetic from the constants above
    expect(requiredKv(worked, 'idle')).toBeCloseTo(11.6, 1);
    expect(requiredKv(worked, 'full')).toBeCloseTo(24.3, 1);
    expect(worked.every((p) => Math.abs(p.gapMm - 1.0) < 1e-9)).toBe(true);
  });

  it('lands in the trade ranges for a 10:1 engine at 1.0 mm', () => {
    // about 10 kV at idle (6–14 kV seen) and 20–30 kV under load (common practice);
    // T. Denton, Automobile Electrical and Electronic Systems, 4th ed., ignition chapter
    const idle = requiredKv(worked, 'idle');
    const full = requiredKv(worked, 'full');
    expect(idle).toBeGreaterThanOrEqual(6);
    expect(idle).toBeLessThanOrEqual(14);
    expect(full).toBeGreaterThanOrEqual(20);
    expect(full).toBeLessThanOrEqual(30);
  });

  it('needs 8–10 kV for an 8:1 engine and up to about 30 kV at high compression', () => {
    // T. Denton, Automobile Electrical and Electronic Systems, 4th ed., ignition chapter
    const eightToOne = requiredVoltageAtLoadPoints({
      engine: makeEngine({ compressionRatio: 8, specGapMm: 0.7 }),
      settings,
    });
    expect(requiredKv(eightToOne, 'idle')).toBeGreaterThanOrEqual(8);
    expect(requiredKv(eightToOne, 'idle')).toBeLessThanOrEqual(10);
    const twelveToOne = requiredVoltageAtLoadPoints({
      engine: makeEngine({ compressionRatio: 12, specGapMm: 0.8 }),
      settings,
    });
    expect(requiredKv(twelveToOne, 'full')).toBeGreaterThan(requiredKv(worked, 'full'));
    expect(requiredKv(twelveToOne, 'full')).toBeLessThanOrEqual(30);
  });

  it('uses a given gap instead of the spec gap, plus the wear allowance', () => {
    const points = requiredVoltageAtLoadPoints({
      engine: makeEngine({ specGapMm: 0.6 }),
      gapMm: 0.8,
      settings,
    });
    expect(points.map((p) => p.requiredKv)).toEqual(worked.map((p) => p.requiredKv));
    const noWear = requiredVoltageAtLoadPoints({
      engine: makeEngine(),
      settings: { ...settings, wearAllowanceMm: 0 },
    });
    expect(requiredKv(noWear, 'full')).toBeLessThan(requiredKv(worked, 'full'));
  });

  it('adds a boost point only where the engine has boost, at full-load MAP plus peak boost', () => {
    expect(worked.map((p) => p.name)).toEqual(['idle', 'cruise', 'full']);
    const turbo = makeEngine({ aspiration: 'turbo', peakBoostKpa: 60 });
    const conditions = loadPointConditions(turbo, settings);
    expect(conditions.map((p) => p.name)).toEqual(['idle', 'cruise', 'full', 'boost']);
    expect(conditions[3]).toEqual({ name: 'boost', mapKpa: 158, advanceDeg: 15, tempK: 320 });
    const boosted = requiredVoltageAtLoadPoints({ engine: turbo, settings });
    expect(requiredKv(boosted, 'boost')).toBeGreaterThan(requiredKv(boosted, 'full'));
    // a turbo engine declared with no boost has no boost point
    expect(loadPointConditions(makeEngine({ aspiration: 'turbo', peakBoostKpa: 0 }), settings)).toHaveLength(3);
  });

  it('rejects nonsense with the field named', () => {
    expect(() =>
      requiredVoltageAtLoadPoints({
        engine: makeEngine({ compressionRatio: Number.NaN }),
        settings,
      }),
    ).toThrow(CompatInputError);
    try {
      requiredVoltageAtLoadPoints({
        engine: makeEngine(),
        gapMm: Number.POSITIVE_INFINITY,
        settings,
      });
      expect.unreachable('an infinite gap must throw');
    } catch (error) {
      expect(error).toBeInstanceOf(CompatInputError);
      expect((error as CompatInputError).field).toBe('gapMm');
    }
    // a gap so small that p·d falls left of the Paschen minimum is outside the model
    expect(() =>
      requiredVoltageAtLoadPoints({
        engine: makeEngine(),
        gapMm: 0.0001,
        settings: { ...settings, wearAllowanceMm: 0 },
      }),
    ).toThrow(/gapMm/);
  });
});
