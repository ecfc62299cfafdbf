import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** The part an engine is built with, per position, and how many it takes. */
@Entity('fitment')
export class FitmentEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid', name: 'part_id' })
  partId: string;

  @Column({ type: 'uuid', name: 'engine_id' })
  engineId: string;

  @Column({ type: 'text' })
  position: string;

  @Column({ type: 'smallint' })
  quantity: number;
}
