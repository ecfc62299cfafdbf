import type { PartSummary } from '../../shared/schemas/catalog';
import type { CoilSpec, ResolvedPlugSpec } from '../../shared/schemas/specs';
import type { CoilSpecEntity, PlugSpecEntity } from '../entities';

export interface PartRow {
  id: string;
  brand: string;
  ours: boolean;
  part_number: string;
  kind: 'coil' | 'plug';
  description: string;
  gtin: string | null;
  status: 'active' | 'discontinued';
  superseded_by_id: string | null;
  has_spec: boolean;
}

export function presentPart(r: PartRow): PartSummary {
  return {
    id: r.id,
    brand: r.brand,
    ours: r.ours,
    partNumber: r.part_number,
    kind: r.kind,
    description: r.description,
    gtin: r.gtin,
    status: r.status,
    supersededById: r.superseded_by_id,
    hasSpec: r.has_spec,
  };
}

export function presentCoilSpec(s: CoilSpecEntity): CoilSpec {
  return {
    architecture: s.architecture,
    driver: s.driver,
    outputs: s.outputs,
    connectorPins: s.connectorPins,
    connectorKey: s.connectorKey,
    primaryOhmMin: s.primaryOhmMin,
    primaryOhmMax: s.primaryOhmMax,
    primaryInductanceMh: s.primaryInductanceMh,
    secondaryKohmMin: s.secondaryKohmMin,
    secondaryKohmMax: s.secondaryKohmMax,
    turnsRatio: s.turnsRatio,
    availableKv: s.availableKv,
    peakCurrentA: s.peakCurrentA,
  };
}

/** A plug spec with the heat step its brand's table maps the heat code to. */
export function presentPlugSpec(s: PlugSpecEntity, heatStep: number): ResolvedPlugSpec {
  return {
    threadMm: s.threadMm,
    threadPitchMm: s.threadPitchMm,
    reachMm: s.reachMm,
    seat: s.seat,
    hexMm: s.hexMm,
    heatCode: s.heatCode,
    heatStep,
    gapMm: s.gapMm,
    regappable: s.regappable,
    resistor: s.resistor,
    resistorKohm: s.resistorKohm,
    projectedTip: s.projectedTip,
    electrode: s.electrode,
  };
}
