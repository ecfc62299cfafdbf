import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

@Entity('supplier')
export class SupplierEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text', unique: true })
  key: string;

  @Column({ type: 'text', unique: true })
  name: string;

  @Column({ type: 'text', name: 'contact_email', nullable: true })
  contactEmail: string | null;

  @Column({ type: 'text', nullable: true })
  phone: string | null;

  /** The column mapping the buyer confirmed last, offered again for the next file. */
  @Column({ type: 'jsonb', nullable: true })
  mapping: Record<string, string | null> | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;

  /** Archived: hidden from pickers and lists; its price lists stay in the history. */
  @Column({ type: 'timestamptz', name: 'archived_at', nullable: true })
  archivedAt: Date | null;
}
