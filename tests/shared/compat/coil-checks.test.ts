import { describe, expect, it } from 'vitest';
import { COIL_CHECK_IDS, compareCoils, type CoilCheckId } from '../../../shared/compat/coil-checks';
import { CompatInputError } from '../../../shared/compat/errors';
import { DEFAULT_COMPAT_SETTINGS } from '../../../shared/compat/settings';
import type { Verdict } from '../../../shared/compat/types';
import type { CoilSpec, EngineSpec } from '../../../shared/schemas/specs';
import { makeCoil, makeEngine, makeExternalCoil } from './factories';
import { expectFigures, expectOneSentence } from './reasons';

interface RowCase {
  row: CoilCheckId;
  verdict: Verdict;
  name: string;
  original?: CoilSpec;
  substitute: CoilSpec;
  engine?: EngineSpec;
  reason?: RegExp;
}

// External-driver engine: 8 A limit, 3 ms running dwell; its original draws 6.4 A at 14.5 V on 0.50 Ω.
const externalEngine = makeEngine({ driverCurrentLimitA: 8 });
const externalOriginal = makeExternalCoil();

const cases: RowCase[] = [
  { row: 'driver', verdict: 'go', name: 'same driver type', substitute: makeCoil() },
  {
    row: 'driver',
    verdict: 'no-go',
    name: 'integrated vs external',
    substitute: makeCoil({ driver: 'external' }),
  },

  {
    row: 'connector',
    verdict: 'go',
    name: 'same pins and key',
    substitute: makeCoil({ connectorKey: ' a ' }),
  },
  {
    row: 'connector',
    verdict: 'no-go',
    name: 'other pin count',
    substitute: makeCoil({ connectorPins: 4 }),
  },
  {
    row: 'connector',
    verdict: 'no-go',
    name: 'other key',
    substitute: makeCoil({ connectorKey: 'C' }),
  },

  { row: 'mounting', verdict: 'go', name: 'same architecture and outputs', substitute: makeCoil() },
  {
    row: 'mounting',
    verdict: 'no-go',
    name: 'other architecture',
    substitute: makeCoil({ architecture: 'pencil' }),
  },
  {
    row: 'mounting',
    verdict: 'no-go',
    name: 'other outputs',
    substitute: makeCoil({ outputs: 2 }),
  },

  // original 0.50–0.70 Ω, widened by 10 % to 0.45–0.77 Ω
  {
    row: 'primary-window',
    verdict: 'go',
    name: 'inside the widened window',
    substitute: makeCoil({ primaryOhmMin: 0.46, primaryOhmMax: 0.76 }),
    reason: /0\.45–0\.77 Ω/,
  },
  {
    row: 'primary-window',
    verdict: 'review',
    name: 'overlapping',
    substitute: makeCoil({ primaryOhmMin: 0.6, primaryOhmMax: 0.9 }),
  },
  {
    row: 'primary-window',
    verdict: 'no-go',
    name: 'disjoint',
    substitute: makeCoil({ primaryOhmMin: 0.8, primaryOhmMax: 1.0 }),
  },

  {
    row: 'driver-current',
    verdict: 'go',
    name: 'not applicable with an integrated igniter',
    substitute: makeCoil(),
    engine: externalEngine,
    reason: /^Not applicable: .*integrated igniter/,
  },
  {
    row: 'driver-current',
    verdict: 'go',
    name: 'not applicable where the engine states no limit',
    original: externalOriginal,
    substitute: makeExternalCoil({ primaryInductanceMh: 3 }),
    reason: /^Not applicable: .*no driver current limit/,
  },
  {
    row: 'driver-current',
    verdict: 'go',
    name: 'within the engine limit',
    original: externalOriginal,
    substitute: makeExternalCoil({ primaryInductanceMh: 6.5 }),
    engine: externalEngine,
  },
  {
    // 29 A × (1 − e^(−0.5 Ω × 3 ms / 4.5 mH)) = 8.2 A, 3 % over 8 A
    row: 'driver-current',
    verdict: 'review',
    name: 'up to 15 % above the limit',
    original: externalOriginal,
    substitute: makeExternalCoil({ primaryInductanceMh: 4.5 }),
    engine: externalEngine,
    reason: /8\.2 A.*8\.0 A/,
  },
  {
    // 29 A × (1 − e^(−0.5)) = 11.4 A, 43 % over 8 A
    row: 'driver-current',
    verdict: 'no-go',
    name: 'more than 15 % above the limit',
    original: externalOriginal,
    substitute: makeExternalCoil({ primaryInductanceMh: 3 }),
    engine: externalEngine,
    reason: /11\.4 A/,
  },
  {
    // the original itself draws 13.1 A (2.5 mH); a substitute drawing 12.0 A is within it
    row: 'driver-current',
    verdict: 'go',
    name: "within the original's own current above the limit",
    original: makeExternalCoil({ primaryInductanceMh: 2.5 }),
    substitute: makeExternalCoil({ primaryInductanceMh: 2.8 }),
    engine: externalEngine,
    reason: /13\.1 A/,
  },

  // cranking: 10 V on 0.60 Ω saturates at the 8 A igniter limit, so E = ½·L·(8 A)² and E_S/E_O = L_S/L_O
  {
    row: 'energy-cranking',
    verdict: 'go',
    name: 'ratio 0.96',
    substitute: makeCoil({ primaryInductanceMh: 2.4 }),
  },
  {
    row: 'energy-cranking',
    verdict: 'review',
    name: 'ratio 0.80',
    substitute: makeCoil({ primaryInductanceMh: 2.0 }),
    reason: /64\.0 mJ.*80\.0 mJ \(80 %\)/,
  },
  {
    row: 'energy-cranking',
    verdict: 'no-go',
    name: 'ratio 0.60',
    substitute: makeCoil({ primaryInductanceMh: 1.5 }),
  },

  // full load needs 24.3 kV at 1.0 mm (0.8 mm spec gap + 0.2 mm wear)
  { row: 'voltage-reserve', verdict: 'go', name: 'reserve of 65 %', substitute: makeCoil() },
  {
    row: 'voltage-reserve',
    verdict: 'go',
    name: "small reserve but no less than the original's",
    original: makeCoil({ availableKv: 25 }),
    substitute: makeCoil({ availableKv: 26 }),
  },
  {
    row: 'voltage-reserve',
    verdict: 'review',
    name: 'reserve of 11 %',
    substitute: makeCoil({ availableKv: 27 }),
    reason: /27\.0 kV.*24\.3 kV.*11 %/,
  },
  {
    row: 'voltage-reserve',
    verdict: 'review',
    name: "negative reserve but 92 % of the original's",
    original: makeCoil({ availableKv: 25 }),
    substitute: makeCoil({ availableKv: 23 }),
    reason: /92 %/,
  },
  {
    row: 'voltage-reserve',
    verdict: 'no-go',
    name: 'short of required',
    substitute: makeCoil({ availableKv: 22 }),
  },

  {
    row: 'secondary-window',
    verdict: 'go',
    name: 'overlapping',
    substitute: makeCoil({ secondaryKohmMin: 6, secondaryKohmMax: 8 }),
  },
  {
    row: 'secondary-window',
    verdict: 'go',
    name: 'both absent',
    original: makeCoil({ secondaryKohmMin: null, secondaryKohmMax: null }),
    substitute: makeCoil({ secondaryKohmMin: null, secondaryKohmMax: null }),
  },
  {
    row: 'secondary-window',
    verdict: 'review',
    name: 'disjoint',
    substitute: makeCoil({ secondaryKohmMin: 8, secondaryKohmMax: 10 }),
  },
  {
    row: 'secondary-window',
    verdict: 'review',
    name: 'only one stated',
    substitute: makeCoil({ secondaryKohmMin: null, secondaryKohmMax: null }),
  },

  {
    row: 'turns-ratio',
    verdict: 'go',
    name: '10 % above',
    substitute: makeCoil({ turnsRatio: 110 }),
    reason: /10 % above/,
  },
  {
    row: 'turns-ratio',
    verdict: 'review',
    name: '20 % above',
    substitute: makeCoil({ turnsRatio: 120 }),
  },
  {
    row: 'turns-ratio',
    verdict: 'review',
    name: '20 % below',
    substitute: makeCoil({ turnsRatio: 80 }),
  },
];

