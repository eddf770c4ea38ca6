// Appends one audit row inside the caller's transaction, so the row exists exactly when the change does.
import type { EntityManager } from 'typeorm';
import type { AuditAction, AuditEntity } from '../../shared/api/audit';
import { AuditEntryEntity } from '../db/entities';

export interface AuditInput {
  organisationId: string | null;
  actorId: string | null;
  action: AuditAction;
  entity: AuditEntity;
  entityId: string;
  detail?: Record<string, unknown>;
}

export async function recordAudit(manager: EntityManager, input: AuditInput): Promise<void> {
  await manager.getRepository(AuditEntryEntity).save({ ...input, detail: input.detail ?? {} });
}
