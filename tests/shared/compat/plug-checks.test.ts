import { describe, expect, it } from 'vitest';
import { CompatInputError } from '../../../shared/compat/errors';
import { PLUG_CHECK_IDS, comparePlugs, type PlugCheckId } from '../../../shared/compat/plug-checks';
import type { Verdict } from '../../../shared/compat/types';
import type { CoilSpec, ResolvedPlugSpec } from '../../../shared/schemas/specs';
import { makeCoil, makeEngine, makePlug } from './factories';
import { expectFigures, expectOneSentence } from './reasons';

interface RowCase {
  row: PlugCheckId;
  verdict: Verdict;
  name: string;
  original?: ResolvedPlugSpec;
  substitute: ResolvedPlugSpec;
  coil?: CoilSpec;
  reason?: RegExp;
}

// Threads M10×1, M12×1.25, M14×1.25, M18×1.5, flat and taper seats: ISO 28741 (spark-plugs and
// their cylinder head housings), ISO 2705 (M12×1.25 flat seat), ISO 2345 (M18×1.5 conical seat).
// The reach and hex combinations of these invented plugs are from memory.
// The engine: 10:1, 0.80 mm spec gap; a 30 kV coil, so 1.0 mm (0.8 + 0.2 wear) needs 24.3 kV at full load.
const coil30 = makeCoil({ availableKv: 30 });
const coil25 = makeCoil({ availableKv: 25 });

const cases: RowCase[] = [
  {
    row: 'thread',
    verdict: 'go',
    name: 'same M14×1.25',
    substitute: makePlug(),
    reason: /M14×1\.25/,
  },
  {
    row: 'thread',
    verdict: 'no-go',
    name: 'M12×1.25 for M14×1.25',
    substitute: makePlug({ threadMm: 12, reachMm: 19 }),
  },
  {
    row: 'thread',
    verdict: 'no-go',
    name: 'another pitch',
    substitute: makePlug({ threadPitchMm: 1.5 }),
  },

  { row: 'seat', verdict: 'go', name: 'both flat', substitute: makePlug() },
  {
    row: 'seat',
    verdict: 'no-go',
    name: 'taper for flat',
    substitute: makePlug({ seat: 'taper' }),
  },

  {
    row: 'reach',
    verdict: 'go',
    name: '0.3 mm longer, the edge',
    substitute: makePlug({ reachMm: 19.3 }),
    reason: /0\.30 mm longer/,
  },
  { row: 'reach', verdict: 'go', name: '0.2 mm shorter', substitute: makePlug({ reachMm: 18.8 }) },
  {
    row: 'reach',
    verdict: 'no-go',
    name: '0.5 mm longer',
    substitute: makePlug({ reachMm: 19.5 }),
  },
  {
    row: 'reach',
    verdict: 'no-go',
    name: 'half-reach for full reach',
    substitute: makePlug({ reachMm: 12.7 }),
  },

  { row: 'hex', verdict: 'go', name: 'same 16 mm', substitute: makePlug() },
  {
    row: 'hex',
    verdict: 'review',
    name: '20.8 mm socket',
    substitute: makePlug({ hexMm: 20.8 }),
    reason: /20\.8 mm.*16 mm/,
  },

  { row: 'heat', verdict: 'go', name: 'same step', substitute: makePlug() },
  {
    row: 'heat',
    verdict: 'review',
    name: 'one step colder',
    substitute: makePlug({ heatStep: 8 }),
    reason: /colder.*suits sustained load and boost/,
  },
  {
    row: 'heat',
    verdict: 'review',
    name: 'one step hotter',
    substitute: makePlug({ heatStep: 6 }),
    reason: /hotter.*risks pre-ignition under load/,
  },
  {
    row: 'heat',
    verdict: 'no-go',
    name: 'two steps colder',
    substitute: makePlug({ heatStep: 9 }),
  },
  {
    row: 'heat',
    verdict: 'no-go',
    name: 'three steps hotter',
    substitute: makePlug({ heatStep: 4 }),
  },

  {
    row: 'resistor',
    verdict: 'go',
    name: 'both resistor',
    substitute: makePlug({ resistorKohm: 1 }),
  },
  {
    row: 'resistor',
    verdict: 'go',
    name: 'substitute adds one',
    original: makePlug({ resistor: false, resistorKohm: null }),
    substitute: makePlug(),
  },
  {
    row: 'resistor',
    verdict: 'no-go',
    name: 'substitute drops it',
    substitute: makePlug({ resistor: false, resistorKohm: null }),
  },

  { row: 'tip', verdict: 'go', name: 'both projected', substitute: makePlug() },
  {
    row: 'tip',
    verdict: 'go',
    name: 'substitute not projected',
    substitute: makePlug({ projectedTip: false }),
  },
  {
    row: 'tip',
    verdict: 'no-go',
    name: 'substitute projected where the original is not',
    original: makePlug({ projectedTip: false }),
    substitute: makePlug(),
  },

  { row: 'gap', verdict: 'go', name: 'within 0.05 mm', substitute: makePlug({ gapMm: 0.84 }) },
  {
    row: 'gap',
    verdict: 'review',
    name: 'regappable',
    substitute: makePlug({ gapMm: 1.1, regappable: true }),
    reason: /set to 0\.80 mm/,
  },
  {
    row: 'gap',
    verdict: 'no-go',
    name: 'off spec, not regappable',
    substitute: makePlug({ gapMm: 1.1 }),
  },

  {
    row: 'voltage-reserve',
    verdict: 'go',
    name: 'reserve of 24 %',
    substitute: makePlug(),
    coil: coil30,
  },
  {
    row: 'voltage-reserve',
    verdict: 'go',
    name: 'a regappable plug is judged at the spec gap it will be set to',
    substitute: makePlug({ gapMm: 1.5, regappable: true }),
    coil: coil30,
    reason: /set at 0\.80 mm/,
  },
  {
    row: 'voltage-reserve',
    verdict: 'go',
    name: "small reserve but no more required than the original's",
    substitute: makePlug({ gapMm: 0.78 }),
    coil: coil25,
  },
  {
    // 0.9 mm + 0.2 mm wear needs 26.3 kV: reserve 14 %
    row: 'voltage-reserve',
    verdict: 'review',
    name: 'reserve of 14 %',
    substitute: makePlug({ gapMm: 0.9 }),
    coil: coil30,
    reason: /26\.3 kV.*14 %/,
  },
  {
    // 26.3 kV against 25 kV available, but 109 % of the original's 24.3 kV
    row: 'voltage-reserve',
    verdict: 'review',
    name: "negative reserve but within 110 % of the original's",
    substitute: makePlug({ gapMm: 0.9 }),
    coil: coil25,
    reason: /109 %/,
  },
  {
    // 1.1 mm + 0.2 mm wear needs 30.5 kV: 126 % of the original's
    row: 'voltage-reserve',
    verdict: 'no-go',
    name: 'short of required and far above the original',
    substitute: makePlug({ gapMm: 1.1 }),
    coil: coil25,
  },
];

