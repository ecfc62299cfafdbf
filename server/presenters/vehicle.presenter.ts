import type { Role } from '../../shared/roles';
import type {
  EngineDetail,
  Fitment,
  VehicleEnginesResponse,
  VehicleMakesResponse,
  VehicleModelsResponse,
  VehicleYearsResponse,
} from '../../shared/schemas/vehicles';
import type { EngineRecord } from '../repositories/engines.repository';
import type { PartRow } from '../repositories/parts.repository';
import type { PriceRow } from '../repositories/prices.repository';
import type { PartSpecs } from '../repositories/specs.repository';
import type { PartStock } from '../repositories/stock.repository';
import type { VehicleEngineRow } from '../repositories/vehicles.repository';
import { presentPart, presentSpec } from './part.presenter';
import { presentStock, sellPrice } from './stock-price.presenter';

export const presentYears = (years: number[]): VehicleYearsResponse => ({ years });
export const presentMakes = (makes: string[]): VehicleMakesResponse => ({ makes });
export const presentModels = (models: string[]): VehicleModelsResponse => ({ models });

/** "2.0 L 4-cyl turbo (K20T) — LX, EX": what the picker offers. */
export function presentVehicleEngines(rows: VehicleEngineRow[]): VehicleEnginesResponse {
  return {
    engines: rows.map((r) => ({
      id: r.id,
      code: r.code,
      label: `${r.displacement_l.toFixed(1)} L ${r.cylinders}-cyl${r.aspiration === 'natural' ? '' : ` ${r.aspiration}`} (${r.code}) — ${r.trims}`,
    })),
  };
}

export interface FitmentRecord {
  row: PartRow;
  spec: PartSpecs | undefined;
  position: Fitment['position'];
  quantity: number;
  stock: PartStock;
  prices: PriceRow[];
}

export interface EngineDetailRecord {
  engine: EngineRecord;
  fitments: FitmentRecord[];
}

/** GET /api/engines/:id: the engine's spec and its fitted parts, stock and price as the role may see them. */
export function presentEngineDetail(d: EngineDetailRecord, role: Role): EngineDetail {
  return {
    engine: { id: d.engine.id, description: d.engine.description, systemVoltage: d.engine.systemVoltage, ...d.engine.spec },
    fitments: d.fitments.map((f) => ({
      part: presentPart(f.row),
      spec: presentSpec(f.spec),
      position: f.position,
      quantity: f.quantity,
      stock: presentStock(f.stock, role),
      price: sellPrice(f.prices, role),
    })),
  };
}
