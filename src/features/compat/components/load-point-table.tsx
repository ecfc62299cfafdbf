import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import type { CompatResult } from '@shared/schemas/compat';
import { formatMeasure } from '@shared/format';
import { DataTable } from '@/components/ui/data-table';
import { LOAD_POINT_LABELS } from './load-points';

type LoadPoint = CompatResult['loadPoints'][number];
type Row = LoadPoint & { originalReservePct: number | null };

const col = createColumnHelper<Row>();
const RIGHT = { align: 'right' } as const;

/** The voltage chart's figures as a table: the exact numbers, and the chart for those who cannot see it. */
export function LoadPointTable({
  loadPoints,
  originalLoadPoints,
}: {
  loadPoints: readonly LoadPoint[];
  originalLoadPoints: readonly LoadPoint[];
}) {
  const rows: Row[] = loadPoints.map((p) => ({
    ...p,
    originalReservePct: originalLoadPoints.find((q) => q.name === p.name)?.reservePct ?? null,
  }));
  const columns = useMemo(
    () => [
      col.accessor((p) => LOAD_POINT_LABELS[p.name], { id: 'load', header: 'Load', meta: { cellClassName: 'font-semibold text-ink' } }),
      col.accessor((p) => formatMeasure(p.mapKpa, 'kPa'), { id: 'map', header: 'MAP', meta: RIGHT }),
      col.accessor((p) => formatMeasure(p.advanceDeg, '°'), { id: 'advance', header: 'Advance', meta: RIGHT }),
      col.accessor((p) => formatMeasure(p.gapMm, 'mm'), { id: 'gap', header: 'Gap (worn)', meta: RIGHT }),
      col.accessor((p) => formatMeasure(p.requiredKv, 'kV'), { id: 'required', header: 'Required', meta: RIGHT }),
      col.accessor((p) => formatMeasure(p.availableKv, 'kV'), { id: 'available', header: 'Available', meta: RIGHT }),
      col.accessor((p) => formatMeasure(p.reservePct, '%'), {
        id: 'reserve',
        header: 'Reserve',
        cell: ({ row, getValue }) => <span className={row.original.reservePct < 0 ? 'text-nogo' : 'text-ink'}>{getValue()}</span>,
        meta: { align: 'right', cellClassName: 'font-semibold' },
      }),
      col.accessor((p) => (p.originalReservePct === null ? '—' : formatMeasure(p.originalReservePct, '%')), {
        id: 'original',
        header: 'Original’s reserve',
        meta: { align: 'right', cellClassName: 'text-ink-soft' },
      }),
    ],
    [],
  );
  return (
    <DataTable label="Required and available secondary voltage at each load point" data={rows} columns={columns} getRowId={(p) => p.name} />
  );
}
