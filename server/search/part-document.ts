import type { DataSource } from 'typeorm';

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

// Vehicles are folded to one label per make, model and engine with the year span, so a part that
// fits 40 model years carries a few labels, not 40.
const DOCUMENT_SQL = `
WITH RECURSIVE chain AS (
  SELECT p.id AS current_id, old.id AS old_id, old.part_number_norm AS old_norm, 1 AS depth
    FROM part p JOIN part old ON old.superseded_by_id = p.id
  UNION ALL
  SELECT c.current_id, older.id, older.part_number_norm, c.depth + 1
    FROM chain c JOIN part older ON older.superseded_by_id = c.old_id
   WHERE c.depth < 20
),
veh AS (
  SELECT f.part_id, array_agg(DISTINCT e.code) AS engine_codes,
         array_agg(DISTINCT v.make || ' ' || v.model || ' ' || e.code || ' ' || v.y0 || '-' || v.y1) AS labels
    FROM fitment f
    JOIN engine e ON e.id = f.engine_id
    JOIN (SELECT engine_id, make, model, min(year) AS y0, max(year) AS y1 FROM vehicle GROUP BY engine_id, make, model) v ON v.engine_id = e.id
   GROUP BY f.part_id
)
SELECT p.id, b.name AS brand, p.part_number, p.part_number_norm, p.gtin, p.kind, p.description,
       p.superseded_by_id IS NULL AS current,
       (cs.part_id IS NOT NULL OR ps.part_id IS NOT NULL) AS has_spec,
       coalesce(s.on_hand, 0) AS on_hand,
       -- A foreign number that points at a superseded part leads on to the current one. Two
       -- index lookups rather than one OR, which would scan the whole interchange table per part.
       ARRAY(SELECT DISTINCT n FROM (
               SELECT i.foreign_number_norm AS n FROM interchange i WHERE i.part_id = p.id
               UNION ALL
               SELECT i.foreign_number_norm FROM chain c JOIN interchange i ON i.part_id = c.old_id WHERE c.current_id = p.id) x) AS interchange_numbers,
       coalesce((SELECT array_agg(DISTINCT c.old_norm) FROM chain c WHERE c.current_id = p.id), '{}') AS superseded_numbers,
       coalesce(veh.engine_codes, '{}') AS engine_codes, coalesce(veh.labels, '{}') AS vehicles,
       cs.architecture, cs.driver, cs.connector_pins, cs.connector_key, cs.primary_ohm_min, cs.primary_ohm_max,
       ps.thread_mm, ps.reach_mm, ps.seat, ps.hex_mm, hc.heat_step, ps.resistor, ps.gap_mm
  FROM part p
  JOIN brand b ON b.id = p.brand_id AND b.ours
  LEFT JOIN coil_spec cs ON cs.part_id = p.id
  LEFT JOIN plug_spec ps ON ps.part_id = p.id
  LEFT JOIN brand_heat_code hc ON hc.brand_id = p.brand_id AND hc.code = ps.heat_code
  LEFT JOIN stock s ON s.part_id = p.id
  LEFT JOIN veh ON veh.part_id = p.id
`;

interface DocumentRow {
  id: string;
  brand: string;
  part_number: string;
  part_number_norm: string;
  gtin: string | null;
  kind: 'coil' | 'plug';
  description: string;
  current: boolean;
  has_spec: boolean;
  on_hand: number;
  interchange_numbers: string[];
  superseded_numbers: string[];
  engine_codes: string[];
  vehicles: string[];
  architecture: string | null;
  driver: string | null;
  connector_pins: number | null;
  connector_key: string | null;
  primary_ohm_min: number | null;
  primary_ohm_max: number | null;
  thread_mm: number | null;
  reach_mm: number | null;
  seat: string | null;
  hex_mm: number | null;
  heat_step: number | null;
  resistor: boolean | null;
  gap_mm: number | null;
}

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

/** Every document, or those of the given parts. */
export async function loadPartDocuments(ds: DataSource, partIds?: string[]): Promise<PartDocument[]> {
  const sql = partIds ? `${DOCUMENT_SQL} WHERE p.id = ANY($1::uuid[])` : DOCUMENT_SQL;
  const rows = (await ds.query(sql, partIds ? [partIds] : [])) as DocumentRow[];
  return rows.map(toDocument);
}

/**
 * The parts whose documents a change to these parts touches: themselves, the parts they are
 * superseded by up the chain (whose supersededNumbers change) and those they supersede.
 */
export async function affectedPartIds(ds: DataSource, partIds: string[]): Promise<string[]> {
  const rows = (await ds.query(
    `WITH RECURSIVE up AS (
        SELECT id, superseded_by_id, 0 AS d FROM part WHERE id = ANY($1::uuid[])
        UNION SELECT p.id, p.superseded_by_id, up.d + 1 FROM part p JOIN up ON p.id = up.superseded_by_id WHERE up.d < 20
     ), down AS (
        SELECT id, 0 AS d FROM part WHERE id = ANY($1::uuid[])
        UNION SELECT p.id, down.d + 1 FROM part p JOIN down ON p.superseded_by_id = down.id WHERE down.d < 20
     )
     SELECT id FROM up UNION SELECT id FROM down`,
    [partIds],
  )) as { id: string }[];
  return rows.map((r) => r.id);
}
