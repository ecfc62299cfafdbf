import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compareCoils, prepareCoilComparison } from '../../../shared/compat/coil-checks';
import { comparePlugs, preparePlugComparison } from '../../../shared/compat/plug-checks';
import { requiredVoltageAtLoadPoints } from '../../../shared/compat/required-voltage';
import { DEFAULT_COMPAT_SETTINGS } from '../../../shared/compat/settings';
import { verdictRank } from '../../../shared/compat/types';
import { arbCoil, arbEngine, arbPlug } from './factories';

const settings = DEFAULT_COMPAT_SETTINGS;

describe('properties of the model', () => {
  it('comparing a coil with itself is go on every row', () => {
    fc.assert(
      fc.property(arbCoil, arbEngine, (coil, engine) => {
        const result = compareCoils({ original: coil, substitute: coil, engine, settings }, { curves: false });
        expect(result.checks.filter((c) => c.verdict !== 'go')).toEqual([]);
      }),
    );
  });

  it('comparing a plug with itself is go on every row but the gap row', () => {
    fc.assert(
      fc.property(arbPlug, arbCoil, arbEngine, (plug, coil, engine) => {
        const result = comparePlugs({ original: plug, substitute: plug, engine, coil, settings });
        expect(result.checks.filter((c) => c.id !== 'gap' && c.verdict !== 'go')).toEqual([]);
      }),
    );
  });

  it('raising a substitute’s energy never worsens its energy row', () => {
    fc.assert(
      fc.property(arbCoil, arbCoil, arbCoil, arbEngine, (original, a, b, engine) => {
        const ra = compareCoils({ original, substitute: a, engine, settings }, { curves: false });
        const rb = compareCoils({ original, substitute: b, engine, settings }, { curves: false });
        const [low, high] = ra.energyMj.substitute <= rb.energyMj.substitute ? [ra, rb] : [rb, ra];
        const row = (r: typeof ra) => verdictRank(r.checks.find((c) => c.id === 'energy-cranking')!.verdict);
        expect(row(high)).toBeLessThanOrEqual(row(low));
      }),
    );
  });

  it('raising a coil’s own energy (lower primary resistance or higher current rating) never worsens its energy row', () => {
    fc.assert(
      fc.property(arbCoil, arbCoil, arbEngine, fc.double({ min: 0.5, max: 1, noNaN: true }), (original, s, engine, k) => {
        const stronger = {
          ...s,
          primaryOhmMin: s.primaryOhmMin * k,
          primaryOhmMax: s.primaryOhmMax * k,
          peakCurrentA: s.peakCurrentA / k,
        };
        const base = compareCoils({ original, substitute: s, engine, settings }, { curves: false });
        const raised = compareCoils({ original, substitute: stronger, engine, settings }, { curves: false });
        expect(raised.energyMj.substitute).toBeGreaterThanOrEqual(base.energyMj.substitute * (1 - 1e-12));
        const row = (r: typeof base) => verdictRank(r.checks.find((c) => c.id === 'energy-cranking')!.verdict);
        expect(row(raised)).toBeLessThanOrEqual(row(base));
      }),
    );
  });

  it('widening the gap never lowers the required voltage', () => {
    fc.assert(
      fc.property(
        arbEngine,
        fc.double({ min: 0.3, max: 2, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (engine, gapMm, wider) => {
          const narrow = requiredVoltageAtLoadPoints({ engine, gapMm, settings });
          const wide = requiredVoltageAtLoadPoints({ engine, gapMm: gapMm + wider, settings });
          narrow.forEach((p, k) => expect(wide[k]!.requiredKv).toBeGreaterThanOrEqual(p.requiredKv));
        },
      ),
    );
  });

  it('every result is deterministic and every reason is one sentence with no NaN', () => {
    fc.assert(
      fc.property(arbCoil, arbCoil, arbEngine, (original, substitute, engine) => {
        const first = compareCoils({ original, substitute, engine, settings });
        expect(compareCoils({ original, substitute, engine, settings })).toEqual(first);
        for (const c of first.checks) {
          expect(c.reason).toMatch(/^[A-Z][^\n]*[^.]\.$/);
          expect(c.reason).not.toMatch(/NaN|Infinity|undefined/);
        }
        for (const p of first.loadPoints) expect(Number.isFinite(p.reservePct)).toBe(true);
      }),
      { numRuns: 50 },
    );
  });

  it('judging gives the same verdicts as the full comparison', () => {
    fc.assert(
      fc.property(arbCoil, arbCoil, arbEngine, (original, substitute, engine) => {
        const comparer = prepareCoilComparison({ original, engine, settings });
        const full = comparer.compare(substitute, { curves: false });
        const judged = comparer.judge(substitute);
        expect(judged.verdict).toBe(full.verdict);
        expect(judged.deviation).toBe(full.deviation);
        expect(judged.rows).toEqual(full.checks.map((c) => ({ id: c.id, verdict: c.verdict })));
      }),
    );
    fc.assert(
      fc.property(arbPlug, arbPlug, arbCoil, arbEngine, (original, substitute, coil, engine) => {
        const comparer = preparePlugComparison({ original, engine, coil, settings });
        const full = comparer.compare(substitute);
        const judged = comparer.judge(substitute);
        expect(judged.verdict).toBe(full.verdict);
        expect(judged.rows).toEqual(full.checks.map((c) => ({ id: c.id, verdict: c.verdict })));
      }),
    );
  });
});
