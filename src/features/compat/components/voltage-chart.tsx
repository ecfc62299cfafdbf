import { Area, CartesianGrid, ComposedChart, Legend, Line, Tooltip, XAxis, YAxis } from 'recharts';
import type { CompatResult } from '@shared/schemas/compat';
import { CHART, ORIGINAL_DASH } from './chart-colours';
import { formatMeasure } from '@shared/format';
import { LOAD_POINT_LABELS } from './load-points';

type LoadPoint = CompatResult['loadPoints'][number];

interface Row {
  name: string;
  required: number;
  available: number;
  /** The band between required and available where available is the higher: the reserve. */
  reserve: [number, number];
  /** The band where required is the higher: a shortfall. */
  shortfall: [number, number];
  originalRequired?: number;
  originalAvailable?: number;
}

/**
 * Required against available secondary voltage across the engine's load points (idle → cruise →
 * full load → boost) for the substitute, the original dashed, with the reserve shaded.
 */
export function VoltageChart({
  loadPoints,
  originalLoadPoints,
}: {
  loadPoints: readonly LoadPoint[];
  originalLoadPoints: readonly LoadPoint[];
}) {
  const rows: Row[] = loadPoints.map((p) => {
    const o = originalLoadPoints.find((q) => q.name === p.name);
    return {
      name: LOAD_POINT_LABELS[p.name],
      required: p.requiredKv,
      available: p.availableKv,
      reserve: [p.requiredKv, Math.max(p.availableKv, p.requiredKv)],
      shortfall: [Math.min(p.availableKv, p.requiredKv), p.requiredKv],
      ...(o ? { originalRequired: o.requiredKv, originalAvailable: o.availableKv } : {}),
    };
  });
  const hasShortfall = loadPoints.some((p) => p.availableKv < p.requiredKv);
  const maxKv = Math.max(0, ...rows.flatMap((r) => [r.required, r.available, r.originalRequired ?? 0, r.originalAvailable ?? 0]));
  return (
    <figure className="print-block" aria-label="Required and available secondary voltage across engine load">
      <ComposedChart responsive data={rows} style={{ width: '100%', height: 320 }} margin={{ top: 12, right: 16, bottom: 8, left: 4 }}>
        <CartesianGrid stroke={CHART.grid} strokeDasharray="2 3" />
        <XAxis
          dataKey="name"
          stroke={CHART.axis}
          padding={{ left: 28, right: 28 }}
          label={{ value: 'engine load', position: 'insideBottom', offset: -4, fill: CHART.axis, fontSize: 12 }}
          height={40}
        />
        <YAxis
          domain={[0, Math.ceil((maxKv * 1.1) / 5) * 5]}
          stroke={CHART.axis}
          width={52}
          label={{ value: 'secondary voltage (kV)', angle: -90, position: 'insideLeft', offset: 12, fill: CHART.axis, fontSize: 12 }}
        />
        <Tooltip
          formatter={(value) =>
            Array.isArray(value)
              ? value.map((v) => (typeof v === 'number' ? formatMeasure(v, 'kV') : String(v))).join(' → ')
              : typeof value === 'number'
                ? formatMeasure(value, 'kV')
                : String(value)
          }
        />
        <Legend verticalAlign="top" height={44} itemSorter={null} wrapperStyle={{ fontSize: 13 }} />
        <Area
          dataKey="reserve"
          name="Reserve (substitute)"
          type="linear"
          stroke="none"
          fill={CHART.reserve}
          fillOpacity={0.16}
          legendType="square"
          isAnimationActive={false}
        />
        {hasShortfall && (
          <Area
            dataKey="shortfall"
            name="Shortfall (substitute)"
            type="linear"
            stroke="none"
            fill={CHART.shortfall}
            fillOpacity={0.22}
            legendType="square"
            isAnimationActive={false}
          />
        )}
        <Line
          dataKey="available"
          name="Available, substitute"
          stroke={CHART.available}
          strokeWidth={2.5}
          legendType="plainline"
          isAnimationActive={false}
        />
        <Line
          dataKey="required"
          name="Required, substitute"
          stroke={CHART.required}
          strokeWidth={2.5}
          legendType="plainline"
          isAnimationActive={false}
        />
        <Line
          dataKey="originalAvailable"
          name="Available, original"
          stroke={CHART.available}
          strokeWidth={2}
          strokeDasharray={ORIGINAL_DASH}
          legendType="plainline"
          isAnimationActive={false}
        />
        <Line
          dataKey="originalRequired"
          name="Required, original"
          stroke={CHART.required}
          strokeWidth={2}
          strokeDasharray={ORIGINAL_DASH}
          legendType="plainline"
          isAnimationActive={false}
        />
      </ComposedChart>
      <figcaption className="mt-1 text-xs text-ink-faint">
        Solid: substitute. Dashed: original. Shaded: the substitute&rsquo;s voltage reserve (available above required).
      </figcaption>
    </figure>
  );
}
