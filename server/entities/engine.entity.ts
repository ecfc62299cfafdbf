import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { EngineSpec } from '../../shared/schemas/specs';

const num = (name: string) => ({ type: 'double precision' as const, name });

@Entity('engine')
export class EngineEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text', unique: true })
  code: string;

  @Column({ type: 'text', default: '' })
  description: string;

  @Column(num('displacement_l'))
  displacementL: number;

  @Column({ type: 'smallint' })
  cylinders: number;

  @Column(num('compression_ratio'))
  compressionRatio: number;

  @Column({ type: 'text' })
  aspiration: EngineSpec['aspiration'];

  @Column(num('peak_boost_kpa'))
  peakBoostKpa: number;

  @Column(num('rod_ratio'))
  rodRatio: number;

  @Column(num('spec_gap_mm'))
  specGapMm: number;

  @Column(num('dwell_ms'))
  dwellMs: number;

  @Column(num('cranking_dwell_ms'))
  crankingDwellMs: number;

  @Column({ type: 'double precision', name: 'driver_current_limit_a', nullable: true })
  driverCurrentLimitA: number | null;

  @Column({ type: 'double precision', name: 'system_voltage', default: 12 })
  systemVoltage: number;
}
