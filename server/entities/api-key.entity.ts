import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { ApiKeyScope } from '../../shared/schemas/api-keys';
import { UserEntity } from './user.entity';

/** A key another system of the store calls the API with. The key itself is never stored, only its SHA-256. */
@Entity('api_key')
export class ApiKeyEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text' })
  name: string;

  @Column({ type: 'text' })
  scope: ApiKeyScope;

  @Column({ type: 'text', name: 'key_hash', unique: true })
  keyHash: string;

  /** The key's first characters, shown in the list so an admin can tell keys apart. */
  @Column({ type: 'text' })
  prefix: string;

  @Column({ type: 'uuid', name: 'created_by' })
  createdBy: string;

  @ManyToOne(() => UserEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'created_by' })
  creator?: UserEntity;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;

  @Column({ type: 'timestamptz', name: 'last_used_at', nullable: true })
  lastUsedAt: Date | null;

  @Column({ type: 'timestamptz', name: 'revoked_at', nullable: true })
  revokedAt: Date | null;
}
