// The organisation's audit trail filtered on the server. Sign-ins (and failed ones) belong to no
// organisation; an organisation sees those of its current members.
import { Brackets, type DataSource, type SelectQueryBuilder } from 'typeorm';
import { endOf, startOf, type AuditFilter } from '../../shared/api/audit';
import { AuditEntryEntity } from '../db/entities';

export function auditQuery(
  ds: DataSource,
  organisationId: string,
  filter: AuditFilter,
): SelectQueryBuilder<AuditEntryEntity> {
  const query = ds
    .getRepository(AuditEntryEntity)
    .createQueryBuilder('entry')
    .leftJoinAndSelect('entry.actor', 'actor')
    .where(
      new Brackets((inOrganisation) =>
        inOrganisation
          .where('entry.organisation_id = :organisationId')
          .orWhere(
            `entry.organisation_id IS NULL AND entry.entity = 'user' AND entry.entity_id IN (SELECT m.user_id::text FROM memberships m WHERE m.organisation_id = :organisationId)`,
          ),
      ),
      { organisationId },
    );
  // A person is the one who acted, or the account a sign-in (also a failed one) was about.
  if (filter.actorId)
    query.andWhere(`(entry.actor_id = :actorId OR (entry.entity = 'user' AND entry.entity_id = :actorText))`, {
      actorId: filter.actorId,
      actorText: filter.actorId,
    });
  if (filter.entity) query.andWhere('entry.entity = :entity', { entity: filter.entity });
  if (filter.action) query.andWhere('entry.action = :action', { action: filter.action });
  if (filter.from) query.andWhere('entry.created_at >= :from', { from: new Date(startOf(filter.from)) });
  if (filter.to) query.andWhere('entry.created_at < :to', { to: new Date(endOf(filter.to)) });
  return query.orderBy('entry.created_at', 'DESC').addOrderBy('entry.id', 'DESC');
}
