import type { ReactNode } from 'react';
import type { CoilSpec, ResolvedPlugSpec } from '@shared/schemas/specs';
import { isCoilSpec, type PartSpec } from '@shared/schemas/specs';
import { formatMeasure, formatNumber, formatRange, UNITS, yesNo } from '../format';

type Row = [term: string, value: ReactNode];

const NOT_GIVEN = <span className="text-ink-faint">not given</span>;
const DRIVER_WORDS = { integrated: 'integrated igniter', external: 'external driver' } as const;

function coilRows(s: CoilSpec): Row[] {
  return [
    ['Architecture', s.architecture],
    ['Driver', DRIVER_WORDS[s.driver]],
    ['Outputs', s.outputs],
    ['Connector', `${s.connectorPins}-pin, key ${s.connectorKey}`],
    ['Primary resistance', formatRange(s.primaryOhmMin, s.primaryOhmMax, UNITS.ohm)],
    ['Primary inductance', formatMeasure(s.primaryInductanceMh, UNITS.mh)],
    [
      'Secondary resistance',
      s.secondaryKohmMin != null && s.secondaryKohmMax != null
        ? formatRange(s.secondaryKohmMin, s.secondaryKohmMax, UNITS.kohm, 1)
        : NOT_GIVEN,
    ],
    ['Turns ratio', `${formatNumber(s.turnsRatio, 1)}:1`],
    ['Available voltage', s.availableKv != null ? formatMeasure(s.availableKv, UNITS.kv, 1) : NOT_GIVEN],
    ['Peak current', formatMeasure(s.peakCurrentA, UNITS.amp, 1)],
  ];
}

function plugRows(s: ResolvedPlugSpec): Row[] {
  return [
    ['Thread', `${formatMeasure(s.threadMm, UNITS.mm)} × ${formatMeasure(s.threadPitchMm, UNITS.mm)} pitch`],
    ['Reach', formatMeasure(s.reachMm, UNITS.mm)],
    ['Seat', s.seat],
    ['Hex', formatMeasure(s.hexMm, UNITS.mm)],
    ['Heat step', `${s.heatStep} of 15${s.heatCode ? ` (brand code ${s.heatCode})` : ''}`],
    ['Gap', `${formatMeasure(s.gapMm, UNITS.mm)}${s.regappable ? ', can be re-gapped' : ', do not re-gap'}`],
    ['Resistor', s.resistor ? `yes${s.resistorKohm != null ? `, ${formatMeasure(s.resistorKohm, UNITS.kohm, 1)}` : ''}` : 'no'],
    ['Projected tip', yesNo(s.projectedTip)],
    ['Electrode', s.electrode],
  ];
}

/** A part's spec as term and value, every figure with its unit. */
export function SpecList({ spec }: { spec: PartSpec }) {
  const rows = isCoilSpec(spec) ? coilRows(spec) : plugRows(spec);
  return (
    <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-[15px]">
      {rows.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="text-ink-soft">{term}</dt>
          <dd className="font-medium text-ink">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