const numericRows: Partial<Record<PlugCheckId, RegExp>> = {
  reach: /mm/,
  hex: /mm/,
  heat: /\d/,
  gap: /mm/,
  'voltage-reserve': /kV/,
};

describe('plug checks, row by row', () => {
  it('covers every verdict of every row of the table', () => {
    const table: Record<PlugCheckId, Verdict[]> = {
      thread: ['go', 'no-go'],
      seat: ['go', 'no-go'],
      reach: ['go', 'no-go'],
      hex: ['go', 'review'],
      heat: ['go', 'review', 'no-go'],
      resistor: ['go', 'no-go'],
      tip: ['go', 'no-go'],
      gap: ['go', 'review', 'no-go'],
      'voltage-reserve': ['go', 'review', 'no-go'],
    };
    for (const id of PLUG_CHECK_IDS) {
      const covered = new Set(cases.filter((c) => c.row === id).map((c) => c.verdict));
      expect([...covered].sort(), id).toEqual([...table[id]].sort());
    }
  });

  it.each(cases)('$row is $verdict: $name', ({ row, verdict, original, substitute, coil, reason }) => {
    const result = comparePlugs({
      original: original ?? makePlug(),
      substitute,
      engine: makeEngine(),
      coil: coil ?? coil30,
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

describe('comparePlugs', () => {
  const engine = makeEngine();

  it('returns every row in the table order', () => {
    const result = comparePlugs({
      original: makePlug(),
      substitute: makePlug({ hexMm: 20.8 }),
      engine,
      coil: coil30,
    });
    expect(result.checks.map((c) => c.id)).toEqual([...PLUG_CHECK_IDS]);
    expect(result.verdict).toBe('review');
  });

  it('gives go on every row but the gap row comparing a plug with itself', () => {
    // a plug that ships at 1.1 mm and may be regapped: its gap row holds it to the engine's 0.80 mm
    const offSpec = makePlug({ gapMm: 1.1, regappable: true });
    const result = comparePlugs({ original: offSpec, substitute: offSpec, engine, coil: coil30 });
    const notGo = result.checks.filter((c) => c.verdict !== 'go').map((c) => c.id);
    expect(notGo).toEqual(['gap']);
    const onSpec = comparePlugs({
      original: makePlug(),
      substitute: makePlug(),
      engine,
      coil: coil30,
    });
    expect(onSpec.verdict).toBe('go');
    expect(onSpec.deviation).toBe(0);
  });

  it('reports load points with the fitted coil and the set gaps', () => {
    const result = comparePlugs({
      original: makePlug(),
      substitute: makePlug({ gapMm: 0.9 }),
      engine,
      coil: coil30,
    });
    expect(result.setGapMm).toEqual({ original: 0.8, substitute: 0.9 });
    expect(result.loadPoints.every((p) => p.availableKv === 30)).toBe(true);
    expect(result.loadPoints[0]!.gapMm).toBeCloseTo(1.1, 9);
    expect(result.originalLoadPoints.find((p) => p.name === 'full')?.requiredKv).toBeCloseTo(24.3, 1);
    expect(result.deviation).toBeGreaterThan(0);
  });

  it('throws a CompatInputError naming the field for nonsense numbers', () => {
    try {
      comparePlugs({
        original: makePlug(),
        substitute: makePlug({ reachMm: Number.NaN }),
        engine,
        coil: coil30,
      });
      expect.unreachable('a NaN reach must throw');
    } catch (error) {
      expect(error).toBeInstanceOf(CompatInputError);
      expect((error as CompatInputError).field).toBe('substitute.reachMm');
    }
    expect(() =>
      comparePlugs({
        original: makePlug(),
        substitute: makePlug(),
        engine,
        coil: makeCoil({ peakCurrentA: Number.NaN }),
      }),
    ).toThrow(/coil\.peakCurrentA/);
    expect(() =>
      comparePlugs({
        original: makePlug({ heatStep: 7.5 }),
        substitute: makePlug(),
        engine,
        coil: coil30,
      }),
    ).toThrow(CompatInputError);
  });
});
