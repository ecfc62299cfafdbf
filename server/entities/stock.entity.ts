import { Column, Entity, PrimaryColumn } from 'typeorm';

@Entity('stock')
export class StockEntity {
  @PrimaryColumn({ type: 'uuid', name: 'part_id' })
  partId: string;

  @Column({ type: 'integer', name: 'on_hand', default: 0 })
  onHand: number;

  @Column({ type: 'text', default: '' })
  bin: string;
}
