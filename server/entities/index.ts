import { AuditLogEntity } from './audit-log.entity';
import { InvitationEntity } from './invitation.entity';
import { SettingEntity } from './setting.entity';
import { ShopEntity } from './shop.entity';
import { UserEntity } from './user.entity';

export { AuditLogEntity, InvitationEntity, SettingEntity, ShopEntity, UserEntity };

export const ENTITIES = [ShopEntity, UserEntity, InvitationEntity, AuditLogEntity, SettingEntity];