const numericRows: Partial<Record<CoilCheckId, RegExp>> = {
  'primary-window': /Ω/,
  'energy-cranking': /mJ/,
  'voltage-reserve': /kV/,
  'turns-ratio': /:1/,
};

describe('coil checks, row by row', () => {
  it('covers every verdict of every row of the table', () => {
    const table: Record<CoilCheckId, Verdict[]> = {
      driver: ['go', 'no-go'],
      connector: ['go', 'no-go'],
      mounting: ['go', 'no-go'],
      'primary-window': ['go', 'review', 'no-go'],
      'driver-current': ['go', 'review', 'no-go'],
      'energy-cranking': ['go', 'review', 'no-go'],
      'voltage-reserve': ['go', 'review', 'no-go'],
      'secondary-window': ['go', 'review'],
      'turns-ratio': ['go', 'review'],
    };
    for (const id of COIL_CHECK_IDS) {
      const covered = new Set(cases.filter((c) => c.row === id).map((c) => c.verdict));
      expect([...covered].sort(), id).toEqual([...table[id]].sort());
    }
  });

  it.each(cases)('$row is $verdict: $name', ({ row, verdict, original, substitute, engine, reason }) => {
    const result = compareCoils({
      original: original ?? makeCoil(),
      substitute,
      engine: engine ?? makeEngine(),
      settings: DEFAULT_COMPAT_SETTINGS,
    });
    const check = result.checks.find((c) => c.id === row);
    expect(check?.verdict, check?.reason).toBe(verdict);
    if (!check) return;
    expectOneSentence(check);
    const unit = numericRows[row];
    if (unit) expectFigures(check, unit);
    if (reason) expect(check.reason).toMatch(reason);
    if (verdict !== 'go') expect(result.verdict).not.toBe('go');
  });
});

