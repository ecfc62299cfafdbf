import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/** A supplier's current price for a part, in integer cents. */
@Entity('supplier_price')
export class SupplierPriceEntity {
  @PrimaryColumn({ type: 'uuid', name: 'supplier_id' })
  supplierId: string;

  @PrimaryColumn({ type: 'uuid', name: 'part_id' })
  partId: string;

  @Column({ type: 'integer', name: 'cost_cents' })
  costCents: number;

  @Column({ type: 'integer', name: 'list_cents' })
  listCents: number;

  @Column({ type: 'integer', name: 'core_cents', default: 0 })
  coreCents: number;

  @Column({ type: 'integer', name: 'pack_qty', default: 1 })
  packQty: number;

  @Column({ type: 'date', name: 'effective_date' })
  effectiveDate: string;

  @Column({ type: 'uuid', name: 'price_list_id', nullable: true })
  priceListId: string | null;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;
}
