import type { BenchTestResult } from '../../shared/compat';
import type { BenchResult } from '../../shared/schemas/bench';
import { CAUTIONS } from '../../shared/schemas/compat';
import type { Resolved } from './compat.presenter';

/** POST /api/bench/coil: the readings at 20 °C against the coil's windows, and which coil that was. */
export function presentBenchResult(r: BenchTestResult, coil: Pick<Resolved<unknown>, 'label' | 'partId'>): BenchResult {
  return {
    verdict: r.verdict,
    primaryVerdict: r.primaryVerdict,
    secondaryVerdict: r.secondaryVerdict,
    primaryAt20Ohm: r.primaryAt20Ohm,
    secondaryAt20Kohm: r.secondaryAt20Kohm,
    // Only the windows: the test is handed the coil's whole spec.
    window: {
      primaryOhmMin: r.window.primaryOhmMin,
      primaryOhmMax: r.window.primaryOhmMax,
      secondaryKohmMin: r.window.secondaryKohmMin,
      secondaryKohmMax: r.window.secondaryKohmMax,
    },
    reason: r.reason,
    coil: { label: coil.label, partId: coil.partId },
    cautions: [...CAUTIONS],
  };
}
