// Read-only share links: hashed unguessable tokens, expiry, withdrawal, the list with who made each link,
// and a shared view that holds the run and nothing else.
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { SHARE_MAX_DAYS } from '../../shared/api/shares';
import { hashLinkToken, newLinkToken } from '../../server/auth/link-tokens';
import { ShareLinkEntity } from '../../server/db/entities';
import { appFor } from './fixtures/app';
import { useCleanDatabase } from './fixtures/database';
import { useOrganisation } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db);

async function share(expiresInDays = 7) {
  const res = await org.people.engineer.agent
    .post(apiRoutes.shares)
    .send({ kind: 'run', subjectId: org.content.runId, expiresInDays });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return { share: res.body, token: new URL(res.body.url).hash.slice(1) };
}

const view = (token: string) => request(appFor(db())).post(apiRoutes.sharedView).send({ token });

describe('share links', () => {
  it('opens the run without an account, showing only the run and saying nothing of its makers', async () => {
    const { share: made, token } = await share();
    expect(made.url).toMatch(/\/shared#[A-Za-z0-9_-]{43}$/);
    const res = await view(token);
    expect(res.status).toBe(200);
    expect(Object.keys(res.body).sort()).toEqual(['expiresAt', 'kind', 'organisationName', 'run']);
    expect(res.body.kind).toBe('run');
    expect(res.body.run.id).toBe(org.content.runId);
    expect(res.body.run.results.throughputPerHour.mean).toBeGreaterThan(0);
    expect(res.body.run.createdBy).toBeNull();
    expect(JSON.stringify(res.body)).not.toContain(org.people.engineer.email);
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('stores only the token hash, and the link list says who made each link but never the token', async () => {
    const { share: made, token } = await share();
    const row = await db().getRepository(ShareLinkEntity).findOneByOrFail({ id: made.id });
    expect(row.tokenHash).toBe(hashLinkToken(token));
    expect(JSON.stringify(await db().query('SELECT * FROM share_links'))).not.toContain(token);
    const listed = await org.people.viewer.agent
      .get(apiRoutes.shares)
      .query({ kind: 'run', subjectId: org.content.runId });
    expect(listed.status).toBe(200);
    const entry = listed.body.find((s: { id: string }) => s.id === made.id);
    expect(entry).toMatchObject({ state: 'active', createdBy: { id: org.people.engineer.id } });
    expect(JSON.stringify(listed.body)).not.toContain(token);
    expect(entry.url).toBeUndefined();
  });

  it('a withdrawn, expired or unknown link, or one to a deleted run, all answer the same 404', async () => {
    const withdrawn = await share();
    expect((await org.people.owner.agent.delete(apiRoutes.share(withdrawn.share.id))).status).toBe(200);
    const expired = await share();
    await db()
      .getRepository(ShareLinkEntity)
      .update({ id: expired.share.id }, { expiresAt: new Date(Date.now() - 1) });
    const orphan = await share();
    const answers = [await view(withdrawn.token), await view(expired.token), await view(newLinkToken().token)];
    expect((await org.people.engineer.agent.delete(apiRoutes.run(org.content.runId))).status).toBe(200);
    answers.push(await view(orphan.token));
    for (const res of answers) {
      expect(res.status).toBe(404);
      expect(res.body).toEqual(answers[0].body);
    }
    const listed = await org.people.owner.agent
      .get(apiRoutes.shares)
      .query({ kind: 'run', subjectId: withdrawn.share.subjectId });
    expect(listed.status).toBe(404);
  });

  it('records when a link was last opened, and lists withdrawn links as such', async () => {
    const { share: made, token } = await share();
    await view(token);
    await org.people.engineer.agent.delete(apiRoutes.share(made.id));
    const listed = await org.people.engineer.agent
      .get(apiRoutes.shares)
      .query({ kind: 'run', subjectId: org.content.runId });
    const entry = listed.body.find((s: { id: string }) => s.id === made.id);
    expect(entry.state).toBe('revoked');
    expect(entry.lastOpenedAt).not.toBeNull();
  });

  it(`accepts 1 to ${SHARE_MAX_DAYS} days and names the field outside them`, async () => {
    await share(1);
    await share(SHARE_MAX_DAYS);
    for (const days of [0, SHARE_MAX_DAYS + 1, 2.5]) {
      const res = await org.people.engineer.agent
        .post(apiRoutes.shares)
        .send({ kind: 'run', subjectId: org.content.runId, expiresInDays: days });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.map((f: { path: string }) => f.path)).toEqual(['expiresInDays']);
    }
    const kind = await org.people.engineer.agent
      .post(apiRoutes.shares)
      .send({ kind: 'project', subjectId: org.content.runId });
    expect(kind.body.error.fields.map((f: { path: string }) => f.path)).toEqual(['kind']);
  });

  it('the audit shows who shared and who withdrew', async () => {
    const { share: made } = await share();
    await org.people.owner.agent.delete(apiRoutes.share(made.id));
    const audit = await org.people.owner.agent
      .get(apiRoutes.audit(org.people.organisationId))
      .query({ entity: 'share' });
    const rows = audit.body.entries.filter((e: { entityId: string }) => e.entityId === made.id);
    expect(rows.map((e: { action: string; actor: { id: string } }) => [e.action, e.actor.id])).toEqual([
      ['share-revoke', org.people.owner.id],
      ['share', org.people.engineer.id],
    ]);
  });
});
