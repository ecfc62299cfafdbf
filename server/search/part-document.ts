import type { DataSource } from 'typeorm';
import { readCaughtUp } from '../db/read-only';
import { chainPartIds, documentRows, type DocumentRow } from '../repositories/search.repository';

/**
 * One search document per part of ours: every normalised number that should lead to it (its own,
 * interchange numbers, the numbers it supersedes along the chain), the words a clerk types, and
 * the spec facets. Built from PostgreSQL, the source of truth.
 */
export interface PartDocument {
  id: string;
  brand: string;
  partNumber: string;
  number: string;
  gtin: string | null;
  kind: 'coil' | 'plug';
  description: string;
  /** The spec in the words and numbers a clerk types ("14 mm thread", "19 mm reach", "4 pin"). */
  specWords: string;
  interchangeNumbers: string[];
  supersededNumbers: string[];
  engineCodes: string[];
  vehicles: string[];
  /** False for a part superseded by another: searches show the current part instead. */
  current: boolean;
  hasSpec: boolean;
  onHand: number;
  inStock: boolean;
  /** For ranking among equal matches: 2 for a spec, 1 for stock on hand. */
  rankBoost: number;
  architecture: string | null;
  driver: string | null;
  connectorPins: number | null;
  connectorKey: string | null;
  primaryOhmMin: number | null;
  primaryOhmMax: number | null;
  threadMm: number | null;
  reachMm: number | null;
  seat: string | null;
  hexMm: number | null;
  heatStep: number | null;
  resistor: boolean | null;
  gapMm: number | null;
}

export const SEARCHABLE_ATTRIBUTES = [
  'number',
  'interchangeNumbers',
  'supersededNumbers',
  'gtin',
  'partNumber',
  'brand',
  'description',
  'specWords',
  'engineCodes',
  'vehicles',
];
export const FILTERABLE_ATTRIBUTES = [
  'id',
  'kind',
  'brand',
  'current',
  'inStock',
  'architecture',
  'driver',
  'connectorPins',
  'connectorKey',
  'primaryOhmMin',
  'primaryOhmMax',
  'threadMm',
  'reachMm',
  'seat',
  'hexMm',
  'heatStep',
  'resistor',
  'gapMm',
];
export const FACET_ATTRIBUTES = [
  'kind',
  'brand',
  'architecture',
  'driver',
  'connectorKey',
  'threadMm',
  'reachMm',
  'seat',
  'hexMm',
  'heatStep',
  'resistor',
];

/** A spec as words: the plain forms a clerk uses at the counter, for free-text search. */
function specWords(r: DocumentRow): string {
  const words: (string | number | null | false)[] =
    r.kind === 'plug'
      ? [
          r.thread_mm !== null && `M${r.thread_mm} ${r.thread_mm} mm thread`,
          r.reach_mm !== null && `${r.reach_mm} mm reach`,
          r.seat && `${r.seat} seat`,
          r.hex_mm !== null && `${r.hex_mm} mm hex`,
          r.heat_step !== null && `heat step ${r.heat_step}`,
          r.resistor !== null && (r.resistor ? 'resistor' : 'non-resistor'),
          r.gap_mm !== null && `${r.gap_mm} mm gap`,
        ]
      : [
          r.architecture,
          r.driver && (r.driver === 'integrated' ? 'integrated igniter' : 'external driver'),
          r.connector_pins !== null && `${r.connector_pins} pin`,
          r.connector_key && `${r.connector_key} key`,
        ];
  return words.filter((w) => w !== null && w !== false).join(' ');
}

function toDocument(r: DocumentRow): PartDocument {
  return {
    id: r.id,
    brand: r.brand,
    partNumber: r.part_number,
    number: r.part_number_norm,
    gtin: r.gtin,
    kind: r.kind,
    description: r.description,
    specWords: specWords(r),
    interchangeNumbers: r.interchange_numbers,
    supersededNumbers: r.superseded_numbers,
    engineCodes: r.engine_codes,
    vehicles: r.vehicles,
    current: r.current,
    hasSpec: r.has_spec,
    onHand: r.on_hand,
    inStock: r.on_hand > 0,
    rankBoost: (r.has_spec ? 2 : 0) + (r.on_hand > 0 ? 1 : 0),
    architecture: r.architecture,
    driver: r.driver,
    connectorPins: r.connector_pins,
    connectorKey: r.connector_key,
    primaryOhmMin: r.primary_ohm_min,
    primaryOhmMax: r.primary_ohm_max,
    threadMm: r.thread_mm,
    reachMm: r.reach_mm,
    seat: r.seat,
    hexMm: r.hex_mm,
    heatStep: r.heat_step,
    resistor: r.resistor,
    gapMm: r.gap_mm,
  };
}

/**
 * Every document, or those of the given parts. Read on a replica once it has every write committed
 * before the call (the refresh after an edit must not index the part as it was), else the primary.
 */
export async function loadPartDocuments(ds: DataSource, partIds?: string[]): Promise<PartDocument[]> {
  return (await readCaughtUp(ds, (ex) => documentRows(ex, partIds))).map(toDocument);
}

/** The parts whose documents a change to these parts touches (see chainPartIds), read as above. */
export function affectedPartIds(ds: DataSource, partIds: string[]): Promise<string[]> {
  return readCaughtUp(ds, (ex) => chainPartIds(ex, partIds));
}
