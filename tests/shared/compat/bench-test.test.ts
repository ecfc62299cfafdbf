import { describe, expect, it } from 'vitest';
import { benchTest, copperResistanceAt20, OPEN_CIRCUIT_OHM, type BenchTestInput } from '../../../shared/compat/bench-test';
import { CompatInputError } from '../../../shared/compat/errors';
import { DEFAULT_COMPAT_SETTINGS } from '../../../shared/compat/settings';

const window = { primaryOhmMin: 0.5, primaryOhmMax: 0.9, secondaryKohmMin: 5, secondaryKohmMax: 7 };
const run = (input: Partial<BenchTestInput>) => benchTest({ primaryOhm: 0.6, coilTempC: 20, window, ...input });

describe('bench test', () => {
  it('corrects 0.80 Ω at 60 °C to 0.691 Ω at 20 °C', () => {
    // α = 0.00393 /K at 20 °C (annealed copper, IEC 60028, from memory)
    expect(DEFAULT_COMPAT_SETTINGS.copperAlphaPerK).toBe(0.00393);
    expect(copperResistanceAt20(0.8, 60, 0.00393)).toBeCloseTo(0.691, 3);
    const result = run({ primaryOhm: 0.8, coilTempC: 60 });
    expect(result.primaryAt20Ohm).toBeCloseTo(0.691, 3);
    expect(result.verdict).toBe('in-spec');
    expect(result.reason).toMatch(/0\.691 Ω at 20 °C.*0\.800 Ω at 60 °C.*0\.50–0\.90 Ω/);
  });

  it('leaves a reading at 20 °C as it is and raises one taken cold', () => {
    expect(copperResistanceAt20(0.6, 20, 0.00393)).toBe(0.6);
    expect(copperResistanceAt20(0.6, -10, 0.00393)).toBeGreaterThan(0.6);
  });

  it.each([
    { name: 'inside the window', input: { primaryOhm: 0.6 }, verdict: 'in-spec' },
    { name: 'above the window', input: { primaryOhm: 1.2 }, verdict: 'out-of-spec' },
    { name: 'just above the window', input: { primaryOhm: 0.95 }, verdict: 'out-of-spec' },
    // 0.98 Ω hot at 40 °C is 0.908 Ω at 20 °C: just outside
    {
      name: 'hot reading still out after correction',
      input: { primaryOhm: 0.98, coilTempC: 40 },
      verdict: 'out-of-spec',
    },
    // 0.95 Ω at 50 °C is 0.851 Ω at 20 °C: the correction brings it inside
    {
      name: 'hot reading brought inside by correction',
      input: { primaryOhm: 0.95, coilTempC: 50 },
      verdict: 'in-spec',
    },
    {
      name: 'below the window but not shorted',
      input: { primaryOhm: 0.3 },
      verdict: 'out-of-spec',
    },
    { name: 'under 10 % of the low end', input: { primaryOhm: 0.04 }, verdict: 'short' },
    { name: 'no reading', input: { primaryOhm: null }, verdict: 'open' },
    { name: 'NaN from the meter', input: { primaryOhm: Number.NaN }, verdict: 'open' },
    { name: 'over range', input: { primaryOhm: Number.POSITIVE_INFINITY }, verdict: 'open' },
  ] as const)('primary $name → $verdict', ({ input, verdict }) => {
    const result = run(input);
    expect(result.primaryVerdict).toBe(verdict);
    expect(result.verdict).toBe(verdict);
    expect(result.secondaryVerdict).toBeNull();
    expect(result.reason).toMatch(/^The primary .*\.$/);
    if (verdict === 'open') expect(result.primaryAt20Ohm).toBeNull();
  });

  it("calls a reading at the meter's overload open, not out of spec", () => {
    // A common 4000-count handheld multimeter's top resistance range is 40 MΩ and it shows "OL"
    // (overload) above it: no continuity (common practice, from memory).
    expect(OPEN_CIRCUIT_OHM).toBe(40e6);
    const overload = run({ primaryOhm: 1e9 });
    expect(overload).toMatchObject({ verdict: 'open', primaryVerdict: 'open', primaryAt20Ohm: null });
    expect(overload.reason).toMatch(/open circuit/);
    expect(overload.reason).not.toMatch(/outside/);
    expect(run({ primaryOhm: OPEN_CIRCUIT_OHM }).verdict).toBe('open');
    // Just under the overload is a (very bad) continuity reading: out of spec.
    expect(run({ primaryOhm: 39e6 }).verdict).toBe('out-of-spec');
    // The secondary in kΩ: 40 000 kΩ is the same 40 MΩ.
    expect(run({ secondaryKohm: 40_000 })).toMatchObject({ secondaryVerdict: 'open', secondaryAt20Kohm: null });
    expect(run({ secondaryKohm: 39_000 }).secondaryVerdict).toBe('out-of-spec');
  });

  it('states a reading taken at 20 °C once, and the correction only away from it', () => {
    // At the reference temperature the corrected value is the reading (R20 = R_T when T = 20 °C).
    const at20 = run({ primaryOhm: 0.6, coilTempC: 20 }).reason;
    expect(at20).toBe('The primary reads 0.600 Ω at 20 °C, inside its 0.50–0.90 Ω window.');
    expect(at20.match(/at 20 °C/g)).toHaveLength(1);
    // 0.62 Ω at 20.5 °C: 0.62 / (1 + 0.00393 × 0.5) = 0.619 Ω at 20 °C, both stated.
    expect(run({ primaryOhm: 0.62, coilTempC: 20.5 }).reason).toMatch(/reads 0\.619 Ω at 20 °C \(0\.620 Ω at 20\.5 °C\)/);
  });

  it('judges the secondary too and reports the worse of the two', () => {
    const both = run({ secondaryKohm: 6 });
    expect(both).toMatchObject({
      verdict: 'in-spec',
      secondaryVerdict: 'in-spec',
      secondaryAt20Kohm: 6,
    });
    expect(both.reason).toMatch(/secondary reads 6\.00 kΩ.*5\.0–7\.0 kΩ/);
    expect(run({ secondaryKohm: 9 })).toMatchObject({
      verdict: 'out-of-spec',
      primaryVerdict: 'in-spec',
    });
    expect(run({ secondaryKohm: null })).toMatchObject({
      verdict: 'open',
      secondaryVerdict: 'open',
      secondaryAt20Kohm: null,
    });
    expect(run({ secondaryKohm: 0.2 })).toMatchObject({ verdict: 'short' });
    expect(run({ primaryOhm: null, secondaryKohm: 0.2 }).verdict).toBe('open');
  });

  it('says so when the part states no secondary window', () => {
    const result = benchTest({
      primaryOhm: 0.6,
      secondaryKohm: 6,
      coilTempC: 20,
      window: {
        primaryOhmMin: 0.5,
        primaryOhmMax: 0.9,
        secondaryKohmMin: null,
        secondaryKohmMax: null,
      },
    });
    expect(result.secondaryVerdict).toBeNull();
    expect(result.verdict).toBe('in-spec');
    expect(result.reason).toMatch(/no secondary window/);
  });

  it('throws a CompatInputError for a temperature that is not a number or a negative reading', () => {
    expect(() => run({ coilTempC: Number.NaN })).toThrow(CompatInputError);
    expect(() => run({ primaryOhm: -0.5 })).toThrow(/primaryOhm/);
  });
});
