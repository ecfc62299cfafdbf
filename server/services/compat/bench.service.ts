import type { DataSource } from 'typeorm';
import { benchTest, type BenchTestResult, type CompatSettings } from '../../../shared/compat';
import type { BenchBody } from '../../../shared/schemas/bench';
import type { CoilSpec } from '../../../shared/schemas/specs';
import { asBadRequest } from './compare.service';
import { resolveCoil, type Resolved } from './resolve';

/** Readings of a coil on the bench, corrected to 20 °C and held against its windows. */
export async function runBenchTest(
  ds: DataSource,
  body: BenchBody,
  settings: CompatSettings,
): Promise<{ result: BenchTestResult; coil: Resolved<CoilSpec> }> {
  const coil = await resolveCoil(ds, 'partId' in body ? { partId: body.partId } : { spec: body.spec }, 'coil');
  const result = asBadRequest(() =>
    benchTest({
      primaryOhm: body.measured.primaryOhm,
      ...(body.measured.secondaryKohm !== undefined ? { secondaryKohm: body.measured.secondaryKohm } : {}),
      coilTempC: body.measured.temperatureC,
      window: coil.spec,
      settings,
    }),
  );
  return { result, coil };
}
