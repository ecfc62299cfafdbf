import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { COPPER_REFERENCE_C, isContinuity, type BenchVerdict } from '@shared/compat/bench-test';
import { formatMeasure, formatRange } from '@shared/format';
import type { BenchBody, BenchResult } from '@shared/schemas/bench';
import { DataTable } from '@/components/ui/data-table';
import { StatusBadge, type Verdict } from '@/features/compat/components/verdict-badge';

/** A bench verdict's word and the verdict look it takes: only "in spec" is good to fit. */
export const BENCH_LOOK: Record<BenchVerdict, { tone: Verdict; label: string }> = {
  'in-spec': { tone: 'go', label: 'in spec' },
  'out-of-spec': { tone: 'no-go', label: 'out of spec' },
  short: { tone: 'no-go', label: 'short' },
  open: { tone: 'no-go', label: 'open' },
};

function BenchBadge({ verdict, size }: { verdict: BenchVerdict; size?: 'sm' | 'lg' }) {
  const look = BENCH_LOOK[verdict];
  return <StatusBadge tone={look.tone} label={look.label} size={size} />;
}

export type Readings = BenchBody['measured'];

interface WindingRow {
  winding: 'Primary' | 'Secondary';
  /** The meter's reading in the winding's unit; undefined: not measured, null: no reading. */
  reading: number | null | undefined;
  /** The same reading in ohms, to tell an overload from a reading. */
  readingOhm: number | null | undefined;
  at20: number | null;
  unit: 'Ω' | 'kΩ';
  window: string;
  verdict: BenchVerdict | null;
}

function readingText(row: WindingRow): string {
  if (row.reading === undefined) return 'not measured';
  if (row.reading === null) return 'no reading';
  if (!isContinuity(row.readingOhm)) return 'over range';
  return formatMeasure(row.reading, row.unit, 3);
}

const col = createColumnHelper<WindingRow>();

/** The readings corrected to 20 °C against the coil's windows, with the verdict and its reason. */
export function BenchResultView({ result, readings }: { result: BenchResult; readings: Readings }) {
  const w = result.window;
  const tempC = readings.temperatureC;
  // At 20 °C the corrected value is the reading: one column says it.
  const corrected = tempC !== COPPER_REFERENCE_C;
  const rows: WindingRow[] = [
    {
      winding: 'Primary',
      reading: readings.primaryOhm,
      readingOhm: readings.primaryOhm,
      at20: result.primaryAt20Ohm,
      unit: 'Ω',
      window: formatRange(w.primaryOhmMin, w.primaryOhmMax, 'Ω'),
      verdict: result.primaryVerdict,
    },
  ];
  if (readings.secondaryKohm !== undefined) {
    rows.push({
      winding: 'Secondary',
      reading: readings.secondaryKohm,
      readingOhm: readings.secondaryKohm === null ? null : readings.secondaryKohm * 1000,
      at20: result.secondaryAt20Kohm,
      unit: 'kΩ',
      window:
        w.secondaryKohmMin != null && w.secondaryKohmMax != null ? formatRange(w.secondaryKohmMin, w.secondaryKohmMax, 'kΩ') : 'not stated',
      verdict: result.secondaryVerdict,
    });
  }
  const columns = useMemo(
    () => [
      col.accessor('winding', { header: 'Winding', meta: { cellClassName: 'font-semibold' } }),
      col.accessor(readingText, { id: 'reading', header: `Reading at ${formatMeasure(tempC, '°C')}`, meta: { align: 'right' } }),
      col.accessor((r) => (r.at20 === null ? '—' : formatMeasure(r.at20, r.unit, 3)), {
        id: 'at20',
        header: `Corrected to ${COPPER_REFERENCE_C} °C`,
        meta: { align: 'right', cellClassName: 'font-semibold' },
      }),
      col.accessor('window', { header: `Window at ${COPPER_REFERENCE_C} °C`, meta: { align: 'right' } }),
      col.display({
        id: 'verdict',
        header: 'Verdict',
        cell: ({ row }) =>
          row.original.verdict ? <BenchBadge verdict={row.original.verdict} /> : <span className="text-ink-soft">no window</span>,
      }),
    ],
    [tempC],
  );
  return (
    <div className="flex flex-col gap-3" aria-label="Bench test result" role="region">
      <div className="flex flex-wrap items-center gap-3">
        <span className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Verdict</span>
        <span data-testid="bench-verdict">
          <BenchBadge verdict={result.verdict} size="lg" />
        </span>
        {result.coil && <span className="text-ink-soft">{result.coil.label}</span>}
      </div>
      <p className="text-[16px] leading-snug text-ink">{result.reason}</p>
      <DataTable label="Windings" data={rows} columns={columns} getRowId={(r) => r.winding} columnVisibility={{ at20: corrected }} />
    </div>
  );
}
