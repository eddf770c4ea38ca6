// Members, audit entries and the signed-in user's own view (shared/api/members.ts, audit.ts, auth.ts).
import type { AuditEntry } from '../../shared/api/audit';
import type { Me } from '../../shared/api/auth';
import type { Member } from '../../shared/api/members';
import type { AuditEntryEntity, MembershipEntity } from '../db/entities';
import type { SignedInUser } from '../http/request-context';
import { iso, toUserRef } from './common';

/** Expects `user` loaded. */
export function toMember(membership: MembershipEntity): Member {
  return {
    userId: membership.userId,
    name: membership.user?.name ?? '',
    email: membership.user?.email ?? '',
    role: membership.role,
    joinedAt: iso(membership.createdAt),
    lastSignInAt: membership.user?.lastSignInAt ? iso(membership.user.lastSignInAt) : null,
  };
}

export function toAuditEntry(entry: AuditEntryEntity): AuditEntry {
  return {
    id: entry.id,
    organisationId: entry.organisationId,
    actor: toUserRef(entry.actor),
    action: entry.action,
    entity: entry.entity,
    entityId: entry.entityId,
    detail: entry.detail,
    createdAt: iso(entry.createdAt),
  };
}

/** Expects each membership's `organisation` loaded. */
export function toMe(user: SignedInUser, memberships: MembershipEntity[]): Me {
  return {
    user: { id: user.id, email: user.email, name: user.name },
    memberships: memberships.map((m) => ({
      organisationId: m.organisationId,
      organisationName: m.organisation?.name ?? '',
      role: m.role,
    })),
  };
}
