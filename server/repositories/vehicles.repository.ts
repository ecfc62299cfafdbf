import { z } from 'zod';
import { ASPIRATIONS } from '../../shared/schemas/specs';
import { queryRows, type Executor } from '../db/executor';

/** The vehicle picker's lists: year → make → model → engine, each from the vehicles on file. */

const yearRow = z.object({ year: z.number().int() });
const makeRow = z.object({ make: z.string() });
const modelRow = z.object({ model: z.string() });

export async function vehicleYears(ex: Executor): Promise<number[]> {
  return (await queryRows(ex, yearRow, `SELECT DISTINCT year FROM vehicle ORDER BY year DESC`)).map((r) => r.year);
}

export async function vehicleMakes(ex: Executor, year: number): Promise<string[]> {
  return (await queryRows(ex, makeRow, `SELECT DISTINCT make FROM vehicle WHERE year = $1 ORDER BY make`, [year])).map((r) => r.make);
}

export async function vehicleModels(ex: Executor, year: number, make: string): Promise<string[]> {
  const rows = await queryRows(ex, modelRow, `SELECT DISTINCT model FROM vehicle WHERE year = $1 AND make = $2 ORDER BY model`, [
    year,
    make,
  ]);
  return rows.map((r) => r.model);
}

const vehicleEngineRowSchema = z.object({
  id: z.string(),
  code: z.string(),
  displacement_l: z.number(),
  cylinders: z.number().int(),
  aspiration: z.enum(ASPIRATIONS),
  /** The trims of the picked vehicle that have this engine, comma-separated. */
  trims: z.string(),
});
export type VehicleEngineRow = z.infer<typeof vehicleEngineRowSchema>;

export function vehicleEngines(ex: Executor, year: number, make: string, model: string): Promise<VehicleEngineRow[]> {
  return queryRows(
    ex,
    vehicleEngineRowSchema,
    `SELECT e.id, e.code, e.displacement_l, e.cylinders, e.aspiration, string_agg(DISTINCT v.trim, ', ' ORDER BY v.trim) AS trims
       FROM vehicle v JOIN engine e ON e.id = v.engine_id
      WHERE v.year = $1 AND v.make = $2 AND v.model = $3
      GROUP BY e.id ORDER BY e.displacement_l, e.code`,
    [year, make, model],
  );
}
