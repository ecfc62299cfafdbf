import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { CoilSpec } from '../../shared/schemas/specs';

const num = (name: string) => ({ type: 'double precision' as const, name });
const numOrNull = (name: string) => ({ type: 'double precision' as const, name, nullable: true });

/** A coil's spec, in the trade units of shared/schemas/specs.ts. */
@Entity('coil_spec')
export class CoilSpecEntity {
  @PrimaryColumn({ type: 'uuid', name: 'part_id' })
  partId: string;

  @Column({ type: 'text' })
  architecture: CoilSpec['architecture'];

  @Column({ type: 'text' })
  driver: CoilSpec['driver'];

  @Column({ type: 'smallint' })
  outputs: number;

  @Column({ type: 'smallint', name: 'connector_pins' })
  connectorPins: number;

  @Column({ type: 'text', name: 'connector_key' })
  connectorKey: string;

  @Column(num('primary_ohm_min'))
  primaryOhmMin: number;

  @Column(num('primary_ohm_max'))
  primaryOhmMax: number;

  @Column(num('primary_inductance_mh'))
  primaryInductanceMh: number;

  @Column(numOrNull('secondary_kohm_min'))
  secondaryKohmMin: number | null;

  @Column(numOrNull('secondary_kohm_max'))
  secondaryKohmMax: number | null;

  @Column(num('turns_ratio'))
  turnsRatio: number;

  @Column(numOrNull('available_kv'))
  availableKv: number | null;

  @Column(num('peak_current_a'))
  peakCurrentA: number;
}
