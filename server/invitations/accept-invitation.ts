// Accepting an invitation: the signed-in invitee joins; a person without an account creates one with the
// name and password they chose; someone with an account who is not signed in is asked to sign in first.
import type { DataSource } from 'typeorm';
import type { AcceptInvitationInput } from '../../shared/api/invitations';
import { recordAudit } from '../audit/record-audit';
import { hashPassword } from '../auth/password';
import { refuseWeakPassword } from '../auth/password-policy';
import { InvitationEntity, MembershipEntity, UserEntity } from '../db/entities';
import { badRequest } from '../http/http-error';
import type { SignedInUser } from '../http/request-context';
import { usableInvitation } from './invitation-queries';

export interface Accepted {
  organisationId: string;
  user: SignedInUser;
  /** True when the account was made just now, so the caller signs the new person in. */
  isNew: boolean;
}

function missingAccountFields(input: AcceptInvitationInput) {
  return [
    ...(input.name ? [] : [{ path: 'name', message: 'is required' }]),
    ...(input.password ? [] : [{ path: 'password', message: 'is required' }]),
  ];
}

export async function acceptInvitation(
  ds: DataSource,
  input: AcceptInvitationInput,
  signedIn: SignedInUser | undefined,
): Promise<Accepted> {
  let passwordHash: string | undefined;
  if (!signedIn && input.password) {
    const invitation = await usableInvitation(ds.manager, input.token, false);
    // An invitee who already has an account is asked to sign in below; only a new account's password counts.
    if (!(await ds.getRepository(UserEntity).existsBy({ email: invitation.email })))
      refuseWeakPassword(input.password, { email: invitation.email, name: input.name });
    // Hashing is slow, so it happens before the transaction holds the invitation's row lock.
    passwordHash = await hashPassword(input.password);
  }
  return ds.transaction(async (manager) => {
    const invitation = await usableInvitation(manager, input.token, true);
    const users = manager.getRepository(UserEntity);
    const existing = await users.findOneBy({ email: invitation.email });
    let user: UserEntity;
    if (signedIn) {
      if (signedIn.email !== invitation.email) {
        throw badRequest(
          `This invitation is for ${invitation.email}, but you are signed in as ${signedIn.email}. Sign out and open the link again.`,
          [{ path: 'token', message: 'is for another address' }],
        );
      }
      user = existing!;
    } else if (existing) {
      throw badRequest(
        `An account already uses ${invitation.email}: sign in with it, then open the link again to accept.`,
        [{ path: 'token', message: 'needs you to sign in first' }],
      );
    } else {
      const missing = missingAccountFields(input);
      if (missing.length > 0 || !passwordHash)
        throw badRequest('Enter your name and choose a password to create your account.', missing);
      user = await users.save({ email: invitation.email, name: input.name!, passwordHash });
    }
    await manager.getRepository(InvitationEntity).update({ id: invitation.id }, { acceptedAt: new Date() });
    // Someone who joined meanwhile keeps the role they have; an invitation never demotes an owner.
    const memberships = manager.getRepository(MembershipEntity);
    if (!(await memberships.existsBy({ organisationId: invitation.organisationId, userId: user.id }))) {
      await memberships.insert({ organisationId: invitation.organisationId, userId: user.id, role: invitation.role });
    }
    await recordAudit(manager, {
      organisationId: invitation.organisationId,
      actorId: user.id,
      action: 'member-add',
      entity: 'member',
      entityId: user.id,
      detail: { email: user.email, role: invitation.role, invitationId: invitation.id },
    });
    return {
      organisationId: invitation.organisationId,
      user: { id: user.id, email: user.email, name: user.name },
      isNew: !signedIn,
    };
  });
}
