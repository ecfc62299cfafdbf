import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { PartKind } from '../../shared/schemas/specs';
import type { SupersessionState } from '../../shared/schemas/price-lists';

/**
 * A valid line of a price list, normalised, with its comparison against the catalog. Written by
 * COPY and set-based SQL only (see services/price-list); this entity documents the columns.
 */
@Entity('price_list_row')
export class PriceListRowEntity {
  @PrimaryColumn({ type: 'uuid', name: 'price_list_id' })
  priceListId: string;

  @PrimaryColumn({ type: 'integer' })
  line: number;

  @Column({ type: 'text' })
  brand: string;

  @Column({ type: 'text', name: 'brand_norm' })
  brandNorm: string;

  @Column({ type: 'uuid', name: 'brand_id', nullable: true })
  brandId: string | null;

  @Column({ type: 'text', name: 'part_number' })
  partNumber: string;

  @Column({ type: 'text', name: 'part_number_norm' })
  partNumberNorm: string;

  @Column({ type: 'text', nullable: true })
  description: string | null;

  @Column({ type: 'integer', name: 'cost_cents' })
  costCents: number;

  @Column({ type: 'integer', name: 'list_cents' })
  listCents: number;

  @Column({ type: 'integer', name: 'core_cents', nullable: true })
  coreCents: number | null;

  @Column({ type: 'integer', name: 'pack_qty', nullable: true })
  packQty: number | null;

  @Column({ type: 'text', nullable: true })
  gtin: string | null;

  @Column({ type: 'text', nullable: true })
  supersedes: string | null;

  @Column({ type: 'text', name: 'supersedes_norm', nullable: true })
  supersedesNorm: string | null;

  @Column({ type: 'text', nullable: true })
  kind: PartKind | null;

  /** A complete coil spec from the file, stored for a new part on commit. */
  @Column({ type: 'jsonb', nullable: true })
  coil: Record<string, unknown> | null;

  @Column({ type: 'jsonb', nullable: true })
  plug: Record<string, unknown> | null;

  /** The first line of a part the file has twice: rejected once the second was read. */
  @Column({ type: 'boolean', default: false })
  retracted: boolean;

  @Column({ type: 'text', nullable: true })
  change: 'new' | 'changed' | 'unchanged' | 'rejected' | null;

  @Column({ type: 'text', name: 'reject_field', nullable: true })
  rejectField: string | null;

  @Column({ type: 'text', name: 'reject_message', nullable: true })
  rejectMessage: string | null;

  @Column({ type: 'uuid', name: 'part_id', nullable: true })
  partId: string | null;

  @Column({ type: 'text', name: 'part_kind', nullable: true })
  partKind: PartKind | null;

  @Column({ type: 'integer', name: 'old_cost_cents', nullable: true })
  oldCostCents: number | null;

  @Column({ type: 'integer', name: 'old_list_cents', nullable: true })
  oldListCents: number | null;

  @Column({ type: 'integer', name: 'old_core_cents', nullable: true })
  oldCoreCents: number | null;

  @Column({ type: 'integer', name: 'old_pack_qty', nullable: true })
  oldPackQty: number | null;

  @Column({ type: 'double precision', name: 'cost_change_pct', nullable: true })
  costChangePct: number | null;

  @Column({ type: 'double precision', name: 'list_change_pct', nullable: true })
  listChangePct: number | null;

  @Column({ type: 'boolean', default: false })
  flagged: boolean;

  @Column({ type: 'uuid', name: 'supersedes_part_id', nullable: true })
  supersedesPartId: string | null;

  @Column({ type: 'text', nullable: true })
  supersession: SupersessionState | null;
}
