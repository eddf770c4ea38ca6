// Invitations and share links → their API shapes (shared/api/invitations.ts, shares.ts).
import type { Invitation } from '../../shared/api/invitations';
import type { Share } from '../../shared/api/shares';
import type { InvitationEntity, ShareLinkEntity } from '../db/entities';
import { iso, toUserRef } from './common';

/** Expects `invitedBy` loaded. */
export function toInvitation(invitation: InvitationEntity, now = Date.now()): Invitation {
  return {
    id: invitation.id,
    email: invitation.email,
    role: invitation.role,
    invitedBy: toUserRef(invitation.invitedBy),
    state: invitation.expiresAt.getTime() <= now ? 'expired' : 'pending',
    sentAt: iso(invitation.sentAt),
    expiresAt: iso(invitation.expiresAt),
  };
}

/** Expects `createdBy` loaded. */
export function toShare(share: ShareLinkEntity, now = Date.now()): Share {
  return {
    id: share.id,
    kind: share.kind,
    subjectId: share.subjectId,
    createdBy: toUserRef(share.createdBy),
    createdAt: iso(share.createdAt),
    expiresAt: iso(share.expiresAt),
    revokedAt: share.revokedAt ? iso(share.revokedAt) : null,
    lastOpenedAt: share.lastOpenedAt ? iso(share.lastOpenedAt) : null,
    state: share.revokedAt ? 'revoked' : share.expiresAt.getTime() <= now ? 'expired' : 'active',
  };
}
