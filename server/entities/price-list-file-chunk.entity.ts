import { Column, Entity, PrimaryColumn } from 'typeorm';

/** The uploaded bytes in pieces, kept while the list is staged so a new mapping can re-read them. */
@Entity('price_list_file_chunk')
export class PriceListFileChunkEntity {
  @PrimaryColumn({ type: 'uuid', name: 'price_list_id' })
  priceListId: string;

  @PrimaryColumn({ type: 'integer' })
  seq: number;

  @Column({ type: 'bytea' })
  data: Buffer;
}
