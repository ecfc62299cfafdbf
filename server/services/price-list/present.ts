import type { Mapping } from '../../../shared/price-list/mapping';
import type {
  PriceList,
  PriceListApplied,
  PriceListChange,
  PriceListCounts,
  PriceListProgress,
  PriceListRowError,
  PriceListStatus,
  SupersessionState,
} from '../../../shared/schemas/price-list';
import type { PartKind } from '../../../shared/schemas/specs';

/** The one way a price_list row (with its supplier and people joined) becomes JSON. */
export const PRICE_LIST_SELECT = `
SELECT pl.id, pl.supplier_id, s.name AS supplier_name, pl.file_name, pl.sha256, pl.size_bytes, pl.encoding, pl.delimiter,
       pl.columns, pl.mapping, pl.mapping_source, pl.status, pl.stale, pl.counts, pl.flagged, pl.flag_threshold_pct,
       pl.progress, pl.applied, pl.created_by, cu.name AS created_by_name, pl.created_at,
       pl.committed_by, mu.name AS committed_by_name, pl.committed_at, pl.discarded_at
  FROM price_list pl
  JOIN supplier s ON s.id = pl.supplier_id
  LEFT JOIN "user" cu ON cu.id = pl.created_by
  LEFT JOIN "user" mu ON mu.id = pl.committed_by`;

export interface PriceListRecord {
  id: string;
  supplier_id: string;
  supplier_name: string;
  file_name: string;
  sha256: string;
  size_bytes: string;
  encoding: string | null;
  delimiter: string | null;
  columns: string[];
  mapping: Mapping;
  mapping_source: PriceList['mappingSource'];
  status: PriceListStatus;
  stale: boolean;
  counts: PriceListCounts | null;
  flagged: number;
  flag_threshold_pct: number | null;
  progress: Partial<PriceListProgress>;
  applied: PriceListApplied | null;
  created_by: string | null;
  created_by_name: string | null;
  created_at: Date;
  committed_by: string | null;
  committed_by_name: string | null;
  committed_at: Date | null;
  discarded_at: Date | null;
}

function person(id: string | null, name: string | null): PriceList['createdBy'] {
  return id === null ? null : { id, name: name ?? '' };
}

export function presentPriceList(r: PriceListRecord): PriceList {
  const bytesTotal = Number(r.size_bytes);
  return {
    id: r.id,
    supplierId: r.supplier_id,
    supplierName: r.supplier_name,
    fileName: r.file_name,
    sha256: r.sha256,
    sizeBytes: bytesTotal,
    encoding: r.encoding,
    delimiter: r.delimiter,
    columns: r.columns,
    mapping: r.mapping,
    mappingSource: r.mapping_source,
    status: r.status,
    stale: r.stale,
    counts: r.counts,
    flagged: r.flagged,
    flagThresholdPct: r.flag_threshold_pct,
    progress: {
      phase: r.progress.phase ?? 'reading',
      rowsDone: r.progress.rowsDone ?? 0,
      bytesRead: r.progress.bytesRead ?? 0,
      bytesTotal: r.progress.bytesTotal ?? bytesTotal,
    },
    applied: r.applied,
    createdBy: person(r.created_by, r.created_by_name),
    createdAt: r.created_at.toISOString(),
    committedBy: person(r.committed_by, r.committed_by_name),
    committedAt: r.committed_at?.toISOString() ?? null,
    discardedAt: r.discarded_at?.toISOString() ?? null,
  };
}

export interface ChangeRecord {
  line: number;
  change: 'new' | 'changed' | 'unchanged';
  part_id: string | null;
  part_number: string;
  brand: string;
  description: string | null;
  kind: PartKind | null;
  part_kind: PartKind | null;
  old_cost_cents: number | null;
  cost_cents: number;
  old_list_cents: number | null;
  list_cents: number;
  old_core_cents: number | null;
  core_cents: number | null;
  old_pack_qty: number | null;
  pack_qty: number | null;
  cost_change_pct: number | null;
  list_change_pct: number | null;
  flagged: boolean;
  has_spec: boolean;
  supersedes: string | null;
  supersession: SupersessionState | null;
}

const oneDecimal = (pct: number | null): number | null => (pct === null ? null : Math.round(pct * 10) / 10);

export function presentChange(r: ChangeRecord): PriceListChange {
  return {
    line: r.line,
    type: r.change,
    partId: r.part_id,
    partNumber: r.part_number,
    brand: r.brand,
    description: r.description,
    kind: r.part_kind ?? r.kind,
    oldCostCents: r.old_cost_cents,
    newCostCents: r.cost_cents,
    oldListCents: r.old_list_cents,
    newListCents: r.list_cents,
    oldCoreCents: r.old_core_cents,
    newCoreCents: r.core_cents,
    oldPackQty: r.old_pack_qty,
    newPackQty: r.pack_qty,
    costChangePct: oneDecimal(r.cost_change_pct),
    listChangePct: oneDecimal(r.list_change_pct),
    flagged: r.flagged,
    specStored: r.has_spec,
    supersedes: r.supersedes,
    supersession: r.supersession,
  };
}

export interface RowErrorRecord {
  line: number;
  column: string | null;
  field: string | null;
  message: string;
}

export function presentRowError(r: RowErrorRecord): PriceListRowError {
  return { line: r.line, column: r.column, field: r.field, message: r.message };
}
