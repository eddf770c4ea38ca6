// Reading and issuing invitations. A pending invitation is one neither accepted nor revoked; an expired one
// stays listed (as expired) until an owner resends or revokes it.
import type { DataSource, EntityManager } from 'typeorm';
import { INVITATION_LIFETIME_DAYS } from '../../shared/api/invitations';
import { hashLinkToken, newLinkToken } from '../auth/link-tokens';
import { invalidLink } from '../auth/one-time-tokens';
import { InvitationEntity } from '../db/entities';

export const INVITATION_LIFETIME_MS = INVITATION_LIFETIME_DAYS * 86_400_000;

export function pendingInvitations(ds: DataSource, organisationId: string): Promise<InvitationEntity[]> {
  return ds
    .getRepository(InvitationEntity)
    .createQueryBuilder('invitation')
    .leftJoinAndSelect('invitation.invitedBy', 'invitedBy')
    .where('invitation.organisation_id = :organisationId', { organisationId })
    .andWhere('invitation.accepted_at IS NULL AND invitation.revoked_at IS NULL')
    .orderBy('invitation.created_at', 'DESC')
    .getMany();
}

/** A new token and expiry for an invitation (new or resent); returns the token to mail. */
export async function freshInvitationToken(manager: EntityManager, invitationId: string): Promise<string> {
  const { token, hash } = newLinkToken();
  const now = Date.now();
  await manager
    .getRepository(InvitationEntity)
    .update(
      { id: invitationId },
      { tokenHash: hash, sentAt: new Date(now), expiresAt: new Date(now + INVITATION_LIFETIME_MS) },
    );
  return token;
}

/** A usable invitation by its link token; locked when `lock`, for the transaction that spends it. */
export async function usableInvitation(
  manager: EntityManager,
  token: string,
  lock: boolean,
): Promise<InvitationEntity> {
  const invitation = lock
    ? await manager
        .getRepository(InvitationEntity)
        .findOne({ where: { tokenHash: hashLinkToken(token) }, lock: { mode: 'pessimistic_write' } })
    : await manager
        .getRepository(InvitationEntity)
        .findOne({ where: { tokenHash: hashLinkToken(token) }, relations: { organisation: true, invitedBy: true } });
  if (!invitation || invitation.acceptedAt || invitation.revokedAt || invitation.expiresAt.getTime() <= Date.now())
    throw invalidLink();
  return invitation;
}
