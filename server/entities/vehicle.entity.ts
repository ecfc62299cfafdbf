import { Column, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { EngineEntity } from './engine.entity';

@Entity('vehicle')
export class VehicleEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'smallint' })
  year: number;

  @Column({ type: 'text' })
  make: string;

  @Column({ type: 'text' })
  model: string;

  @Column({ type: 'text', default: '' })
  trim: string;

  @Column({ type: 'uuid', name: 'engine_id' })
  engineId: string;

  @ManyToOne(() => EngineEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'engine_id' })
  engine?: EngineEntity;
}
