import type { CounterPrices } from '../../shared/schemas/sell-price';
import type {
  CommitPriceListResponse,
  PriceList,
  PriceListChange,
  PriceListChanges,
  PriceListErrors,
  PriceListHistory,
  PriceListRowError,
} from '../../shared/schemas/price-lists';
import type { ChangeRow, RowErrorRow } from '../repositories/price-list-rows.repository';
import type { PriceListRow } from '../repositories/price-lists.repository';

function person(id: string | null, name: string | null): PriceList['createdBy'] {
  return id === null ? null : { id, name: name ?? '' };
}

export function presentPriceList(r: PriceListRow): PriceList {
  const bytesTotal = r.size_bytes;
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

const oneDecimal = (pct: number | null): number | null => (pct === null ? null : Math.round(pct * 10) / 10);

export function presentChange(r: ChangeRow): PriceListChange {
  return {
    line: r.line,
    type: r.change,
    partId: r.part_id,
    partNumber: r.part_number,
    catalogNumber: r.catalog_number,
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

export function presentRowError(r: RowErrorRow): PriceListRowError {
  return { line: r.line, column: r.column, field: r.field, message: r.message };
}

export const presentPriceListHistory = (rows: PriceListRow[], total: number): PriceListHistory => ({
  priceLists: rows.map(presentPriceList),
  total,
});

export const presentChanges = (rows: ChangeRow[], total: number): PriceListChanges => ({ changes: rows.map(presentChange), total });

export const presentRowErrors = (rows: RowErrorRow[], total: number): PriceListErrors => ({ errors: rows.map(presentRowError), total });

/** POST .../commit: the list as committed, and what could not follow (search index, e-mail). */
export const presentCommitted = (
  { list, counterPrices }: { list: PriceListRow; counterPrices: CounterPrices },
  notices: string[],
): CommitPriceListResponse => ({ ...presentPriceList(list), notices, counterPrices });
