import type { EntityManager } from 'typeorm';
import { AuditLogEntity } from '../entities';

export interface AuditEntry {
  actorId: string | null;
  action: string;
  entityType: string;
  entityId?: string | null;
  data?: Record<string, unknown>;
}

/** Writes an audit row through the caller's executor: inside its transaction, the change and its record commit together. */
export async function audit(ex: EntityManager, entry: AuditEntry): Promise<void> {
  await ex.insert(AuditLogEntity, {
    actorId: entry.actorId,
    action: entry.action,
    entityType: entry.entityType,
    entityId: entry.entityId ?? null,
    data: (entry.data ?? {}) as AuditLogEntity['data'] & object,
  });
}
