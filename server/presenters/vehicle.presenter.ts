import type { Role } from '../../shared/roles';
import type {
  EngineDetail,
  Fitment,
  VehicleEnginesResponse,
  VehicleMakesResponse,
  VehicleModelsResponse,
  VehicleYearsResponse,
} from '../../shared/schemas/vehicles';
import type { CoilSpec, ResolvedPlugSpec } from '../../shared/schemas/specs';
import type { EngineEntity } from '../entities';
import { engineSpecOf } from '../services/catalog/part-loader';
import { presentPart, presentSpec, type PartRow } from './part.presenter';
import { presentStock, sellPrice, type PriceRow } from './stock-price.presenter';

export const presentYears = (years: number[]): VehicleYearsResponse => ({ years });
export const presentMakes = (makes: string[]): VehicleMakesResponse => ({ makes });
export const presentModels = (models: string[]): VehicleModelsResponse => ({ models });

export interface VehicleEngineRecord {
  id: string;
  code: string;
  displacement_l: number;
  cylinders: number;
  aspiration: string;
  /** The trims of the picked vehicle that have this engine, comma-separated. */
  trims: string;
}

/** "2.0 L 4-cyl turbo (K20T) — LX, EX": what the picker offers. */
export function presentVehicleEngines(rows: VehicleEngineRecord[]): VehicleEnginesResponse {
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
  spec: { coil?: CoilSpec; plug?: ResolvedPlugSpec } | undefined;
  position: Fitment['position'];
  quantity: number;
  stock: { onHand: number; bin: string };
  prices: PriceRow[];
}

export interface EngineDetailRecord {
  engine: EngineEntity;
  fitments: FitmentRecord[];
}

/** GET /api/engines/:id: the engine's spec and its fitted parts, stock and price as the role may see them. */
export function presentEngineDetail(d: EngineDetailRecord, role: Role): EngineDetail {
  return {
    engine: { id: d.engine.id, description: d.engine.description, systemVoltage: d.engine.systemVoltage, ...engineSpecOf(d.engine) },
    fitments: d.fitments.map((f) => ({
      part: presentPart(f.row),
      spec: presentSpec(f.spec),
      position: f.position,
      quantity: f.quantity,
      stock: presentStock(f.stock.onHand, f.stock.bin, role),
      price: sellPrice(f.prices, role),
    })),
  };
}
