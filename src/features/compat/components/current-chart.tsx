import { CartesianGrid, Legend, Line, LineChart, ReferenceLine, Tooltip, XAxis, YAxis } from 'recharts';
import type { CompatResult } from '@shared/schemas/compat';
import { CHART, ORIGINAL_DASH } from './chart-colours';
import { formatMeasure } from '@shared/format';

type CurvePair = NonNullable<CompatResult['currents']>;

interface Series {
  key: string;
  name: string;
  data: CurvePair['original'];
  stroke: string;
  dashed: boolean;
}

/**
 * Primary current over 0 … 1.5 × dwell for both coils, at cranking and at charging voltage, with
 * the driver's current limit where the engine states one and the end of each dwell marked.
 */
export function CurrentChart({
  currents,
  crankingCurrents,
  driverLimitA,
  dwellMs,
  crankingDwellMs,
}: {
  currents: CurvePair;
  crankingCurrents: CurvePair;
  driverLimitA?: number | null | undefined;
  dwellMs?: number | undefined;
  crankingDwellMs?: number | undefined;
}) {
  const series: Series[] = [
    { key: 'sub-charging', name: 'Substitute, charging', data: currents.substitute, stroke: CHART.charging, dashed: false },
    { key: 'orig-charging', name: 'Original, charging', data: currents.original, stroke: CHART.charging, dashed: true },
    { key: 'sub-cranking', name: 'Substitute, cranking', data: crankingCurrents.substitute, stroke: CHART.cranking, dashed: false },
    { key: 'orig-cranking', name: 'Original, cranking', data: crankingCurrents.original, stroke: CHART.cranking, dashed: true },
  ];
  const maxT = Math.max(0, ...series.flatMap((s) => s.data.map((p) => p.tMs)));
  const maxA = Math.max(driverLimitA ?? 0, ...series.flatMap((s) => s.data.map((p) => p.amps)));
  return (
    <figure className="print-block" aria-label="Primary current over the dwell window">
      <LineChart responsive style={{ width: '100%', height: 320 }} margin={{ top: 12, right: 16, bottom: 8, left: 4 }}>
        <CartesianGrid stroke={CHART.grid} strokeDasharray="2 3" />
        <XAxis
          type="number"
          dataKey="tMs"
          domain={[0, Math.ceil(maxT)]}
          tickCount={8}
          allowDecimals
          stroke={CHART.axis}
          tickFormatter={(t: number) => formatMeasure(t, '', 1)}
          label={{ value: 'time since dwell start (ms)', position: 'insideBottom', offset: -4, fill: CHART.axis, fontSize: 12 }}
          height={40}
        />
        <YAxis
          type="number"
          dataKey="amps"
          domain={[0, Math.ceil(maxA + 0.5)]}
          stroke={CHART.axis}
          width={52}
          label={{ value: 'primary current (A)', angle: -90, position: 'insideLeft', offset: 12, fill: CHART.axis, fontSize: 12 }}
        />
        <Tooltip
          formatter={(value) => (typeof value === 'number' ? formatMeasure(value, 'A') : String(value))}
          labelFormatter={(t) => (typeof t === 'number' ? formatMeasure(t, 'ms') : String(t))}
        />
        <Legend verticalAlign="top" height={44} itemSorter={null} wrapperStyle={{ fontSize: 13 }} />
        {driverLimitA != null && (
          <ReferenceLine
            y={driverLimitA}
            stroke={CHART.limit}
            strokeWidth={1.5}
            strokeDasharray="8 3"
            label={{
              value: `driver limit ${formatMeasure(driverLimitA, 'A')}`,
              position: 'insideTopRight',
              fill: CHART.limit,
              fontSize: 12,
            }}
          />
        )}
        {dwellMs !== undefined && (
          <ReferenceLine
            x={dwellMs}
            stroke={CHART.charging}
            strokeOpacity={0.5}
            label={{ value: `dwell ${formatMeasure(dwellMs, 'ms')}`, position: 'insideBottomLeft', fill: CHART.charging, fontSize: 12 }}
          />
        )}
        {crankingDwellMs !== undefined && (
          <ReferenceLine
            x={crankingDwellMs}
            stroke={CHART.cranking}
            strokeOpacity={0.5}
            label={{
              value: `cranking dwell ${formatMeasure(crankingDwellMs, 'ms')}`,
              position: 'insideLeft',
              fill: CHART.cranking,
              fontSize: 12,
            }}
          />
        )}
        {series.map((s) => (
          <Line
            key={s.key}
            data={s.data}
            dataKey="amps"
            name={s.name}
            type="monotone"
            stroke={s.stroke}
            strokeWidth={s.dashed ? 2 : 2.5}
            strokeDasharray={s.dashed ? ORIGINAL_DASH : undefined}
            dot={false}
            legendType="plainline"
            isAnimationActive={false}
          />
        ))}
      </LineChart>
      <figcaption className="mt-1 text-xs text-ink-faint">
        Solid: substitute. Dashed: original. Charging voltage with running dwell, cranking voltage with cranking dwell.
      </figcaption>
    </figure>
  );
}
