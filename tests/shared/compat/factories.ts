import fc from 'fast-check';
import type { CoilSpec, EngineSpec, ResolvedPlugSpec } from '../../../shared/schemas/specs';

/**
 * Invented test parts: no real brand, part number or vehicle. Defaults describe a plain 10:1
 * four-cylinder with a coil-on-plug and an M14×1.25 flat-seat plug (thread per ISO 28741;
 * the reach and hex combination from memory).
 */
export function makeEngine(overrides: Partial<EngineSpec> = {}): EngineSpec {
  return {
    code: 'TEST-E10',
    displacementL: 2,
    cylinders: 4,
    compressionRatio: 10,
    aspiration: 'natural',
    peakBoostKpa: 0,
    rodRatio: 3.5,
    specGapMm: 0.8,
    dwellMs: 3,
    crankingDwellMs: 4,
    driverCurrentLimitA: null,
    ...overrides,
  };
}

export function makeCoil(overrides: Partial<CoilSpec> = {}): CoilSpec {
  return {
    architecture: 'coil-on-plug',
    driver: 'integrated',
    outputs: 1,
    connectorPins: 3,
    connectorKey: 'A',
    primaryOhmMin: 0.5,
    primaryOhmMax: 0.7,
    primaryInductanceMh: 2.5,
    secondaryKohmMin: 5,
    secondaryKohmMax: 7,
    turnsRatio: 100,
    availableKv: 40,
    peakCurrentA: 8,
    ...overrides,
  };
}

/** A passive coil for an engine whose driver sits outside the coil. */
export function makeExternalCoil(overrides: Partial<CoilSpec> = {}): CoilSpec {
  return makeCoil({
    architecture: 'coil-pack',
    driver: 'external',
    outputs: 2,
    connectorPins: 2,
    connectorKey: 'B',
    primaryInductanceMh: 6,
    availableKv: null,
    peakCurrentA: 8,
    ...overrides,
  });
}

export function makePlug(overrides: Partial<ResolvedPlugSpec> = {}): ResolvedPlugSpec {
  return {
    threadMm: 14,
    threadPitchMm: 1.25,
    reachMm: 19,
    seat: 'flat',
    hexMm: 16,
    gapMm: 0.8,
    regappable: false,
    resistor: true,
    resistorKohm: 5,
    projectedTip: true,
    electrode: 'iridium',
    heatCode: null,
    heatStep: 7,
    ...overrides,
  };
}

const double = (min: number, max: number): fc.Arbitrary<number> => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

/** Any engine within the ranges the spec schema accepts, restricted to sensible running values. */
export const arbEngine: fc.Arbitrary<EngineSpec> = fc.record({
  code: fc.constant('TEST-ARB'),
  displacementL: double(0.6, 8),
  cylinders: fc.integer({ min: 1, max: 12 }),
  compressionRatio: double(6, 14),
  aspiration: fc.constantFrom('natural' as const, 'turbo' as const, 'supercharged' as const),
  peakBoostKpa: double(0, 150),
  rodRatio: double(2.8, 4.5),
  specGapMm: double(0.5, 1.5),
  dwellMs: double(1, 6),
  crankingDwellMs: double(1, 10),
  driverCurrentLimitA: fc.option(double(4, 20), { nil: null }),
});

export const arbCoil: fc.Arbitrary<CoilSpec> = fc
  .record({
    architecture: fc.constantFrom('coil-on-plug' as const, 'pencil' as const, 'coil-pack' as const, 'canister' as const),
    driver: fc.constantFrom('integrated' as const, 'external' as const),
    outputs: fc.integer({ min: 1, max: 4 }),
    connectorPins: fc.integer({ min: 2, max: 6 }),
    connectorKey: fc.constantFrom('A', 'B', 'C'),
    primaryOhmLow: double(0.2, 3),
    primaryOhmSpan: double(0, 0.5),
    primaryInductanceMh: double(1, 12),
    secondary: fc.option(fc.tuple(double(2, 12), double(0, 4)), { nil: null }),
    turnsRatio: double(50, 200),
    availableKv: fc.option(double(20, 50), { nil: null }),
    peakCurrentA: double(4, 15),
  })
  .map(({ primaryOhmLow, primaryOhmSpan, secondary, ...rest }) => ({
    ...rest,
    primaryOhmMin: primaryOhmLow,
    primaryOhmMax: primaryOhmLow + primaryOhmSpan,
    secondaryKohmMin: secondary ? secondary[0] : null,
    secondaryKohmMax: secondary ? secondary[0] + secondary[1] : null,
  }));

export const arbPlug: fc.Arbitrary<ResolvedPlugSpec> = fc.record({
  threadMm: fc.constantFrom(10, 12, 14, 18),
  threadPitchMm: fc.constantFrom(1, 1.25, 1.5),
  reachMm: double(9, 26),
  seat: fc.constantFrom('flat' as const, 'taper' as const),
  hexMm: fc.constantFrom(14, 16, 20.8),
  gapMm: double(0.5, 1.5),
  regappable: fc.boolean(),
  resistor: fc.boolean(),
  resistorKohm: fc.option(double(1, 10), { nil: null }),
  projectedTip: fc.boolean(),
  electrode: fc.constantFrom('copper' as const, 'platinum' as const, 'iridium' as const),
  heatCode: fc.constant(null),
  heatStep: fc.integer({ min: 1, max: 15 }),
});
