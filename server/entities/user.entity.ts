import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { Role } from '../../shared/roles';
import { ShopEntity } from './shop.entity';

@Entity('user')
export class UserEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Stored lower-cased; unique. */
  @Column({ type: 'text', unique: true })
  email: string;

  @Column({ type: 'text' })
  name: string;

  @Column({ type: 'text' })
  role: Role;

  /** Null until an invited user sets a password. */
  @Column({ type: 'text', name: 'password_hash', nullable: true })
  passwordHash: string | null;

  @Column({ type: 'boolean', default: false })
  disabled: boolean;

  @Column({ type: 'uuid', name: 'shop_id', nullable: true })
  shopId: string | null;

  @ManyToOne(() => ShopEntity, { nullable: true, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'shop_id' })
  shop?: ShopEntity | null;

  /** The store whose stock the user sees as "here"; null for a shop's technician. */
  @Column({ type: 'uuid', name: 'home_location_id', nullable: true })
  homeLocationId: string | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;
}
