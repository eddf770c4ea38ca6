// Audit rows are written inside the same transaction as the change they describe, so a row exists exactly
// when the change does.
import type { DataSource, EntityManager } from 'typeorm';
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

/** Runs `work` in a transaction and records the audit row it describes (from its result, if needed). */
export function audited<T>(
  ds: DataSource,
  work: (manager: EntityManager) => Promise<T>,
  entry: AuditInput | ((result: T) => AuditInput),
): Promise<T> {
  return ds.transaction(async (manager) => {
    const result = await work(manager);
    await recordAudit(manager, typeof entry === 'function' ? entry(result) : entry);
    return result;
  });
}
