import type { Mapping } from '../../shared/price-list/mapping';
import type {
  CommitPriceListResponse,
  PriceList,
  PriceListApplied,
  PriceListChange,
  PriceListChanges,
  PriceListCounts,
  PriceListErrors,
  PriceListHistory,
  PriceListProgress,
  PriceListRowError,
  PriceListStatus,
  SupersessionState,
} from '../../shared/schemas/price-lists';
import type { PartKind } from '../../shared/schemas/specs';

/** A price_list row with its supplier's name and its people's names joined. */
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

export const presentPriceListHistory = (rows: PriceListRecord[], total: number): PriceListHistory => ({
  priceLists: rows.map(presentPriceList),
  total,
});

export const presentChanges = (rows: ChangeRecord[], total: number): PriceListChanges => ({ changes: rows.map(presentChange), total });

export const presentRowErrors = (rows: RowErrorRecord[], total: number): PriceListErrors => ({ errors: rows.map(presentRowError), total });

/** POST .../commit: the list as committed, and what could not follow (search index, e-mail). */
export const presentCommitted = (r: PriceListRecord, notices: string[]): CommitPriceListResponse => ({ ...presentPriceList(r), notices });
