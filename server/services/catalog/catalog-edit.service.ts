import type { DataSource, EntityManager } from 'typeorm';
import { normalizePartNumber } from '../../../shared/part-number';
import type { CreateBrandBody } from '../../../shared/schemas/brands';
import type { CreateInterchangeBody } from '../../../shared/schemas/interchange';
import type { CreatePartBody, UpdatePartBody } from '../../../shared/schemas/parts';
import type { CoilSpec, PlugSpec } from '../../../shared/schemas/specs';
import { AppError } from '../../errors';
import type { JobQueue } from '../../jobs/queue';
import { audit } from '../audit.service';

const brandNorm = (name: string) => name.trim().toLowerCase();

async function brandIdByName(m: EntityManager, name: string): Promise<string> {
  const rows = (await m.query(`SELECT id FROM brand WHERE name_norm = $1`, [brandNorm(name)])) as { id: string }[];
  if (!rows[0]) throw AppError.badRequest(`brand: no brand called "${name}"`, [{ field: 'brand', message: 'unknown brand' }]);
  return rows[0].id;
}

async function checkHeatCode(m: EntityManager, brandId: string, code: string): Promise<void> {
  const rows = (await m.query(`SELECT 1 FROM brand_heat_code WHERE brand_id = $1 AND code = $2`, [brandId, code])) as unknown[];
  if (!rows.length)
    throw AppError.badRequest(`plug.heatCode: "${code}" is not in this brand's heat table`, [
      { field: 'plug.heatCode', message: 'unknown heat code' },
    ]);
}

