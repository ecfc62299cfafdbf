import { ApiKeyEntity } from './api-key.entity';
import { AuditLogEntity } from './audit-log.entity';
import { BrandHeatCodeEntity } from './brand-heat-code.entity';
import { BrandEntity } from './brand.entity';
import { CoilSpecEntity } from './coil-spec.entity';
import { EngineEntity } from './engine.entity';
import { FitmentEntity } from './fitment.entity';
import { InterchangeEntity } from './interchange.entity';
import { InvitationEntity } from './invitation.entity';
import { PartEntity } from './part.entity';
import { PlugSpecEntity } from './plug-spec.entity';
import { PriceListFileChunkEntity } from './price-list-file-chunk.entity';
import { PriceListRowErrorEntity } from './price-list-row-error.entity';
import { PriceListRowEntity } from './price-list-row.entity';
import { PriceListEntity } from './price-list.entity';
import { SettingEntity } from './setting.entity';
import { ShopEntity } from './shop.entity';
import { StockEntity } from './stock.entity';
import { SupplierPriceEntity } from './supplier-price.entity';
import { SupplierEntity } from './supplier.entity';
import { UserEntity } from './user.entity';
import { VehicleEntity } from './vehicle.entity';

export {
  ApiKeyEntity,
  AuditLogEntity,
  BrandEntity,
  BrandHeatCodeEntity,
  CoilSpecEntity,
  EngineEntity,
  FitmentEntity,
  InterchangeEntity,
  InvitationEntity,
  PartEntity,
  PlugSpecEntity,
  SettingEntity,
  ShopEntity,
  StockEntity,
  SupplierEntity,
  SupplierPriceEntity,
  UserEntity,
  VehicleEntity,
};

export const ENTITIES = [
  ShopEntity,
  UserEntity,
  InvitationEntity,
  AuditLogEntity,
  SettingEntity,
  BrandEntity,
  BrandHeatCodeEntity,
  PartEntity,
  CoilSpecEntity,
  PlugSpecEntity,
  EngineEntity,
  VehicleEntity,
  FitmentEntity,
  InterchangeEntity,
  StockEntity,
  SupplierEntity,
  SupplierPriceEntity,
  ...[PriceListEntity, PriceListRowEntity, PriceListRowErrorEntity, PriceListFileChunkEntity],
  ApiKeyEntity,
];
