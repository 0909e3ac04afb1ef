import type { EntityManager } from 'typeorm';
import { AuditEntry } from '../../db/entities/AuditEntry.js';

/** Record one write in the audit trail, inside the caller's transaction. */
export async function audit(
  em: EntityManager,
  userId: string | null,
  action: string,
  entity: string,
  entityId: string,
  changes?: unknown,
): Promise<void> {
  await em.insert(AuditEntry, { userId, action, entity, entityId, changes: (changes ?? null) as object });
}
