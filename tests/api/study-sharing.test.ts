// Share links to a study: a visitor without an account gets the study's points, figures and scenario
// and nothing that names its makers; a viewer may not share it, an engineer may; the link can be
// withdrawn; making and withdrawing it is audited; another organisation's study cannot be shared.
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { sharedViewSchema } from '../../shared/api/shares';
import { appFor, signUp } from './fixtures/app';
import { useCleanDatabase } from './fixtures/database';
import { expectMadeThenWithdrawn } from './fixtures/share-audit';
import { useOrganisation } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db);

async function createStudy(): Promise<string> {
  const res = await org.people.engineer.agent.post(apiRoutes.projectStudies(org.content.projectId)).send({
    name: 'Fleet size',
    kind: 'carrierSizing',
    revisionId: org.content.revisionId,
    settings: { hours: 0.1, warmupMinutes: 1, replications: 2, seed: 7 },
    blockSize: 2,
    points: [12, 16].map((n) => ({
      label: `${n} carriers`,
      changes: [{ path: 'carriers.count', op: 'set', value: n }],
    })),
  });
  expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(201);
  return res.body.id;
}

const view = (token: string) => request(appFor(db())).post(apiRoutes.sharedView).send({ token });

describe('sharing a study', () => {
  it('shows the study read-only to a visitor without an account, without its makers', async () => {
    const studyId = await createStudy();
    const made = await org.people.engineer.agent
      .post(apiRoutes.shares)
      .send({ kind: 'study', subjectId: studyId, expiresInDays: 7 });
    expect(made.status, JSON.stringify(made.body)).toBe(201);
    const token = new URL(made.body.url).hash.slice(1);

    const res = await view(token);
    expect(res.status).toBe(200);
    const shared = sharedViewSchema.parse(res.body);
    if (shared.kind !== 'study') throw new Error(`expected a study, got ${shared.kind}`);
    expect(shared.study.id).toBe(studyId);
    expect(shared.study.points.map((p) => p.label)).toEqual(['12 carriers', '16 carriers']);
    expect(shared.study.createdBy).toBeNull();
    expect(shared.document.name).toBeTruthy();
    expect(JSON.stringify(res.body)).not.toContain(org.people.engineer.email);
    expect(res.headers['set-cookie']).toBeUndefined();

    const listed = await org.people.viewer.agent.get(apiRoutes.shares).query({ kind: 'study', subjectId: studyId });
    expect(listed.status).toBe(200);
    expect(listed.body.map((s: { id: string }) => s.id)).toEqual([made.body.id]);
  });

  it('a viewer may not share a study; an outsider gets 404 as for any unknown study', async () => {
    const studyId = await createStudy();
    const body = { kind: 'study', subjectId: studyId, expiresInDays: 7 };
    expect((await org.people.viewer.agent.post(apiRoutes.shares).send(body)).status).toBe(403);
    expect((await org.people.outsider.agent.post(apiRoutes.shares).send(body)).status).toBe(404);
    const stranger = await signUp(appFor(db()), 'stranger');
    expect((await stranger.agent.post(apiRoutes.shares).send(body)).status).toBe(404);
  });

  it('a withdrawn link and a link to a deleted study answer the same 404; both steps are audited', async () => {
    const studyId = await createStudy();
    const first = await org.people.engineer.agent.post(apiRoutes.shares).send({ kind: 'study', subjectId: studyId });
    const second = await org.people.engineer.agent.post(apiRoutes.shares).send({ kind: 'study', subjectId: studyId });
    expect((await org.people.owner.agent.delete(apiRoutes.share(first.body.id))).status).toBe(200);
    const withdrawn = await view(new URL(first.body.url).hash.slice(1));
    expect(withdrawn.status).toBe(404);
    expect((await view(new URL(second.body.url).hash.slice(1))).status).toBe(200);
    expect((await org.people.engineer.agent.delete(apiRoutes.study(studyId))).status).toBe(200);
    const gone = await view(new URL(second.body.url).hash.slice(1));
    expect(gone.status).toBe(404);
    expect(gone.body).toEqual(withdrawn.body);

    await expectMadeThenWithdrawn(org.people, first.body.id, { kind: 'study', subjectId: studyId });
  });
});
