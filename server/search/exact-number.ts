import type { DataSource } from 'typeorm';
import type { MatchedBy, SearchHit } from '../../shared/schemas/search';

interface ExactRow {
  part_id: string;
  matched_by: MatchedBy;
  matched_number: string;
  brand: string;
  part_number: string;
  kind: 'coil' | 'plug';
  description: string;
  on_hand: number;
  has_spec: boolean;
}

/**
 * The counter's commonest question — "what is this number?" — answered by an exact lookup of the
 * folded number in PostgreSQL's indexes: our numbers, GTINs and interchange numbers, each followed
 * along the supersession chain to the part that is current. The search index (typo tolerance,
 * free text) is asked only when this finds nothing.
 */
export async function exactNumberHits(ds: DataSource, norm: string, limit: number): Promise<SearchHit[]> {
  const rows = (await ds.query(
    `WITH RECURSIVE direct AS (
        SELECT p.id, 'number'::text AS by, p.part_number_norm AS num, 0 AS pri FROM part p WHERE p.part_number_norm = $1
        UNION ALL SELECT p.id, 'gtin', p.gtin, 0 FROM part p WHERE p.gtin = $1
        UNION ALL SELECT i.part_id, 'interchange', i.foreign_number_norm, 1 FROM interchange i WHERE i.foreign_number_norm = $1
      ), walk AS (
        SELECT d.id AS start_id, d.id, p.superseded_by_id, d.by, d.num, d.pri, 0 AS depth FROM direct d JOIN part p ON p.id = d.id
        UNION ALL SELECT w.start_id, p.id, p.superseded_by_id, w.by, w.num, w.pri, w.depth + 1 FROM walk w JOIN part p ON p.id = w.superseded_by_id WHERE w.depth < 20
      ), current AS (
        SELECT DISTINCT ON (w.id) w.id, CASE WHEN w.depth > 0 AND w.by = 'number' THEN 'supersession' ELSE w.by END AS by, w.num, w.pri
          FROM walk w WHERE w.superseded_by_id IS NULL ORDER BY w.id, w.pri, w.depth
      )
      SELECT c.id AS part_id, c.by AS matched_by, c.num AS matched_number, b.name AS brand, p.part_number, p.kind, p.description,
             coalesce(s.on_hand, 0) AS on_hand,
             (EXISTS (SELECT 1 FROM coil_spec x WHERE x.part_id = p.id) OR EXISTS (SELECT 1 FROM plug_spec y WHERE y.part_id = p.id)) AS has_spec
        FROM current c JOIN part p ON p.id = c.id JOIN brand b ON b.id = p.brand_id AND b.ours
        LEFT JOIN stock s ON s.part_id = p.id
       ORDER BY c.pri, p.part_number LIMIT $2`,
    [norm, limit],
  )) as ExactRow[];
  return rows.map((r) => ({
    partId: r.part_id,
    brand: r.brand,
    partNumber: r.part_number,
    kind: r.kind,
    description: r.description,
    matchedBy: r.matched_by,
    matchedNumber: r.matched_number,
    inStock: r.on_hand > 0,
    onHand: r.on_hand,
    hasSpec: r.has_spec,
  }));
}
