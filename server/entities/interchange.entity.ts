import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A foreign brand's number that someone says our part replaces; the verdict checks the claim. */
@Entity('interchange')
export class InterchangeEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text', name: 'foreign_brand' })
  foreignBrand: string;

  @Column({ type: 'text', name: 'foreign_number' })
  foreignNumber: string;

  @Column({ type: 'text', name: 'foreign_number_norm' })
  foreignNumberNorm: string;

  @Column({ type: 'uuid', name: 'part_id' })
  partId: string;

  @Column({ type: 'text', default: 'manual' })
  source: string;

  @Column({ type: 'real', default: 1 })
  confidence: number;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;
}
