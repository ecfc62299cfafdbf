import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { BrandEntity } from './brand.entity';

/** One row of a brand's heat table: its own code → the store's heat step (1 hottest … 15 coldest). */
@Entity('brand_heat_code')
export class BrandHeatCodeEntity {
  @PrimaryColumn({ type: 'uuid', name: 'brand_id' })
  brandId: string;

  @PrimaryColumn({ type: 'text' })
  code: string;

  @Column({ type: 'smallint', name: 'heat_step' })
  heatStep: number;

  @ManyToOne(() => BrandEntity, (b) => b.heatCodes, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'brand_id' })
  brand?: BrandEntity;
}
