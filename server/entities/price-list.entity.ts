import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { Mapping } from '../../shared/price-list/mapping';
import type { PriceListApplied, PriceListCounts, PriceListProgress, PriceListStatus } from '../../shared/schemas/price-lists';

/** One uploaded supplier price list: staged for the preview, then committed or discarded. */
@Entity('price_list')
export class PriceListEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid', name: 'supplier_id' })
  supplierId: string;

  @Column({ type: 'text', name: 'file_name' })
  fileName: string;

  @Column({ type: 'text' })
  sha256: string;

  @Column({ type: 'bigint', name: 'size_bytes' })
  sizeBytes: string;

  @Column({ type: 'text', nullable: true })
  encoding: string | null;

  @Column({ type: 'text', nullable: true })
  delimiter: string | null;

  /** The file's headers in file order. */
  @Column({ type: 'jsonb', default: () => "'[]'::jsonb" })
  columns: string[];

  @Column({ type: 'jsonb', default: () => "'{}'::jsonb" })
  mapping: Mapping;

  @Column({ type: 'text', name: 'mapping_source', default: 'guessed' })
  mappingSource: 'given' | 'remembered' | 'guessed';

  @Column({ type: 'text', default: 'processing' })
  status: PriceListStatus;

  @Column({ type: 'boolean', default: false })
  stale: boolean;

  @Column({ type: 'integer', name: 'data_lines', nullable: true })
  dataLines: number | null;

  @Column({ type: 'jsonb', nullable: true })
  counts: PriceListCounts | null;

  @Column({ type: 'integer', default: 0 })
  flagged: number;

  @Column({ type: 'double precision', name: 'flag_threshold_pct', nullable: true })
  flagThresholdPct: number | null;

  @Column({ type: 'jsonb', default: () => "'{}'::jsonb" })
  progress: Partial<PriceListProgress>;

  @Column({ type: 'jsonb', nullable: true })
  applied: PriceListApplied | null;

  @Column({ type: 'uuid', name: 'created_by', nullable: true })
  createdBy: string | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;

  @Column({ type: 'uuid', name: 'committed_by', nullable: true })
  committedBy: string | null;

  @Column({ type: 'timestamptz', name: 'committed_at', nullable: true })
  committedAt: Date | null;

  @Column({ type: 'uuid', name: 'discarded_by', nullable: true })
  discardedBy: string | null;

  @Column({ type: 'timestamptz', name: 'discarded_at', nullable: true })
  discardedAt: Date | null;
}
