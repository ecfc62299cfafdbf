import type { PartKind } from '@shared/schemas/specs';
import { formatMeasure, formatRange } from '@shared/format';
import type { PartDetail } from '@shared/schemas/parts';
import { specFieldsFor, specFigure, specLabel, type ShownSpec } from './spec-fields';

/** One line of "what changed" after a save: the field, what it was, what it is now. */
export interface Change {
  what: string;
  from: string;
  to: string;
}

const orNone = (s: string | null | undefined): string => (s === null || s === undefined || s === '' ? 'none' : s);

function specChanges(kind: PartKind, before: PartDetail['spec'], after: PartDetail['spec']): Change[] {
  if (!after) return before ? [{ what: 'Spec', from: 'on file', to: 'none' }] : [];
  if (!before) return [{ what: 'Spec', from: 'none', to: specSummary(after) }];
  const b = before as Record<string, unknown>;
  const a = after as Record<string, unknown>;
  const out: Change[] = [];
  for (const f of specFieldsFor(kind)) {
    if (b[f.name] !== a[f.name])
      out.push({ what: specLabel(f.name), from: specFigure(f.name, b[f.name]), to: specFigure(f.name, a[f.name]) });
  }
  // The heat step follows from the heat code through the brand's table: say where it landed.
  if ('heatStep' in a && b.heatStep !== a.heatStep)
    out.push({ what: 'Heat step', from: `step ${String(b.heatStep)}`, to: `step ${String(a.heatStep)}` });
  return out;
}

/** What a save changed, read from the part as it was and as the server now answers it. */
export function partChanges(before: PartDetail, after: PartDetail): Change[] {
  const out: Change[] = [];
  const p = before.part;
  const q = after.part;
  if (p.description !== q.description) out.push({ what: 'Description', from: orNone(p.description), to: orNone(q.description) });
  if (p.status !== q.status) out.push({ what: 'Status', from: p.status, to: q.status });
  if (p.gtin !== q.gtin) out.push({ what: 'GTIN', from: orNone(p.gtin), to: orNone(q.gtin) });
  const was = before.supersession.supersededBy;
  const now = after.supersession.supersededBy;
  if ((was?.id ?? null) !== (now?.id ?? null))
    out.push({ what: 'Superseded by', from: orNone(was?.partNumber), to: orNone(now?.partNumber) });
  out.push(...specChanges(q.kind, before.spec, after.spec));
  return out;
}

/** A whole spec in one line, for a part just added: every figure with its unit. */
export function specSummary(spec: ShownSpec): string {
  if ('architecture' in spec) {
    const secondary =
      spec.secondaryKohmMin != null && spec.secondaryKohmMax != null
        ? `, secondary ${formatRange(spec.secondaryKohmMin, spec.secondaryKohmMax, 'kΩ')}`
        : '';
    return [
      `${spec.architecture}, ${spec.driver} driver, ${spec.outputs} output${spec.outputs === 1 ? '' : 's'}`,
      `${spec.connectorPins}-pin key ${spec.connectorKey}`,
      `primary ${formatRange(spec.primaryOhmMin, spec.primaryOhmMax, 'Ω')}, ${formatMeasure(spec.primaryInductanceMh, 'mH')}${secondary}`,
      `${formatMeasure(spec.turnsRatio, ':1')}`,
      spec.availableKv != null ? formatMeasure(spec.availableKv, 'kV') : null,
      `peak ${formatMeasure(spec.peakCurrentA, 'A')}`,
    ]
      .filter((x) => x !== null)
      .join(' · ');
  }
  return [
    `M${formatMeasure(spec.threadMm, '')} × ${formatMeasure(spec.threadPitchMm, 'mm')}`,
    `${formatMeasure(spec.reachMm, 'mm')} reach, ${spec.seat} seat, ${formatMeasure(spec.hexMm, 'mm')} hex`,
    `heat code ${spec.heatCode ?? '—'} = step ${spec.heatStep}`,
    `gap ${formatMeasure(spec.gapMm, 'mm')}${spec.regappable ? '' : ', not to be re-gapped'}`,
    spec.resistor ? `resistor${spec.resistorKohm != null ? ` ${formatMeasure(spec.resistorKohm, 'kΩ')}` : ''}` : 'no resistor',
    `${spec.electrode}${spec.projectedTip ? ', projected tip' : ''}`,
  ].join(' · ');
}

/** What a new part was added with. */
export function createdChanges(created: PartDetail): Change[] {
  const p = created.part;
  const out: Change[] = [
    { what: 'Part', from: '—', to: `${p.brand} ${p.partNumber} (${p.kind})` },
    { what: 'Description', from: '—', to: orNone(p.description) },
  ];
  if (p.gtin) out.push({ what: 'GTIN', from: '—', to: p.gtin });
  if (created.spec) out.push({ what: 'Spec', from: '—', to: specSummary(created.spec) });
  else out.push({ what: 'Spec', from: '—', to: 'none (no verdict until one is added)' });
  return out;
}
