import type { Role } from '../../shared/roles';
import type { InterchangeCheck } from '../../shared/schemas/compat';
import type { InterchangeRow, PartDetail, PartRef, PartSummary } from '../../shared/schemas/parts';
import type { CoilSpec, PartSpec, ResolvedPlugSpec } from '../../shared/schemas/specs';
import type { CoilSpecEntity, PlugSpecEntity } from '../entities';
import type { InterchangeVerdict } from '../services/compat/interchange-verdict.service';
import { presentPrice, presentStock, sellPrice, type PriceRow } from './stock-price.presenter';

export interface PartRow {
  id: string;
  brand: string;
  ours: boolean;
  part_number: string;
  kind: 'coil' | 'plug';
  description: string;
  gtin: string | null;
  status: 'active' | 'discontinued';
  superseded_by_id: string | null;
  has_spec: boolean;
}

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

export function presentCoilSpec(s: CoilSpecEntity): CoilSpec {
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
export function presentPlugSpec(s: PlugSpecEntity, heatStep: number): ResolvedPlugSpec {
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

/** A part's spec as loaded (one kind or none) as the API shows it. */
export const presentSpec = (spec: { coil?: CoilSpec; plug?: ResolvedPlugSpec } | undefined): PartSpec | null =>
  spec?.coil ?? spec?.plug ?? null;

/** An interchange verdict with its concerns cut to what a claim shows: which check, how bad, why. */
export function presentInterchangeCheck(check: InterchangeVerdict): InterchangeCheck {
  return {
    verdict: check.verdict,
    engine: check.engine,
    concerns: check.concerns.map((c) => ({ id: c.id, verdict: c.verdict, reason: c.reason })),
  };
}

export interface InterchangeRecord {
  id: string;
  brand: string;
  number: string;
  source: string;
  confidence: number;
  original_part_id: string | null;
}

export interface ChainRecord {
  id: string;
  part_number: string;
}

export interface PartDetailRecord {
  row: PartRow;
  spec: { coil?: CoilSpec; plug?: ResolvedPlugSpec } | undefined;
  stock: { onHand: number; bin: string };
  prices: PriceRow[];
  interchange: { claim: InterchangeRecord; check: InterchangeVerdict | null }[];
  /** The chain up from the part (the part first, its successor next, the current part last) and down (what it replaced). */
  up: ChainRecord[];
  down: ChainRecord[];
}

const partRef = (r: ChainRecord): PartRef => ({ id: r.id, partNumber: r.part_number });

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
    stock: presentStock(d.stock.onHand, d.stock.bin, role),
    price: sellPrice(d.prices, role),
    prices: d.prices.map((p) => presentPrice(p, role)),
  };
}
