import type { EntityManager } from 'typeorm';
import { AuditLogEntity } from '../entities';

export interface AuditEntry {
  actorId: string | null;
  action: string;
  entityType: string;
  entityId?: string | null;
  data?: Record<string, unknown>;
}

/** Writes an audit row inside the caller's transaction, so the change and its record commit together. */
export async function audit(manager: EntityManager, entry: AuditEntry): Promise<void> {
  await manager.insert(AuditLogEntity, {
    actorId: entry.actorId,
    action: entry.action,
    entityType: entry.entityType,
    entityId: entry.entityId ?? null,
    data: (entry.data ?? {}) as AuditLogEntity['data'] & object,
  });
}
