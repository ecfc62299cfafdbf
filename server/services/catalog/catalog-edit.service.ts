import type { DataSource, EntityManager } from 'typeorm';
import { normalizePartNumber } from '../../../shared/part-number';
import type { CreateBrandBody } from '../../../shared/schemas/brands';
import type { CreateInterchangeBody } from '../../../shared/schemas/interchange';
import type { CreatePartBody, UpdatePartBody } from '../../../shared/schemas/parts';
import { AppError } from '../../errors';
import type { JobQueue } from '../../jobs/queue';
import type { PartDetailRecord } from '../../presenters/part.presenter';
import { audit } from '../../repositories/audit.repository';
import { brandIdByNorm, insertBrand, type BrandRow } from '../../repositories/brands.repository';
import { findClaim, insertClaim, type InterchangeClaimRow } from '../../repositories/interchange.repository';
import { chainReaches, findPartRows, insertPart, lockPart, partKindOf, updatePart } from '../../repositories/parts.repository';
import { heatCodeKnown, writeCoilSpec, writePlugSpec } from '../../repositories/specs.repository';
import { getSettings } from '../settings.service';
import { getBrand } from './brands.service';
import type { Here } from '../locations.service';
import { loadPartDetail } from './part-detail.service';

const brandNorm = (name: string) => name.trim().toLowerCase();

async function brandIdByName(m: EntityManager, name: string): Promise<string> {
  const id = await brandIdByNorm(m, brandNorm(name));
  if (!id) throw AppError.badRequest(`brand: no brand called "${name}"`, [{ field: 'brand', message: 'unknown brand' }]);
  return id;
}

async function checkHeatCode(m: EntityManager, brandId: string, code: string): Promise<void> {
  if (!(await heatCodeKnown(m, brandId, code)))
    throw AppError.badRequest(`plug.heatCode: "${code}" is not in this brand's heat table`, [
      { field: 'plug.heatCode', message: 'unknown heat code' },
    ]);
}

/** A new successor must be a part of the same kind whose own chain does not lead back here. */
async function checkSuccessor(m: EntityManager, partId: string, kind: string, successorId: string): Promise<void> {
  if (successorId === partId) throw AppError.badRequest('supersededById: a part cannot supersede itself');
  if (await chainReaches(m, successorId, partId)) throw AppError.badRequest('supersededById: that would make a supersession loop');
  const successorKind = await partKindOf(m, successorId);
  if (!successorKind) throw AppError.badRequest('supersededById: no such part');
  if (successorKind !== kind) throw AppError.badRequest('supersededById: a coil is superseded by a coil, a plug by a plug');
}

/**
 * Catalog edits: each in one transaction with its audit row and the job that refreshes the search
 * index for the parts it touched, so the index follows every committed edit (retried while the
 * search service is down) and never fails the edit itself. What an edit answers is read back from
 * the primary, which has it.
 */
export class CatalogEditService {
  constructor(
    private readonly ds: DataSource,
    private readonly jobs: JobQueue,
  ) {}

  async createBrand(actorId: string, body: CreateBrandBody): Promise<BrandRow> {
    const id = await this.ds.transaction(async (m) => {
      const brandId = await insertBrand(m, {
        name: body.name,
        nameNorm: brandNorm(body.name),
        ours: body.ours,
        heatCodeNote: body.heatCodeNote ?? null,
        heatCodes: body.heatCodes,
      });
      await audit(m, {
        actorId,
        action: 'brand.create',
        entityType: 'brand',
        entityId: brandId,
        data: { name: body.name, heatCodes: body.heatCodes.length },
      });
      return brandId;
    });
    return getBrand(this.ds.manager, id);
  }

  async createPart(actorId: string, body: CreatePartBody, here: Here): Promise<PartDetailRecord> {
    const id = await this.ds.transaction(async (m) => {
      const brandId = await brandIdByName(m, body.brand);
      const partId = await insertPart(m, {
        brandId,
        partNumber: body.partNumber,
        partNumberNorm: normalizePartNumber(body.partNumber),
        kind: body.kind,
        description: body.description,
        gtin: body.gtin ?? null,
      });
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
    return this.partAsWritten(id, here);
  }

  async updatePart(actorId: string, id: string, body: UpdatePartBody, here: Here): Promise<PartDetailRecord> {
    await this.ds.transaction(async (m) => {
      const part = await lockPart(m, id);
      if (!part) throw AppError.notFound('Part');
      if (body.coil && part.kind !== 'coil') throw AppError.badRequest('coil: this part is a plug');
      if (body.plug && part.kind !== 'plug') throw AppError.badRequest('plug: this part is a coil');
      if (body.supersededById) await checkSuccessor(m, id, part.kind, body.supersededById);
      await updatePart(m, id, {
        description: body.description,
        status: body.status,
        gtin: body.gtin,
        supersededById: body.supersededById,
      });
      if (body.coil) await writeCoilSpec(m, id, body.coil);
      if (body.plug) {
        await checkHeatCode(m, part.brand_id, body.plug.heatCode);
        await writePlugSpec(m, id, body.plug);
      }
      await audit(m, { actorId, action: 'part.update', entityType: 'part', entityId: id, data: { fields: Object.keys(body) } });
      const touched = [id, part.superseded_by_id, body.supersededById].filter((x): x is string => !!x);
      await this.jobs.enqueue(m, 'search.refresh', { partIds: touched });
    });
    return this.partAsWritten(id, here);
  }

  async createInterchange(actorId: string, body: CreateInterchangeBody): Promise<InterchangeClaimRow> {
    const id = await this.ds.transaction(async (m) => {
      if (!(await findPartRows(m, [body.partId])).size)
        throw AppError.badRequest('partId: no such part', [{ field: 'partId', message: 'unknown part' }]);
      const claimId = await insertClaim(m, {
        brand: body.brand,
        number: body.number,
        numberNorm: normalizePartNumber(body.number),
        partId: body.partId,
        source: body.source,
        confidence: body.confidence,
      });
      await audit(m, { actorId, action: 'interchange.create', entityType: 'interchange', entityId: claimId, data: { ...body } });
      await this.jobs.enqueue(m, 'search.refresh', { partIds: [body.partId] });
      return claimId;
    });
    const claim = await findClaim(this.ds.manager, id);
    if (!claim) throw AppError.notFound('Interchange claim');
    return claim;
  }

  /** The part as the edit left it: read on the primary, as a replica may not have the edit yet. */
  private async partAsWritten(id: string, here: Here): Promise<PartDetailRecord> {
    return loadPartDetail(this.ds.manager, id, (await getSettings(this.ds)).compat, await here(this.ds.manager));
  }
}
