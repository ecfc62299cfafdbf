import { Column, CreateDateColumn, Entity, OneToMany, PrimaryGeneratedColumn } from 'typeorm';
import { BrandHeatCodeEntity } from './brand-heat-code.entity';

/** An ignition brand: ours (the store's lines) or foreign (a number customers bring). */
@Entity('brand')
export class BrandEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text' })
  name: string;

  /** Lower-cased, for matching a supplier's "QUAYWELL" to "Quaywell". */
  @Column({ type: 'text', name: 'name_norm', unique: true })
  nameNorm: string;

  @Column({ type: 'boolean', default: false })
  ours: boolean;

  @Column({ type: 'text', name: 'heat_code_note', nullable: true })
  heatCodeNote: string | null;

  @OneToMany(() => BrandHeatCodeEntity, (h) => h.brand)
  heatCodes?: BrandHeatCodeEntity[];

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;
}
