// Looks up a user's role in an organisation. Everything an API caller may see hangs off this one question.
import type { DataSource } from 'typeorm';
import type { Role } from '../../shared/api/roles';
import { MembershipEntity } from '../db/entities';

export async function roleIn(ds: DataSource, organisationId: string, userId: string): Promise<Role | null> {
  const membership = await ds
    .getRepository(MembershipEntity)
    .findOne({ where: { organisationId, userId }, select: { role: true } });
  return membership?.role ?? null;
}

export async function membershipsOf(ds: DataSource, userId: string): Promise<MembershipEntity[]> {
  return ds.getRepository(MembershipEntity).find({
    where: { userId },
    relations: { organisation: true },
    order: { createdAt: 'ASC' },
  });
}
