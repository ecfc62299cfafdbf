import { describe, expect, it } from 'vitest';
import {
  availableVoltageV,
  inductiveKickV,
  primaryCurrentA,
  ratedAvailableVoltageV,
  sampleCurrentCurve,
  storedEnergyJ,
  timeConstantS,
  type PrimaryCircuit,
} from '../../../shared/compat/primary-circuit';
import { DEFAULT_COMPAT_SETTINGS } from '../../../shared/compat/settings';
import { jToMj, mhToH, msToS, usToS, vToKv } from '../../../shared/units';

const textbook: PrimaryCircuit = {
  voltageV: 12,
  resistanceOhm: 4,
  inductanceH: mhToH(6),
  currentLimitA: null,
};

describe('primary current (RL circuit)', () => {
  it('settles at V/R = 3 A storing 27 mJ, and gives 18 kV when opened in 1 µs', () => {
    // Alexander and Sadiku, Fundamentals of Electric Circuits, §7.9
    const final = primaryCurrentA(textbook, 100 * timeConstantS(textbook.inductanceH, textbook.resistanceOhm));
    expect(final).toBeCloseTo(3, 9);
    expect(jToMj(storedEnergyJ(textbook.inductanceH, final))).toBeCloseTo(27, 6);
    expect(vToKv(inductiveKickV(textbook.inductanceH, final, usToS(1)))).toBeCloseTo(18, 6);
  });

  it('reaches 63.2 % of V/R at t = τ', () => {
    // Alexander and Sadiku, Fundamentals of Electric Circuits, §7.9
    const tau = timeConstantS(textbook.inductanceH, textbook.resistanceOhm);
    expect(tau).toBeCloseTo(0.0015, 12);
    expect(primaryCurrentA(textbook, tau) / 3).toBeCloseTo(0.632, 3);
  });

  it('gives 7.00 A and 122 mJ for 5 mH, 0.5 Ω, 13.5 V after 3 ms', () => {
    // Alexander and Sadiku, Fundamentals of Electric Circuits, §7.9 (±0.5 %)
    const circuit: PrimaryCircuit = {
      voltageV: 13.5,
      resistanceOhm: 0.5,
      inductanceH: mhToH(5),
      currentLimitA: null,
    };
    const i = primaryCurrentA(circuit, msToS(3));
    expect(Math.abs(i / 7.0 - 1)).toBeLessThan(0.005);
    expect(Math.abs(jToMj(storedEnergyJ(circuit.inductanceH, i)) / 122 - 1)).toBeLessThan(0.005);
  });

  it('is capped by the driver limit', () => {
    const limited: PrimaryCircuit = { ...textbook, currentLimitA: 2 };
    expect(primaryCurrentA(limited, 1)).toBe(2);
    expect(primaryCurrentA(limited, 0)).toBe(0);
    expect(primaryCurrentA(limited, 0.0001)).toBeLessThan(2);
  });

  it('samples 0 … 1.5 × dwell, rising, for the chart', () => {
    const curve = sampleCurrentCurve(textbook, msToS(2));
    expect(curve).toHaveLength(61);
    expect(curve[0]).toEqual({ tMs: 0, amps: 0 });
    expect(curve.at(-1)?.tMs).toBeCloseTo(3, 9);
    for (let k = 1; k < curve.length; k++) {
      expect(curve[k]!.amps).toBeGreaterThan(curve[k - 1]!.amps);
    }
    expect(curve.at(-1)?.amps).toBeCloseTo(primaryCurrentA(textbook, msToS(3)), 12);
  });
});

describe('available secondary voltage', () => {
  it('estimates 400 V flyback × 100 turns ratio = 40 kV where no rating is given', () => {
    // common practice: 400 V flyback; turns ratios of 50:1 to 200:1, 100:1 most common
    expect(DEFAULT_COMPAT_SETTINGS.flybackPeakV).toBe(400);
    expect(vToKv(ratedAvailableVoltageV({ ratedV: null, turnsRatio: 100, flybackPeakV: 400 }))).toBe(40);
    expect(vToKv(ratedAvailableVoltageV({ ratedV: 35_000, turnsRatio: 100, flybackPeakV: 400 }))).toBe(35);
  });

  it('scales with the current interrupted and is capped at the rating', () => {
    expect(availableVoltageV({ ratedV: 40_000, currentA: 4, ratedPeakCurrentA: 8 })).toBe(20_000);
    expect(availableVoltageV({ ratedV: 40_000, currentA: 12, ratedPeakCurrentA: 8 })).toBe(40_000);
  });
});

describe('system voltages', () => {
  it('defaults to 10 V cranking and 14.5 V charging', () => {
    // 12 V system: about 10 V cranking, 13.5–14.5 V charging (Wikipedia, "Automotive battery";
    // cranking figure common practice)
    expect(DEFAULT_COMPAT_SETTINGS.crankingVoltageV).toBe(10);
    expect(DEFAULT_COMPAT_SETTINGS.chargingVoltageV).toBeGreaterThanOrEqual(13.5);
    expect(DEFAULT_COMPAT_SETTINGS.chargingVoltageV).toBeLessThanOrEqual(14.5);
  });
});
