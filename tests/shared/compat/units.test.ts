import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as units from '../../../shared/units';

type Conversion = (value: number) => number;

const pairs: Array<[string, Conversion, Conversion]> = [
  ['mm ↔ m', units.mmToM, units.mToMm],
  ['cm ↔ m', units.cmToM, units.mToCm],
  ['mH ↔ H', units.mhToH, units.hToMh],
  ['ms ↔ s', units.msToS, units.sToMs],
  ['µs ↔ s', units.usToS, units.sToUs],
  ['kPa ↔ Pa', units.kpaToPa, units.paToKpa],
  ['bar ↔ Pa', units.barToPa, units.paToBar],
  ['Torr ↔ Pa', units.torrToPa, units.paToTorr],
  ['kV ↔ V', units.kvToV, units.vToKv],
  ['kΩ ↔ Ω', units.kohmToOhm, units.ohmToKohm],
  ['mJ ↔ J', units.mjToJ, units.jToMj],
  ['°C ↔ K', units.celsiusToKelvin, units.kelvinToCelsius],
  ['deg ↔ rad', units.degToRad, units.radToDeg],
  ['% ↔ fraction', units.pctToFraction, units.fractionToPct],
];

describe('unit conversions', () => {
  it.each(pairs)('%s round-trips', (_name, there, back) => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true }), (x) => {
        expect(back(there(x))).toBeCloseTo(x, 6);
        expect(there(back(x))).toBeCloseTo(x, 6);
      }),
    );
  });

  it('uses the defined values', () => {
    expect(units.torrToPa(760)).toBeCloseTo(101_325, 9); // standard atmosphere, by definition
    expect(units.torrToPa(1)).toBeCloseTo(133.322, 3);
    expect(units.mmToM(1)).toBe(0.001);
    expect(units.mhToH(6)).toBeCloseTo(0.006, 12);
    expect(units.msToS(3)).toBeCloseTo(0.003, 12);
    expect(units.kpaToPa(98)).toBe(98_000);
    expect(units.barToPa(15)).toBe(1_500_000);
    expect(units.kvToV(24.3)).toBeCloseTo(24_300, 9);
    expect(units.celsiusToKelvin(20)).toBeCloseTo(293.15, 9);
    expect(units.degToRad(180)).toBeCloseTo(Math.PI, 12);
    expect(units.pctToFraction(15)).toBeCloseTo(0.15, 12);
  });
});
