import type { DataSource } from 'typeorm';
import type { VehicleEngineRecord } from '../../presenters/vehicle.presenter';

/** The vehicle picker's lists: year → make → model → engine, each from the vehicles on file. */
export async function listYears(ds: DataSource): Promise<number[]> {
  const rows = (await ds.query(`SELECT DISTINCT year FROM vehicle ORDER BY year DESC`)) as { year: number }[];
  return rows.map((r) => r.year);
}

export async function listMakes(ds: DataSource, year: number): Promise<string[]> {
  const rows = (await ds.query(`SELECT DISTINCT make FROM vehicle WHERE year = $1 ORDER BY make`, [year])) as { make: string }[];
  return rows.map((r) => r.make);
}

export async function listModels(ds: DataSource, year: number, make: string): Promise<string[]> {
  const rows = (await ds.query(`SELECT DISTINCT model FROM vehicle WHERE year = $1 AND make = $2 ORDER BY model`, [year, make])) as {
    model: string;
  }[];
  return rows.map((r) => r.model);
}

export async function listEngines(ds: DataSource, year: number, make: string, model: string): Promise<VehicleEngineRecord[]> {
  return (await ds.query(
    `SELECT e.id, e.code, e.displacement_l, e.cylinders, e.aspiration, string_agg(DISTINCT v.trim, ', ' ORDER BY v.trim) AS trims
       FROM vehicle v JOIN engine e ON e.id = v.engine_id
      WHERE v.year = $1 AND v.make = $2 AND v.model = $3
      GROUP BY e.id ORDER BY e.displacement_l, e.code`,
    [year, make, model],
  )) as VehicleEngineRecord[];
}
