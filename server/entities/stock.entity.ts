import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A part's count and bin at one store of the chain. */
@Entity('stock')
export class StockEntity {
  @PrimaryColumn({ type: 'uuid', name: 'location_id' })
  locationId: string;

  @PrimaryColumn({ type: 'uuid', name: 'part_id' })
  partId: string;

  @Column({ type: 'integer', name: 'on_hand', default: 0 })
  onHand: number;

  @Column({ type: 'text', default: '' })
  bin: string;
}
