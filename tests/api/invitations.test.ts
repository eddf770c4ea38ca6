// Invitations by e-mail: single-use hashed links, nobody added before accepting, no hint whether an
// address has an account, and the owner's list with resend and revoke.
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { hashLinkToken } from '../../server/auth/link-tokens';
import { InvitationEntity, MembershipEntity } from '../../server/db/entities';
import { appFor, PASSWORD, signUp, uniqueEmail } from './fixtures/app';
import { useCleanDatabase } from './fixtures/database';
import { mailTo, tokenIn } from './fixtures/mail';
import { useOrganisation } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db, { contentPerTest: false });

async function invite(email: string, role = 'engineer') {
  const since = Date.now();
  const res = await org.people.owner.agent.post(apiRoutes.invitations(org.people.organisationId)).send({ email, role });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return { invitation: res.body, token: tokenIn(await mailTo(email, /^Join /, since)) };
}

const isMember = (userId: string) =>
  db().getRepository(MembershipEntity).existsBy({ organisationId: org.people.organisationId, userId });

describe('inviting', () => {
  it('answers an address with an account and one without in the same way, and mails both', async () => {
    const withAccount = await signUp(appFor(db()), 'known');
    const known = await org.people.owner.agent
      .post(apiRoutes.invitations(org.people.organisationId))
      .send({ email: withAccount.email, role: 'viewer' });
    const unknown = await org.people.owner.agent
      .post(apiRoutes.invitations(org.people.organisationId))
      .send({ email: uniqueEmail('stranger'), role: 'viewer' });
    expect(known.status).toBe(201);
    expect(unknown.status).toBe(201);
    expect(Object.keys(known.body).sort()).toEqual(Object.keys(unknown.body).sort());
    expect({ ...known.body, id: '', email: '', sentAt: '', expiresAt: '' }).toEqual({
      ...unknown.body,
      id: '',
      email: '',
      sentAt: '',
      expiresAt: '',
    });
    await mailTo(withAccount.email, /^Join /);
    await mailTo(unknown.body.email, /^Join /);
    // Nobody joins by being invited.
    expect(await isMember(withAccount.id)).toBe(false);
  });

  it('stores only the hash of the link token', async () => {
    const { invitation, token } = await invite(uniqueEmail('hashed'));
    const row = await db().getRepository(InvitationEntity).findOneByOrFail({ id: invitation.id });
    expect(row.tokenHash).toBe(hashLinkToken(token));
    expect(row.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    const dump = JSON.stringify(await db().query('SELECT * FROM invitations'));
    expect(dump).not.toContain(token);
  });

  it('refuses to invite a member again, or an address with an invitation waiting', async () => {
    const member = await org.people.owner.agent
      .post(apiRoutes.invitations(org.people.organisationId))
      .send({ email: org.people.viewer.email, role: 'viewer' });
    expect(member.status).toBe(409);
    expect(member.body.error.fields).toEqual([{ path: 'email', message: 'is already a member' }]);
    const { invitation } = await invite(uniqueEmail('twice'));
    const again = await org.people.owner.agent
      .post(apiRoutes.invitations(org.people.organisationId))
      .send({ email: invitation.email, role: 'viewer' });
    expect(again.status).toBe(409);
    expect(again.body.error.fields).toEqual([{ path: 'email', message: 'is already invited' }]);
  });
});

describe('accepting', () => {
  it('lets a new person choose a password and join with the invited role, once', async () => {
    const email = uniqueEmail('newcomer');
    const { token } = await invite(email, 'engineer');
    const app = appFor(db());
    const preview = await request(app).post(apiRoutes.invitationPreview).send({ token });
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ email, role: 'engineer', accountExists: false, invitedByName: 'Test owner' });

    const missing = await request(app).post(apiRoutes.invitationAccept).send({ token });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields).toEqual([
      { path: 'name', message: 'is required' },
      { path: 'password', message: 'is required' },
    ]);

    const agent = request.agent(app);
    const accepted = await agent
      .post(apiRoutes.invitationAccept)
      .send({ token, name: 'New Person', password: PASSWORD });
    expect(accepted.status).toBe(201);
    expect(accepted.body.organisationId).toBe(org.people.organisationId);
    expect(accepted.body.me.memberships).toEqual([
      { organisationId: org.people.organisationId, organisationName: 'owner works', role: 'engineer' },
    ]);
    expect((await agent.get(apiRoutes.me)).status).toBe(200);

    const again = await request(app)
      .post(apiRoutes.invitationAccept)
      .send({ token, name: 'Someone Else', password: PASSWORD });
    expect(again.status).toBe(400);
    expect(again.body.error.fields).toEqual([{ path: 'token', message: 'is no longer valid' }]);
    expect((await request(app).post(apiRoutes.invitationPreview).send({ token })).status).toBe(400);
  });

  it('asks an existing user to sign in first, refuses another signed-in person, and adds the invitee', async () => {
    const app = appFor(db());
    const invitee = await signUp(app, 'existing');
    const other = await signUp(app, 'other');
    const { token } = await invite(invitee.email, 'viewer');
    expect((await request(app).post(apiRoutes.invitationPreview).send({ token })).body.accountExists).toBe(true);

    const anonymous = await request(app)
      .post(apiRoutes.invitationAccept)
      .send({ token, name: 'Taken Over', password: 'another password 1' });
    expect(anonymous.status).toBe(400);
    expect(anonymous.body.error.fields).toEqual([{ path: 'token', message: 'needs you to sign in first' }]);

    const wrongPerson = await other.agent.post(apiRoutes.invitationAccept).send({ token });
    expect(wrongPerson.status).toBe(400);
    expect(wrongPerson.body.error.fields).toEqual([{ path: 'token', message: 'is for another address' }]);
    expect(await isMember(other.id)).toBe(false);

    const accepted = await invitee.agent.post(apiRoutes.invitationAccept).send({ token });
    expect(accepted.status).toBe(200);
    expect(await isMember(invitee.id)).toBe(true);
  });

  it('refuses an expired link, and a resent invitation carries a new link that replaces the old', async () => {
    const email = uniqueEmail('late');
    const { invitation, token } = await invite(email);
    await db()
      .getRepository(InvitationEntity)
      .update({ id: invitation.id }, { expiresAt: new Date(Date.now() - 1000) });
    expect((await request(appFor(db())).post(apiRoutes.invitationPreview).send({ token })).status).toBe(400);
    const listed = await org.people.owner.agent.get(apiRoutes.invitations(org.people.organisationId));
    expect(listed.body.find((i: { id: string }) => i.id === invitation.id).state).toBe('expired');

    const since = Date.now();
    const resent = await org.people.owner.agent.post(
      apiRoutes.invitationResend(org.people.organisationId, invitation.id),
    );
    expect(resent.status).toBe(200);
    expect(resent.body.state).toBe('pending');
    const fresh = tokenIn(await mailTo(email, /^Join /, since));
    expect(fresh).not.toBe(token);
    expect((await request(appFor(db())).post(apiRoutes.invitationPreview).send({ token })).status).toBe(400);
    expect((await request(appFor(db())).post(apiRoutes.invitationPreview).send({ token: fresh })).status).toBe(200);
  });

  it('a revoked invitation leaves the list and its link stops working', async () => {
    const { invitation, token } = await invite(uniqueEmail('revoked'));
    expect(
      (await org.people.owner.agent.delete(apiRoutes.invitation(org.people.organisationId, invitation.id))).status,
    ).toBe(200);
    const listed = await org.people.owner.agent.get(apiRoutes.invitations(org.people.organisationId));
    expect(listed.body.map((i: { id: string }) => i.id)).not.toContain(invitation.id);
    const accepted = await request(appFor(db()))
      .post(apiRoutes.invitationAccept)
      .send({ token, name: 'Too Late', password: PASSWORD });
    expect(accepted.status).toBe(400);
    expect(
      (await org.people.owner.agent.delete(apiRoutes.invitation(org.people.organisationId, invitation.id))).status,
    ).toBe(404);
  });

  it("another organisation's owner gets 404 for this organisation's invitation", async () => {
    const { invitation } = await invite(uniqueEmail('private'));
    const res = await org.people.outsider.agent.post(
      apiRoutes.invitationResend(org.people.outsider.organisationId, invitation.id),
    );
    expect(res.status).toBe(404);
    expect(
      (await org.people.outsider.agent.delete(apiRoutes.invitation(org.people.outsider.organisationId, invitation.id)))
        .status,
    ).toBe(404);
  });

  it('a malformed link token is refused with its field named', async () => {
    const res = await request(appFor(db())).post(apiRoutes.invitationAccept).send({ token: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[0].path).toBe('token');
  });
});

