import type { DataSource } from 'typeorm';
import { benchTest, type BenchTestResult } from '../../../shared/compat';
import type { BenchBody } from '../../../shared/schemas/bench';
import type { CoilSpec } from '../../../shared/schemas/specs';
import { getSettings } from '../settings.service';
import { asBadRequest } from './compare.service';
import type { Resolved } from '../../presenters/compat.presenter';
import { resolveCoil } from './resolve';

/** Readings of a coil on the bench, corrected to 20 °C and held against its windows. */
export async function runBenchTest(ds: DataSource, body: BenchBody): Promise<{ result: BenchTestResult; coil: Resolved<CoilSpec> }> {
  const { compat: settings } = await getSettings(ds);
  const coil = await resolveCoil(ds.manager, 'partId' in body ? { partId: body.partId } : { spec: body.spec }, 'coil');
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
