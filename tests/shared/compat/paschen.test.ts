import { describe, expect, it } from 'vitest';
import { PASCHEN_AIR, densityEquivalentPressurePa, paschenBreakdownV, paschenMinimum } from '../../../shared/compat/paschen';
import { barToPa, cmToM, kpaToPa, mmToM, paToTorr, torrToPa, vToKv } from '../../../shared/units';

const torrCmToPaM = (pd: number): number => torrToPa(pd) * cmToM(1);
const paMToTorrCm = (pd: number): number => paToTorr(pd) / cmToM(1);

describe("Paschen's law for air", () => {
  it('has the published constants in kPa·cm', () => {
    // Wikipedia, "Paschen's law": A = 112.50 /(kPa·cm), B = 2737.50 V/(kPa·cm), γ = 0.01
    const kpaCm = kpaToPa(1) * cmToM(1);
    expect(PASCHEN_AIR.aPerPaM * kpaCm).toBeCloseTo(112.5, 1);
    expect(Math.abs((PASCHEN_AIR.bVPerPaM * kpaCm) / 2737.5 - 1)).toBeLessThan(0.0005);
    expect(PASCHEN_AIR.gamma).toBe(0.01);
  });

  it('has its minimum at 305.3 V and 0.836 Torr·cm', () => {
    // Wikipedia, "Paschen's law" constants; the minimum itself is arithmetic (±0.5 %)
    const min = paschenMinimum();
    expect(Math.abs(min.voltageV / 305.3 - 1)).toBeLessThan(0.005);
    expect(Math.abs(paMToTorrCm(min.pdPaM) / 0.836 - 1)).toBeLessThan(0.005);
    // the formula's value at its minimum agrees with the closed form, and both sides are higher
    expect(paschenBreakdownV(min.pdPaM)).toBeCloseTo(min.voltageV, 6);
    expect(paschenBreakdownV(min.pdPaM * 1.2)).toBeGreaterThan(min.voltageV);
    expect(paschenBreakdownV(min.pdPaM / 1.2)).toBeGreaterThan(min.voltageV);
  });

  it('lands within 10 % of the measured minimum for air', () => {
    // Wikipedia, "Paschen's law": measured minimum about 327 V at about 0.57 Torr·cm
    expect(Math.abs(paschenMinimum().voltageV / 327 - 1)).toBeLessThan(0.1);
    expect(Math.abs(paschenBreakdownV(torrCmToPaM(0.57)) / 327 - 1)).toBeLessThan(0.1);
  });

  it('predicts no breakdown left of its asymptote', () => {
    expect(paschenBreakdownV(torrCmToPaM(0.05))).toBe(Number.POSITIVE_INFINITY);
  });

  it('follows gas density: 15 bar, 700 K, 1.0 mm gap → 23.4 kV', () => {
    // spark-gap correction factors as given in high-voltage practice, δ = (p/760 Torr)·(293 K/T);
    // 23.4 kV ±1 %, arithmetic from the constants above
    const pEq = densityEquivalentPressurePa(barToPa(15), 700);
    const delta = (paToTorr(barToPa(15)) / 760) * (293 / 700);
    expect(Math.abs(paToTorr(pEq) / 760 / delta - 1)).toBeLessThan(0.001);
    const kv = vToKv(paschenBreakdownV(pEq * mmToM(1)));
    expect(Math.abs(kv / 23.4 - 1)).toBeLessThan(0.01);
  });

  it('refers pressure to 293.15 K at the same density', () => {
    expect(densityEquivalentPressurePa(100_000, 293.15)).toBeCloseTo(100_000, 6);
    expect(densityEquivalentPressurePa(100_000, 586.3)).toBeCloseTo(50_000, 6);
  });
});
