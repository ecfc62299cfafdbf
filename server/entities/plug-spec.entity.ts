import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { PlugSpec } from '../../shared/schemas/specs';

const num = (name: string) => ({ type: 'double precision' as const, name });

/** A plug's spec; heatCode is the brand's own, mapped to a heat step through the brand's table. */
@Entity('plug_spec')
export class PlugSpecEntity {
  @PrimaryColumn({ type: 'uuid', name: 'part_id' })
  partId: string;

  @Column(num('thread_mm'))
  threadMm: number;

  @Column(num('thread_pitch_mm'))
  threadPitchMm: number;

  @Column(num('reach_mm'))
  reachMm: number;

  @Column({ type: 'text' })
  seat: PlugSpec['seat'];

  @Column(num('hex_mm'))
  hexMm: number;

  @Column({ type: 'text', name: 'heat_code' })
  heatCode: string;

  @Column(num('gap_mm'))
  gapMm: number;

  @Column({ type: 'boolean' })
  regappable: boolean;

  @Column({ type: 'boolean' })
  resistor: boolean;

  @Column({ type: 'double precision', name: 'resistor_kohm', nullable: true })
  resistorKohm: number | null;

  @Column({ type: 'boolean', name: 'projected_tip' })
  projectedTip: boolean;

  @Column({ type: 'text' })
  electrode: PlugSpec['electrode'];
}
