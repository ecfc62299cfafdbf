import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** One reason a line of a price list was rejected. */
@Entity('price_list_row_error')
export class PriceListRowErrorEntity {
  @PrimaryGeneratedColumn('increment', { type: 'bigint' })
  id: string;

  @Column({ type: 'uuid', name: 'price_list_id' })
  priceListId: string;

  @Column({ type: 'integer' })
  line: number;

  /** The header as printed in the file. */
  @Column({ type: 'text', nullable: true })
  column: string | null;

  @Column({ type: 'text', nullable: true })
  field: string | null;

  @Column({ type: 'text' })
  message: string;

  /** The line's cells as read, for the rejected-rows download (null when the row was staged). */
  @Column({ type: 'jsonb', nullable: true })
  raw: string[] | null;

  /** 'file': the line itself is wrong; 'catalog': it does not fit the catalog (unknown brand …). */
  @Column({ type: 'text', default: 'file' })
  source: 'file' | 'catalog';
}
