import { In, type EntityManager } from 'typeorm';
import { z } from 'zod';
import type { CoilSpec, PlugSpec, ResolvedPlugSpec } from '../../shared/schemas/specs';
import { heatStepSchema } from '../../shared/schemas/specs';
import { execute, queryExists, queryRows, type Executor } from '../db/executor';
import { CoilSpecEntity, PlugSpecEntity } from '../entities';

/** A part's spec as loaded: one kind, or none when the part has no usable spec. */
export interface PartSpecs {
  coil?: CoilSpec;
  plug?: ResolvedPlugSpec;
}

function coilSpecOf(s: CoilSpecEntity): CoilSpec {
  return {
    architecture: s.architecture,
    driver: s.driver,
    outputs: s.outputs,
    connectorPins: s.connectorPins,
    connectorKey: s.connectorKey,
    primaryOhmMin: s.primaryOhmMin,
    primaryOhmMax: s.primaryOhmMax,
    primaryInductanceMh: s.primaryInductanceMh,
    secondaryKohmMin: s.secondaryKohmMin,
    secondaryKohmMax: s.secondaryKohmMax,
    turnsRatio: s.turnsRatio,
    availableKv: s.availableKv,
    peakCurrentA: s.peakCurrentA,
  };
}

/** A plug spec with the heat step its brand's table maps the heat code to. */
function plugSpecOf(s: PlugSpecEntity, heatStep: number): ResolvedPlugSpec {
  return {
    threadMm: s.threadMm,
    threadPitchMm: s.threadPitchMm,
    reachMm: s.reachMm,
    seat: s.seat,
    hexMm: s.hexMm,
    heatCode: s.heatCode,
    heatStep,
    gapMm: s.gapMm,
    regappable: s.regappable,
    resistor: s.resistor,
    resistorKohm: s.resistorKohm,
    projectedTip: s.projectedTip,
    electrode: s.electrode,
  };
}

const heatStepRowSchema = z.object({ part_id: z.string(), heat_step: heatStepSchema });

/** Specs of the given parts; a plug whose heat code its brand's table does not map has no usable spec. */
export async function findSpecs(ex: EntityManager, ids: readonly string[]): Promise<Map<string, PartSpecs>> {
  const out = new Map<string, PartSpecs>();
  if (!ids.length) return out;
  const coils = await ex.getRepository(CoilSpecEntity).findBy({ partId: In([...ids]) });
  for (const c of coils) out.set(c.partId, { coil: coilSpecOf(c) });
  const plugs = await ex.getRepository(PlugSpecEntity).findBy({ partId: In([...ids]) });
  if (plugs.length) {
    const steps = await queryRows(
      ex,
      heatStepRowSchema,
      `SELECT ps.part_id, hc.heat_step FROM plug_spec ps JOIN part p ON p.id = ps.part_id
         JOIN brand_heat_code hc ON hc.brand_id = p.brand_id AND hc.code = ps.heat_code WHERE ps.part_id = ANY($1::uuid[])`,
      [ids],
    );
    const stepOf = new Map(steps.map((s) => [s.part_id, s.heat_step]));
    for (const p of plugs) {
      const step = stepOf.get(p.partId);
      if (step !== undefined) out.set(p.partId, { plug: plugSpecOf(p, step) });
    }
  }
  return out;
}

/** True when the brand's heat table has the code. */
export function heatCodeKnown(ex: Executor, brandId: string, code: string): Promise<boolean> {
  return queryExists(ex, `SELECT 1 FROM brand_heat_code WHERE brand_id = $1 AND code = $2`, [brandId, code]);
}

export async function writeCoilSpec(ex: Executor, partId: string, s: CoilSpec): Promise<void> {
  await execute(
    ex,
    `INSERT INTO coil_spec (part_id, architecture, driver, outputs, connector_pins, connector_key, primary_ohm_min, primary_ohm_max,
       primary_inductance_mh, secondary_kohm_min, secondary_kohm_max, turns_ratio, available_kv, peak_current_a)
     VALUES ($1,$2,$3,$4,$5,$6,$7,$8,$9,$10,$11,$12,$13,$14)
     ON CONFLICT (part_id) DO UPDATE SET architecture = EXCLUDED.architecture, driver = EXCLUDED.driver, outputs = EXCLUDED.outputs,
       connector_pins = EXCLUDED.connector_pins, connector_key = EXCLUDED.connector_key, primary_ohm_min = EXCLUDED.primary_ohm_min,
       primary_ohm_max = EXCLUDED.primary_ohm_max, primary_inductance_mh = EXCLUDED.primary_inductance_mh,
       secondary_kohm_min = EXCLUDED.secondary_kohm_min, secondary_kohm_max = EXCLUDED.secondary_kohm_max, turns_ratio = EXCLUDED.turns_ratio,
       available_kv = EXCLUDED.available_kv, peak_current_a = EXCLUDED.peak_current_a`,
    [
      partId,
      s.architecture,
      s.driver,
      s.outputs,
      s.connectorPins,
      s.connectorKey,
      s.primaryOhmMin,
      s.primaryOhmMax,
      s.primaryInductanceMh,
      s.secondaryKohmMin ?? null,
      s.secondaryKohmMax ?? null,
      s.turnsRatio,
      s.availableKv ?? null,
      s.peakCurrentA,
    ],
  );
}

export async function writePlugSpec(ex: Executor, partId: string, s: PlugSpec): Promise<void> {
  await execute(
    ex,
    `INSERT INTO plug_spec (part_id, thread_mm, thread_pitch_mm, reach_mm, seat, hex_mm, heat_code, gap_mm, regappable, resistor, resistor_kohm, projected_tip, electrode)
     VALUES ($1,$2,$3,$4,$5,$6,$7,$8,$9,$10,$11,$12,$13)
     ON CONFLICT (part_id) DO UPDATE SET thread_mm = EXCLUDED.thread_mm, thread_pitch_mm = EXCLUDED.thread_pitch_mm, reach_mm = EXCLUDED.reach_mm,
       seat = EXCLUDED.seat, hex_mm = EXCLUDED.hex_mm, heat_code = EXCLUDED.heat_code, gap_mm = EXCLUDED.gap_mm, regappable = EXCLUDED.regappable,
       resistor = EXCLUDED.resistor, resistor_kohm = EXCLUDED.resistor_kohm, projected_tip = EXCLUDED.projected_tip, electrode = EXCLUDED.electrode`,
    [
      partId,
      s.threadMm,
      s.threadPitchMm,
      s.reachMm,
      s.seat,
      s.hexMm,
      s.heatCode,
      s.gapMm,
      s.regappable,
      s.resistor,
      s.resistorKohm ?? null,
      s.projectedTip,
      s.electrode,
    ],
  );
}
