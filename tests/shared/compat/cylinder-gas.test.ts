import { describe, expect, it } from 'vitest';
import { gasStateAtSpark, polytropicCompression, volumeRatioAtCrankAngle } from '../../../shared/compat/cylinder-gas';
import { barToPa, degToRad, paToBar } from '../../../shared/units';

describe('polytropic compression', () => {
  it('compresses 1 bar, 300 K by r = 10 with n = 1.3 to 19.95 bar and 598.6 K', () => {
    // ±0.1 %; the exponent is usually 1.2–1.3 (Wikipedia, "Compression ratio")
    const end = polytropicCompression({ pressurePa: barToPa(1), temperatureK: 300 }, 10, 1.3);
    expect(Math.abs(paToBar(end.pressurePa) / 19.95 - 1)).toBeLessThan(0.001);
    expect(Math.abs(end.temperatureK / 598.6 - 1)).toBeLessThan(0.001);
  });

  it('leaves the gas alone at a volume ratio of 1', () => {
    const end = polytropicCompression({ pressurePa: 50_000, temperatureK: 320 }, 1, 1.3);
    expect(end).toEqual({ pressurePa: 50_000, temperatureK: 320 });
  });
});

describe('slider-crank volume', () => {
  it('is the clearance volume at TDC and r times it at BDC', () => {
    expect(volumeRatioAtCrankAngle(10, 3.5, 0)).toBeCloseTo(1, 12);
    expect(volumeRatioAtCrankAngle(10, 3.5, Math.PI)).toBeCloseTo(10, 12);
  });

  it('grows with advance before TDC', () => {
    const at12 = volumeRatioAtCrankAngle(10, 3.5, degToRad(12));
    const at22 = volumeRatioAtCrankAngle(10, 3.5, degToRad(22));
    expect(at12).toBeGreaterThan(1);
    expect(at22).toBeGreaterThan(at12);
    // ½·9·(4.5 − cos 12° − √(3.5² − sin² 12°)), worked by hand
    expect(at12).toBeCloseTo(1.1261, 3);
  });

  it('gives the full compression at TDC', () => {
    const gas = gasStateAtSpark({
      compressionRatio: 10,
      rodRatio: 3.5,
      advanceRad: 0,
      intake: { pressurePa: barToPa(1), temperatureK: 300 },
      polytropicN: 1.3,
    });
    expect(paToBar(gas.pressurePa)).toBeCloseTo(19.95, 2);
  });
});
