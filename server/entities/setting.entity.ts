import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/** Admin-changeable settings, one JSON document per key, validated by the schemas in shared/. */
@Entity('setting')
export class SettingEntity {
  @PrimaryColumn({ type: 'text' })
  key: string;

  @Column({ type: 'jsonb' })
  value: unknown;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;
}
