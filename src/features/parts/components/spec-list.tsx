import type { ReactNode } from 'react';
import { formatRange } from '@shared/format';
import { HEAT_STEP_MAX, isCoilSpec, type CoilSpec, type PartSpec, type ResolvedPlugSpec } from '@shared/schemas/specs';
import { formatSpecValue, specField, specLabel } from '@shared/spec-fields';

type Row = [term: string, value: ReactNode];

const NOT_GIVEN = <span className="text-ink-faint">not given</span>;

const label = (name: string): string => specLabel(name);
const quantity = (name: string): string => specField(name)?.quantity ?? specLabel(name);
const figure = (name: string, value: unknown): string => formatSpecValue(name, value);

function windowOf(min: number | null | undefined, max: number | null | undefined, name: string): ReactNode {
  if (min == null || max == null) return NOT_GIVEN;
  const f = specField(name);
  return formatRange(min, max, f?.unit ?? '', f?.decimals);
}

function coilRows(s: CoilSpec): Row[] {
  return [
    [label('architecture'), figure('architecture', s.architecture)],
    [label('driver'), figure('driver', s.driver)],
    [label('outputs'), s.outputs],
    ['Connector', `${s.connectorPins}-pin, key ${s.connectorKey}`],
    [quantity('primaryOhmMin'), windowOf(s.primaryOhmMin, s.primaryOhmMax, 'primaryOhmMin')],
    [label('primaryInductanceMh'), figure('primaryInductanceMh', s.primaryInductanceMh)],
    [quantity('secondaryKohmMin'), windowOf(s.secondaryKohmMin, s.secondaryKohmMax, 'secondaryKohmMin')],
    [label('turnsRatio'), figure('turnsRatio', s.turnsRatio)],
    [label('availableKv'), s.availableKv != null ? figure('availableKv', s.availableKv) : NOT_GIVEN],
    [label('peakCurrentA'), figure('peakCurrentA', s.peakCurrentA)],
  ];
}

function plugRows(s: ResolvedPlugSpec): Row[] {
  return [
    [label('threadMm'), `${figure('threadMm', s.threadMm)} × ${figure('threadPitchMm', s.threadPitchMm)} pitch`],
    [label('reachMm'), figure('reachMm', s.reachMm)],
    [label('seat'), s.seat],
    [label('hexMm'), figure('hexMm', s.hexMm)],
    [label('heatStep'), `${s.heatStep} of ${HEAT_STEP_MAX}${s.heatCode ? ` (brand code ${s.heatCode})` : ''}`],
    [label('gapMm'), `${figure('gapMm', s.gapMm)}${s.regappable ? ', can be re-gapped' : ', do not re-gap'}`],
    [label('resistor'), s.resistor ? `yes${s.resistorKohm != null ? `, ${figure('resistorKohm', s.resistorKohm)}` : ''}` : 'no'],
    [label('projectedTip'), figure('projectedTip', s.projectedTip)],
    [label('electrode'), s.electrode],
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
