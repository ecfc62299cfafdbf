import type { Verdict } from '../../shared/compat';
import type { Role } from '../../shared/roles';
import type { CheckRow, InterchangeCheck } from '../../shared/schemas/compat';
import type { InterchangeRow, PartDetail, PartRef, PartSummary } from '../../shared/schemas/parts';
import type { PartSpec } from '../../shared/schemas/specs';
import type { PartClaimRow } from '../repositories/interchange.repository';
import type { ChainRow, PartRow } from '../repositories/parts.repository';
import type { PriceRow } from '../repositories/prices.repository';
import type { PartSpecs } from '../repositories/specs.repository';
import type { PartStock } from '../repositories/stock.repository';
import { presentPrice, presentStock, sellPrice, sellPriceBasis } from './stock-price.presenter';

export function presentPart(r: PartRow): PartSummary {
  return {
    id: r.id,
    brand: r.brand,
    ours: r.ours,
    partNumber: r.part_number,
    kind: r.kind,
    description: r.description,
    gtin: r.gtin,
    status: r.status,
    supersededById: r.superseded_by_id,
    hasSpec: r.has_spec,
  };
}

/** A part's spec as loaded (one kind or none) as the API shows it. */
export const presentSpec = (spec: PartSpecs | undefined): PartSpec | null => spec?.coil ?? spec?.plug ?? null;

/** The judgement of an interchange claim on an engine (services/compat/interchange-verdict.service.ts). */
export interface InterchangeVerdict {
  verdict: Verdict;
  /** The rows that are not go, with their reasons: why a claimed equivalent is doubtful or wrong. */
  concerns: CheckRow[];
  engine: string;
}

/** An interchange verdict with its concerns cut to what a claim shows: which check, how bad, why. */
export function presentInterchangeCheck(check: InterchangeVerdict): InterchangeCheck {
  return {
    verdict: check.verdict,
    engine: check.engine,
    concerns: check.concerns.map((c) => ({ id: c.id, verdict: c.verdict, reason: c.reason })),
  };
}

export interface PartDetailRecord {
  row: PartRow;
  spec: PartSpecs | undefined;
  stock: PartStock;
  prices: PriceRow[];
  interchange: { claim: PartClaimRow; check: InterchangeVerdict | null }[];
  /** The chain up from the part (the part first, its successor next, the current part last) and down (what it replaced). */
  up: ChainRow[];
  down: ChainRow[];
}

const partRef = (r: ChainRow): PartRef => ({ id: r.id, partNumber: r.part_number });

function presentInterchangeRow({ claim, check }: PartDetailRecord['interchange'][number]): InterchangeRow {
  return {
    id: claim.id,
    brand: claim.brand,
    number: claim.number,
    source: claim.source,
    confidence: claim.confidence,
    originalPartId: claim.original_part_id,
    check: check && presentInterchangeCheck(check),
  };
}

/** GET /api/parts/:id: what a role may see of a part — stock count and cost only for the store's staff. */
export function presentPartDetail(d: PartDetailRecord, role: Role): PartDetail {
  return {
    part: presentPart(d.row),
    spec: presentSpec(d.spec),
    interchange: d.interchange.map(presentInterchangeRow),
    supersession: {
      supersedes: d.down.map(partRef),
      supersededBy: d.up[1] ? partRef(d.up[1]) : null,
      current: partRef(d.up[d.up.length - 1] ?? d.row),
    },
    stock: presentStock(d.stock, role),
    price: sellPrice(d.prices, role),
    sellPriceBasis: sellPriceBasis(d.prices),
    prices: d.prices.map((p) => presentPrice(p, role)),
  };
}