describe('members', () => {
  it('lists members with role and last sign-in', async () => {
    await request(appFor(db())).post(apiRoutes.signIn).send({ email: org.people.viewer.email, password: PASSWORD });
    const res = await org.people.owner.agent.get(apiRoutes.members(org.people.organisationId));
    expect(res.status).toBe(200);
    const viewer = res.body.find((m: { userId: string }) => m.userId === org.people.viewer.id);
    expect(viewer).toMatchObject({ role: 'viewer', email: org.people.viewer.email });
    expect(Date.now() - Date.parse(viewer.lastSignInAt)).toBeLessThan(60_000);
  });

  it('never removes, demotes or lets go the last owner', async () => {
    const { owner, organisationId } = org.people;
    const removed = await owner.agent.delete(apiRoutes.member(organisationId, owner.id));
    expect(removed.status).toBe(409);
    const demoted = await owner.agent.patch(apiRoutes.member(organisationId, owner.id)).send({ role: 'engineer' });
    expect(demoted.status).toBe(409);
    const left = await owner.agent.delete(apiRoutes.membership(organisationId));
    expect(left.status).toBe(409);
    expect(await isMember(owner.id)).toBe(true);
  });

  it('an owner may leave once another member is an owner; a viewer may leave', async () => {
    const { owner, engineer, viewer, organisationId } = org.people;
    expect((await viewer.agent.delete(apiRoutes.membership(organisationId))).status).toBe(200);
    expect(await isMember(viewer.id)).toBe(false);
    expect(
      (await owner.agent.patch(apiRoutes.member(organisationId, engineer.id)).send({ role: 'owner' })).status,
    ).toBe(200);
    expect((await owner.agent.delete(apiRoutes.membership(organisationId))).status).toBe(200);
    expect(await isMember(owner.id)).toBe(false);
    const audit = await engineer.agent.get(apiRoutes.audit(organisationId)).query({ action: 'member-leave' });
    expect(audit.body.entries.map((e: { actor: { id: string } }) => e.actor.id).sort()).toEqual(
      [owner.id, viewer.id].sort(),
    );
  });
});