describe('compareCoils', () => {
  const engine = makeEngine();
  const original = makeCoil();

  it('returns every row in the table order and the worst row as the verdict', () => {
    const result = compareCoils({
      original,
      substitute: makeCoil({ turnsRatio: 120, primaryInductanceMh: 1.5 }),
      engine,
    });
    expect(result.checks.map((c) => c.id)).toEqual([...COIL_CHECK_IDS]);
    expect(result.verdict).toBe('no-go');
    const review = compareCoils({ original, substitute: makeCoil({ turnsRatio: 120 }), engine });
    expect(review.verdict).toBe('review');
  });

  it('gives go on every row comparing a coil with itself', () => {
    for (const [coil, eng] of [
      [original, engine],
      [externalOriginal, externalEngine],
      [makeCoil({ availableKv: null, secondaryKohmMin: null, secondaryKohmMax: null }), engine],
    ] as const) {
      const result = compareCoils({ original: coil, substitute: coil, engine: eng });
      expect(result.checks.filter((c) => c.verdict !== 'go')).toEqual([]);
      expect(result.verdict).toBe('go');
      expect(result.deviation).toBe(0);
    }
  });

  it('charts both coils at charging and cranking voltage over 0 … 1.5 × dwell', () => {
    const result = compareCoils({
      original,
      substitute: makeCoil({ primaryInductanceMh: 3 }),
      engine,
    });
    expect(result.currents.original).toHaveLength(61);
    expect(result.currents.substitute.at(-1)?.tMs).toBeCloseTo(4.5, 9); // 1.5 × 3 ms running dwell
    expect(result.crankingCurrents.original.at(-1)?.tMs).toBeCloseTo(6, 9); // 1.5 × 4 ms cranking dwell
    // the slower 3 mH coil rises more slowly than the 2.5 mH one
    expect(result.currents.substitute[10]!.amps).toBeLessThan(result.currents.original[10]!.amps);
    // at 14.5 V both reach the 8 A igniter limit by the end of the window
    expect(result.currents.original.at(-1)?.amps).toBe(8);
    const skipped = compareCoils({ original, substitute: original, engine }, { curves: false });
    expect(skipped.currents.original).toEqual([]);
  });

  it('reports stored energy at cranking and the load points for both coils', () => {
    const result = compareCoils({
      original,
      substitute: makeCoil({ primaryInductanceMh: 2 }),
      engine,
    });
    expect(result.energyMj.original).toBeCloseTo(80, 9); // ½ × 2.5 mH × (8 A)²
    expect(result.energyMj.substitute).toBeCloseTo(64, 9);
    const energyRow = result.checks.find((c) => c.id === 'energy-cranking');
    expect(energyRow?.original).toBe(result.energyMj.original);
    expect(result.loadPoints.map((p) => p.name)).toEqual(['idle', 'cruise', 'full']);
    const full = result.loadPoints.find((p) => p.name === 'full');
    expect(full?.requiredKv).toBeCloseTo(24.3, 1);
    expect(full?.availableKv).toBe(40);
    expect(full?.reservePct).toBeCloseTo(((40 - full!.requiredKv) / full!.requiredKv) * 100, 9);
    expect(result.originalLoadPoints.map((p) => p.requiredKv)).toEqual(result.loadPoints.map((p) => p.requiredKv));
  });

  it('scales available voltage down when the current reached falls short of the rated peak', () => {
    // 14.5 V on 3.0 Ω mid resistance reaches 4.8 A at most, against a 9.6 A rating: half the 40 kV
    const weak = makeCoil({
      primaryOhmMin: 2.9,
      primaryOhmMax: 3.1,
      primaryInductanceMh: 0.5,
      peakCurrentA: 9.6666,
    });
    const result = compareCoils({ original, substitute: weak, engine });
    expect(result.loadPoints[0]!.availableKv).toBeCloseTo(20, 0);
  });

  it('is deterministic', () => {
    const input = {
      original,
      substitute: makeCoil({ primaryInductanceMh: 2.2, turnsRatio: 90 }),
      engine,
    };
    expect(compareCoils(input)).toEqual(compareCoils(input));
  });

  it('throws a CompatInputError naming the field for nonsense numbers', () => {
    const cases: Array<[string, () => unknown]> = [
      [
        'substitute.primaryInductanceMh',
        () =>
          compareCoils({
            original,
            substitute: makeCoil({ primaryInductanceMh: Number.NaN }),
            engine,
          }),
      ],
      [
        'original.primaryOhmMax',
        () =>
          compareCoils({
            original: makeCoil({ primaryOhmMax: Number.POSITIVE_INFINITY }),
            substitute: original,
            engine,
          }),
      ],
      [
        'engine.dwellMs',
        () =>
          compareCoils({
            original,
            substitute: original,
            engine: makeEngine({ dwellMs: Number.NaN }),
          }),
      ],
      [
        'settings.loadPoints.full.mapKpa',
        () =>
          compareCoils({
            original,
            substitute: original,
            engine,
            settings: {
              ...DEFAULT_COMPAT_SETTINGS,
              loadPoints: {
                ...DEFAULT_COMPAT_SETTINGS.loadPoints,
                full: { mapKpa: Number.NaN, advanceDeg: 22, tempK: 310 },
              },
            },
          }),
      ],
      ['substitute.primaryOhmMin', () => compareCoils({ original, substitute: makeCoil({ primaryOhmMin: 0.9 }), engine })],
    ];
    for (const [field, run] of cases) {
      try {
        run();
        expect.unreachable(`${field} should have thrown`);
      } catch (error) {
        expect(error, field).toBeInstanceOf(CompatInputError);
        expect((error as CompatInputError).field).toBe(field);
      }
    }
  });
});
