import type { CoilSpec, ResolvedPlugSpec } from '@shared/schemas/specs';
import { formatMeasure, formatRange } from '@shared/format';

const isCoil = (spec: CoilSpec | ResolvedPlugSpec): spec is CoilSpec => 'architecture' in spec;

/** A spec's figures in one dense list, so the person can see what is being compared. */
export function SpecSummary({ spec }: { spec: CoilSpec | ResolvedPlugSpec }) {
  const rows: [string, string][] = isCoil(spec)
    ? [
        ['Type', `${spec.architecture}, ${spec.outputs} output${spec.outputs === 1 ? '' : 's'}, ${spec.driver} driver`],
        ['Connector', `${spec.connectorPins} pins, key ${spec.connectorKey}`],
        ['Primary', `${formatRange(spec.primaryOhmMin, spec.primaryOhmMax, 'Ω')}, ${formatMeasure(spec.primaryInductanceMh, 'mH')}`],
        [
          'Secondary',
          spec.secondaryKohmMin != null && spec.secondaryKohmMax != null
            ? formatRange(spec.secondaryKohmMin, spec.secondaryKohmMax, 'kΩ')
            : 'not stated',
        ],
        ['Turns ratio', formatMeasure(spec.turnsRatio, ':1')],
        [
          'Rated',
          `${spec.availableKv != null ? formatMeasure(spec.availableKv, 'kV') : 'kV not stated'}, peak ${formatMeasure(spec.peakCurrentA, 'A')}`,
        ],
      ]
    : [
        ['Thread', `M${formatMeasure(spec.threadMm, '')} × ${formatMeasure(spec.threadPitchMm, 'mm')}, ${spec.seat} seat`],
        ['Reach, hex', `${formatMeasure(spec.reachMm, 'mm')}, ${formatMeasure(spec.hexMm, 'mm')} hex`],
        ['Heat', `${formatMeasure(spec.heatStep, 'heat step')}${spec.heatCode ? ` (code ${spec.heatCode})` : ''}`],
        ['Gap', `${formatMeasure(spec.gapMm, 'mm')}${spec.regappable ? ', regappable' : ', not regappable'}`],
        ['Resistor', spec.resistor ? (spec.resistorKohm != null ? formatMeasure(spec.resistorKohm, 'kΩ') : 'yes') : 'none'],
        ['Tip', `${spec.projectedTip ? 'projected' : 'not projected'}, ${spec.electrode}`],
      ];
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-ink-soft">{k}</dt>
          <dd className="tabular-nums text-ink">{v}</dd>
        </div>
      ))}
    </dl>
  );
}
