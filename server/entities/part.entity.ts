import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { PartKind } from '../../shared/schemas/specs';
import { BrandEntity } from './brand.entity';

export type PartStatus = 'active' | 'discontinued';

@Entity('part')
export class PartEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid', name: 'brand_id' })
  brandId: string;

  @ManyToOne(() => BrandEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'brand_id' })
  brand?: BrandEntity;

  /** As printed; shown to people. */
  @Column({ type: 'text', name: 'part_number' })
  partNumber: string;

  /** Folded by normalizePartNumber on write; what searches compare. */
  @Column({ type: 'text', name: 'part_number_norm' })
  partNumberNorm: string;

  @Column({ type: 'text' })
  kind: PartKind;

  @Column({ type: 'text', default: '' })
  description: string;

  @Column({ type: 'text', nullable: true })
  gtin: string | null;

  @Column({ type: 'text', default: 'active' })
  status: PartStatus;

  @Column({ type: 'uuid', name: 'superseded_by_id', nullable: true })
  supersededById: string | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;
}