export async function writeCoilSpec(m: EntityManager, partId: string, s: CoilSpec): Promise<void> {
  await m.query(
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

export async function writePlugSpec(m: EntityManager, partId: string, s: PlugSpec): Promise<void> {
  await m.query(
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

/**
 * Catalog edits: each in one transaction with its audit row and the job that refreshes the search
 * index for the parts it touched, so the index follows every committed edit (retried while the
 * search service is down) and never fails the edit itself.
 */
export class CatalogEditService {
  constructor(
    private readonly ds: DataSource,
    private readonly jobs: JobQueue,
  ) {}

  async createBrand(actorId: string, body: CreateBrandBody): Promise<{ id: string; name: string }> {
    return this.ds.transaction(async (m) => {
      const rows = (await m.query(`INSERT INTO brand (name, name_norm, ours, heat_code_note) VALUES ($1,$2,$3,$4) RETURNING id`, [
        body.name,
        brandNorm(body.name),
        body.ours,
        body.heatCodeNote ?? null,
      ])) as { id: string }[];
      const id = rows[0]!.id;
      for (const h of body.heatCodes)
        await m.query(`INSERT INTO brand_heat_code (brand_id, code, heat_step) VALUES ($1,$2,$3)`, [id, h.code, h.heatStep]);
      await audit(m, {
        actorId,
        action: 'brand.create',
        entityType: 'brand',
        entityId: id,
        data: { name: body.name, heatCodes: body.heatCodes.length },
      });
      return { id, name: body.name };
    });
  }

  async createPart(actorId: string, body: CreatePartBody): Promise<string> {
    const id = await this.ds.transaction(async (m) => {
      const brandId = await brandIdByName(m, body.brand);
      const rows = (await m.query(
        `INSERT INTO part (brand_id, part_number, part_number_norm, kind, description, gtin) VALUES ($1,$2,$3,$4,$5,$6) RETURNING id`,
        [brandId, body.partNumber, normalizePartNumber(body.partNumber), body.kind, body.description, body.gtin ?? null],
      )) as { id: string }[];
      const partId = rows[0]!.id;
      if (body.coil) await writeCoilSpec(m, partId, body.coil);
      if (body.plug) {
        await checkHeatCode(m, brandId, body.plug.heatCode);
        await writePlugSpec(m, partId, body.plug);
      }
      await audit(m, {
        actorId,
        action: 'part.create',
        entityType: 'part',
        entityId: partId,
        data: { partNumber: body.partNumber, brand: body.brand },
      });
      await this.jobs.enqueue(m, 'search.refresh', { partIds: [partId] });
      return partId;
    });
    return id;
  }

  async updatePart(actorId: string, id: string, body: UpdatePartBody): Promise<void> {
    await this.ds.transaction(async (m) => {
      const rows = (await m.query(`SELECT id, kind, brand_id, superseded_by_id FROM part WHERE id = $1 FOR UPDATE`, [id])) as {
        id: string;
        kind: 'coil' | 'plug';
        brand_id: string;
        superseded_by_id: string | null;
      }[];
      const part = rows[0];
      if (!part) throw AppError.notFound('Part');
      if (body.coil && part.kind !== 'coil') throw AppError.badRequest('coil: this part is a plug');
      if (body.plug && part.kind !== 'plug') throw AppError.badRequest('plug: this part is a coil');
      if (body.supersededById) {
        if (body.supersededById === id) throw AppError.badRequest('supersededById: a part cannot supersede itself');
        // Following the new successor's chain must never lead back here.
        const loop = (await m.query(
          `WITH RECURSIVE up AS (SELECT id, superseded_by_id, 0 AS d FROM part WHERE id = $1
             UNION ALL SELECT p.id, p.superseded_by_id, up.d + 1 FROM part p JOIN up ON p.id = up.superseded_by_id WHERE up.d < 50)
           SELECT 1 FROM up WHERE id = $2`,
          [body.supersededById, id],
        )) as unknown[];
        if (loop.length) throw AppError.badRequest('supersededById: that would make a supersession loop');
        const exists = (await m.query(`SELECT kind FROM part WHERE id = $1`, [body.supersededById])) as { kind: string }[];
        if (!exists[0]) throw AppError.badRequest('supersededById: no such part');
        if (exists[0].kind !== part.kind) throw AppError.badRequest('supersededById: a coil is superseded by a coil, a plug by a plug');
      }
      const sets: string[] = [];
      const args: unknown[] = [id];
      const set = (col: string, v: unknown) => {
        args.push(v);
        sets.push(`${col} = $${args.length}`);
      };
      if (body.description !== undefined) set('description', body.description);
      if (body.status !== undefined) set('status', body.status);
      if (body.gtin !== undefined) set('gtin', body.gtin);
      if (body.supersededById !== undefined) set('superseded_by_id', body.supersededById);
      if (sets.length) await m.query(`UPDATE part SET ${sets.join(', ')}, updated_at = now() WHERE id = $1`, args);
      if (body.coil) await writeCoilSpec(m, id, body.coil);
      if (body.plug) {
        await checkHeatCode(m, part.brand_id, body.plug.heatCode);
        await writePlugSpec(m, id, body.plug);
      }
      await audit(m, { actorId, action: 'part.update', entityType: 'part', entityId: id, data: { fields: Object.keys(body) } });
      const touched = [id, part.superseded_by_id, body.supersededById].filter((x): x is string => !!x);
      await this.jobs.enqueue(m, 'search.refresh', { partIds: touched });
    });
  }

  async createInterchange(actorId: string, body: CreateInterchangeBody): Promise<string> {
    const id = await this.ds.transaction(async (m) => {
      const part = (await m.query(`SELECT id FROM part WHERE id = $1`, [body.partId])) as unknown[];
      if (!part.length) throw AppError.badRequest('partId: no such part', [{ field: 'partId', message: 'unknown part' }]);
      const rows = (await m.query(
        `INSERT INTO interchange (foreign_brand, foreign_number, foreign_number_norm, part_id, source, confidence) VALUES ($1,$2,$3,$4,$5,$6) RETURNING id`,
        [body.brand, body.number, normalizePartNumber(body.number), body.partId, body.source, body.confidence],
      )) as { id: string }[];
      await audit(m, { actorId, action: 'interchange.create', entityType: 'interchange', entityId: rows[0]!.id, data: { ...body } });
      await this.jobs.enqueue(m, 'search.refresh', { partIds: [body.partId] });
      return rows[0]!.id;
    });
    return id;
  }
}
