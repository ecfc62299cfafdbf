import type { DataSource } from 'typeorm';
import { readOnly } from '../../db/read-only';
import { vehicleEngines, vehicleMakes, vehicleModels, vehicleYears, type VehicleEngineRow } from '../../repositories/vehicles.repository';

/** The vehicle picker's lists: year → make → model → engine; read-only work, on a replica where there is one. */
export function listYears(ds: DataSource): Promise<number[]> {
  return readOnly(ds, (ex) => vehicleYears(ex));
}

export function listMakes(ds: DataSource, year: number): Promise<string[]> {
  return readOnly(ds, (ex) => vehicleMakes(ex, year));
}

export function listModels(ds: DataSource, year: number, make: string): Promise<string[]> {
  return readOnly(ds, (ex) => vehicleModels(ex, year, make));
}

export function listEngines(ds: DataSource, year: number, make: string, model: string): Promise<VehicleEngineRow[]> {
  return readOnly(ds, (ex) => vehicleEngines(ex, year, make, model));
}
