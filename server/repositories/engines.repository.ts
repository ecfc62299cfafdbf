import type { EntityManager } from 'typeorm';
import { z } from 'zod';
import type { EngineSpec, PartKind } from '../../shared/schemas/specs';
import { FITMENT_POSITIONS } from '../../shared/schemas/vehicles';
import { queryOne, queryRows, type Executor } from '../db/executor';
import { EngineEntity } from '../entities';

/** An engine: its spec as the compatibility model takes it, and what else the catalog shows. */
export interface EngineRecord {
  id: string;
  description: string;
  systemVoltage: number;
  spec: EngineSpec;
}

function engineRecordOf(e: EngineEntity): EngineRecord {
  return {
    id: e.id,
    description: e.description,
    systemVoltage: e.systemVoltage,
    spec: {
      code: e.code,
      displacementL: e.displacementL,
      cylinders: e.cylinders,
      compressionRatio: e.compressionRatio,
      aspiration: e.aspiration,
      peakBoostKpa: e.peakBoostKpa,
      rodRatio: e.rodRatio,
      specGapMm: e.specGapMm,
      dwellMs: e.dwellMs,
      crankingDwellMs: e.crankingDwellMs,
      driverCurrentLimitA: e.driverCurrentLimitA,
    },
  };
}

export async function findEngine(ex: EntityManager, id: string): Promise<EngineRecord | null> {
  const engine = await ex.getRepository(EngineEntity).findOneBy({ id });
  return engine && engineRecordOf(engine);
}

const fitmentRowSchema = z.object({ part_id: z.string(), position: z.enum(FITMENT_POSITIONS), quantity: z.number().int() });
export type FitmentRow = z.infer<typeof fitmentRowSchema>;

/** The parts an engine is built with, by position. */
export function engineFitments(ex: Executor, engineId: string): Promise<FitmentRow[]> {
  return queryRows(ex, fitmentRowSchema, `SELECT part_id, position, quantity FROM fitment WHERE engine_id = $1 ORDER BY position`, [
    engineId,
  ]);
}

const partIdRowSchema = z.object({ part_id: z.string() });

/** The part an engine is fitted with of a kind (its first position: "ignition coil", "spark plug"). */
export async function fittedPartId(ex: Executor, engineId: string, kind: PartKind): Promise<string | null> {
  const row = await queryOne(
    ex,
    partIdRowSchema,
    `SELECT f.part_id FROM fitment f JOIN part p ON p.id = f.part_id WHERE f.engine_id = $1 AND p.kind = $2 ORDER BY f.position LIMIT 1`,
    [engineId, kind],
  );
  return row?.part_id ?? null;
}
