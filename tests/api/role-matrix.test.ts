// Who may call what: every API route, called by an anonymous visitor, a member of another organisation,
// a viewer, an engineer and an owner, each with the status the role rules give. Ids of another
// organisation answer 404, never 403, so they reveal nothing.
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { matchesPattern, registeredRoutes } from '../../server/http/route-table';
import { appFor } from './fixtures/app';
import { useCleanDatabase } from './fixtures/database';
import { stackedLoop } from './fixtures/documents';
import { ACTORS, runBody, useOrganisation, type Actor, type Content, type People } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';
type Statuses = Record<Actor, number>;

const read: Statuses = { anonymous: 401, outsider: 404, viewer: 200, engineer: 200, owner: 200 };
const edit: Statuses = { anonymous: 401, outsider: 404, viewer: 403, engineer: 200, owner: 200 };
const create: Statuses = { anonymous: 401, outsider: 404, viewer: 403, engineer: 201, owner: 201 };
const manage: Statuses = { anonymous: 401, outsider: 404, viewer: 403, engineer: 403, owner: 200 };
const signedIn: Statuses = { anonymous: 401, outsider: 200, viewer: 200, engineer: 200, owner: 200 };
const anyone: Statuses = { anonymous: 200, outsider: 200, viewer: 200, engineer: 200, owner: 200 };

interface RouteCase {
  route: string;
  method: Method;
  path: (p: People, c: Content) => string;
  body?: (p: People, c: Content) => object;
  expected: Statuses;
  /** When the success answer is not JSON. */
  contentType?: RegExp;
}

const cases: RouteCase[] = [
  { route: 'me', method: 'get', path: () => apiRoutes.me, expected: signedIn },
  { route: 'session', method: 'get', path: () => apiRoutes.session, expected: anyone },
  { route: 'projects', method: 'get', path: () => apiRoutes.projects, expected: signedIn },
  {
    route: 'projects',
    method: 'post',
    path: () => apiRoutes.projects,
    body: (p) => ({ name: 'New line', organisationId: p.organisationId }),
    expected: create,
  },
  { route: 'project', method: 'get', path: (_, c) => apiRoutes.project(c.projectId), expected: read },
  {
    route: 'project',
    method: 'patch',
    path: (_, c) => apiRoutes.project(c.projectId),
    body: () => ({ name: 'Renamed' }),
    expected: edit,
  },
  { route: 'project', method: 'delete', path: (_, c) => apiRoutes.project(c.projectId), expected: edit },
  { route: 'projectScenarios', method: 'get', path: (_, c) => apiRoutes.projectScenarios(c.projectId), expected: read },
  {
    route: 'projectScenarios',
    method: 'post',
    path: (_, c) => apiRoutes.projectScenarios(c.projectId),
    body: () => ({ name: 'Copy', document: stackedLoop() }),
    expected: create,
  },
  { route: 'projectRuns', method: 'get', path: (_, c) => apiRoutes.projectRuns(c.projectId), expected: read },
  { route: 'scenario', method: 'get', path: (_, c) => apiRoutes.scenario(c.scenarioId), expected: read },
  {
    route: 'scenario',
    method: 'patch',
    path: (_, c) => apiRoutes.scenario(c.scenarioId),
    body: () => ({ description: 'Changed' }),
    expected: edit,
  },
  { route: 'scenario', method: 'delete', path: (_, c) => apiRoutes.scenario(c.scenarioId), expected: edit },
  {
    route: 'scenarioRevisions',
    method: 'get',
    path: (_, c) => apiRoutes.scenarioRevisions(c.scenarioId),
    expected: read,
  },
  {
    route: 'scenarioRevisions',
    method: 'post',
    path: (_, c) => apiRoutes.scenarioRevisions(c.scenarioId),
    body: () => ({ document: stackedLoop(), message: 'Faster lift' }),
    expected: create,
  },
  {
    route: 'scenarioRevision',
    method: 'get',
    path: (_, c) => apiRoutes.scenarioRevision(c.scenarioId, 1),
    expected: read,
  },
  { route: 'scenarioRuns', method: 'get', path: (_, c) => apiRoutes.scenarioRuns(c.scenarioId), expected: read },
  {
    route: 'scenarioRuns',
    method: 'post',
    path: (_, c) => apiRoutes.scenarioRuns(c.scenarioId),
    body: (_, c) => runBody(c.revisionId),
    expected: create,
  },
  { route: 'run', method: 'get', path: (_, c) => apiRoutes.run(c.runId), expected: read },
  {
    route: 'run',
    method: 'patch',
    path: (_, c) => apiRoutes.run(c.runId),
    body: () => ({ name: 'Renamed run' }),
    expected: edit,
  },
  { route: 'run', method: 'delete', path: (_, c) => apiRoutes.run(c.runId), expected: edit },
  { route: 'members', method: 'get', path: (p) => apiRoutes.members(p.organisationId), expected: read },
  {
    route: 'member',
    method: 'patch',
    path: (p) => apiRoutes.member(p.organisationId, p.viewer.id),
    body: () => ({ role: 'engineer' }),
    expected: manage,
  },
  { route: 'member', method: 'delete', path: (p) => apiRoutes.member(p.organisationId, p.viewer.id), expected: manage },
  // Leaving: the organisation's only owner may not, so an owner hears 409.
  {
    route: 'membership',
    method: 'delete',
    path: (p) => apiRoutes.membership(p.organisationId),
    expected: { ...read, owner: 409 },
  },
  { route: 'invitations', method: 'get', path: (p) => apiRoutes.invitations(p.organisationId), expected: manage },
  {
    route: 'invitations',
    method: 'post',
    path: (p) => apiRoutes.invitations(p.organisationId),
    body: () => ({ email: 'newcomer@example.test', role: 'viewer' }),
    expected: { ...manage, owner: 201 },
  },
  {
    route: 'invitation',
    method: 'delete',
    path: (p, c) => apiRoutes.invitation(p.organisationId, c.invitationId),
    expected: manage,
  },
  {
    route: 'invitationResend',
    method: 'post',
    path: (p, c) => apiRoutes.invitationResend(p.organisationId, c.invitationId),
    expected: manage,
  },
  { route: 'audit', method: 'get', path: (p) => apiRoutes.audit(p.organisationId), expected: manage },
  { route: 'priceList', method: 'get', path: (p) => apiRoutes.priceList(p.organisationId), expected: read },
  {
    route: 'priceList',
    method: 'put',
    path: (p) => apiRoutes.priceList(p.organisationId),
    body: () => ({
      currency: 'EUR',
      prices: {
        trackPerMetre: 1000,
        carrier: 2000,
        elevator: 30000,
        lateralTransfer: 20000,
        curve: 8000,
        automaticStation: 50000,
        manualStation: 10000,
      },
    }),
    expected: edit,
  },
  {
    route: 'auditCsv',
    method: 'get',
    path: (p) => apiRoutes.auditCsv(p.organisationId),
    expected: manage,
    contentType: /text\/csv/,
  },
  {
    route: 'shares',
    method: 'get',
    path: (_, c) => `${apiRoutes.shares}?kind=run&subjectId=${c.runId}`,
    expected: read,
  },
  {
    route: 'shares',
    method: 'post',
    path: () => apiRoutes.shares,
    body: (_, c) => ({ kind: 'run', subjectId: c.runId, expiresInDays: 3 }),
    expected: create,
  },
  { route: 'share', method: 'delete', path: (_, c) => apiRoutes.share(c.shareId), expected: edit },
];

const org = useOrganisation(db);

// Routes whose rule is tested elsewhere, each with where and why. Anything else registered on the router
// must have a row in `cases`, so a new route cannot ship without an authorisation rule.
const coveredElsewhere: Record<string, string> = {
  'POST /api/auth/sign-up': 'public: auth.test.ts',
  'POST /api/auth/sign-in': 'public: auth.test.ts and sign-in-limits.test.ts',
  'POST /api/auth/sign-out': 'public: auth.test.ts',
  'POST /api/scenarios/:id/time-studies': 'multipart body: every actor in time-studies.test.ts',
  'GET /api/scenarios/:id/time-studies': 'every actor in time-studies.test.ts',
  'GET /api/time-studies/:id': 'every actor in time-studies.test.ts',
  'DELETE /api/time-studies/:id': 'every actor in time-studies.test.ts',
  // Links opened from a mail or a share (tokens) and the account's own password and sessions answer anyone
  // by design; each is covered in its own file.
  'POST /api/auth/sign-up/confirm': 'token from a mail: team.test.ts',
  'POST /api/auth/password-reset/request': 'public, same answer for any address: team.test.ts',
  'POST /api/auth/password-reset': 'token from a mail: team.test.ts',
  'POST /api/account/password': 'the signed-in user’s own account: account.test.ts',
  'DELETE /api/account/other-sessions': 'the signed-in user’s own account: account.test.ts',
  'POST /api/invitations/preview': 'token from a mail: team.test.ts',
  'POST /api/invitations/accept': 'token from a mail: team.test.ts',
  'POST /api/shared/view': 'share token: sharing.test.ts',
  // A comparison needs two runs; the fixture's content has one.
  'POST /api/comparisons': 'every actor in comparison-sharing.test.ts',
  'GET /api/dev/mailbox': 'development mailbox, only with the fake SMTP server: mail tests',
  // Studies need a study and engine summaries to act on: every actor in studies.test.ts.
  'GET /api/projects/:id/studies': 'every actor in studies.test.ts',
  'POST /api/projects/:id/studies': 'every actor in studies.test.ts',
  'GET /api/studies/:id': 'every actor in studies.test.ts',
  'PATCH /api/studies/:id': 'every actor in studies.test.ts',
  'DELETE /api/studies/:id': 'every actor in studies.test.ts',
  'GET /api/studies/:id/points/:pointIndex/blocks': 'every actor in studies.test.ts',
  'POST /api/studies/:id/results': 'every actor in studies.test.ts',
  'GET /api/studies/:id/progress': 'every actor in server-studies.test.ts',
};

describe('role matrix', () => {
  it('has a rule for every route registered on the server’s router', () => {
    const urls = cases.map((c) => ({ method: c.method.toUpperCase(), url: c.path(org.people, org.content) }));
    const registered = registeredRoutes(appFor(db()));
    expect(registered.length).toBeGreaterThan(20);
    const missing = registered
      .map((r) => `${r.method} ${r.path}`)
      .filter((key) => !(key in coveredElsewhere))
      .filter((key) => {
        const [method, pattern] = key.split(' ');
        return !urls.some((u) => u.method === method && matchesPattern(pattern, u.url));
      });
    expect(missing, 'routes without a row in the role matrix').toEqual([]);
    // And the exceptions name only routes that exist.
    for (const key of Object.keys(coveredElsewhere))
      expect(registered.map((r) => `${r.method} ${r.path}`)).toContain(key);
  });

  const rows = cases.flatMap((c) => ACTORS.map((actor) => ({ ...c, actor, status: c.expected[actor] })));
  it.each(rows)(
    '$method $route as $actor answers $status',
    async ({ method, path, body, actor, status, contentType }) => {
      const agent = org.people.as(actor);
      const url = path(org.people, org.content);
      const call = agent[method](url);
      const res = body ? await call.send(body(org.people, org.content)) : await call;
      expect(res.status, `${method.toUpperCase()} ${url}: ${JSON.stringify(res.body).slice(0, 300)}`).toBe(status);
      expect(res.headers['content-type']).toMatch(status < 300 && contentType ? contentType : /application\/json/);
      if (status >= 400)
        expect(res.body.error.code).toBe(
          { 401: 'unauthenticated', 403: 'forbidden', 404: 'not_found', 409: 'conflict' }[status],
        );
    },
  );
});

describe('what the role rules imply beyond the table', () => {
  it('lists never show another organisation’s projects', async () => {
    const res = await org.people.outsider.agent.get(apiRoutes.projects);
    expect(res.status).toBe(200);
    expect(res.body.map((p: { id: string }) => p.id)).not.toContain(org.content.projectId);
    const own = await org.people.viewer.agent.get(apiRoutes.projects);
    expect(own.body.map((p: { id: string }) => p.id)).toContain(org.content.projectId);
  });

  it('an engineer who did not make a run may not rename or delete it', async () => {
    const other = await org.people.owner.agent
      .post(apiRoutes.scenarioRuns(org.content.scenarioId))
      .send(runBody(org.content.revisionId));
    expect(other.status).toBe(201);
    expect(
      (await org.people.engineer.agent.patch(apiRoutes.run(other.body.id)).send({ name: 'Mine now' })).status,
    ).toBe(403);
    expect((await org.people.engineer.agent.delete(apiRoutes.run(other.body.id))).status).toBe(403);
  });

  it('the last owner can be neither demoted nor removed', async () => {
    const demote = await org.people.owner.agent
      .patch(apiRoutes.member(org.people.organisationId, org.people.owner.id))
      .send({ role: 'engineer' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.code).toBe('conflict');
    const remove = await org.people.owner.agent.delete(
      apiRoutes.member(org.people.organisationId, org.people.owner.id),
    );
    expect(remove.status).toBe(409);
    await org.people.owner.agent
      .patch(apiRoutes.member(org.people.organisationId, org.people.engineer.id))
      .send({ role: 'owner' });
    const nowAllowed = await org.people.owner.agent
      .patch(apiRoutes.member(org.people.organisationId, org.people.owner.id))
      .send({ role: 'engineer' });
    expect(nowAllowed.status).toBe(200);
  });

  it('creating a project without an organisation picks the caller’s first one where they may edit', async () => {
    const res = await org.people.engineer.agent.post(apiRoutes.projects).send({ name: 'Default organisation' });
    expect(res.status).toBe(201);
    expect(res.body.organisationId).toBe(org.people.engineer.organisationId);
  });

  it('writes audit rows for changes, readable by owners', async () => {
    await org.people.engineer.agent.patch(apiRoutes.project(org.content.projectId)).send({ name: 'Audited' });
    const res = await org.people.owner.agent.get(apiRoutes.audit(org.people.organisationId)).query({ pageSize: 5 });
    expect(res.status).toBe(200);
    expect(res.body.entries).toHaveLength(5);
    expect(res.body.entries[0]).toMatchObject({
      action: 'update',
      entity: 'project',
      entityId: org.content.projectId,
      actor: { id: org.people.engineer.id },
      detail: { name: 'Audited' },
    });
    // The table above leaves hundreds of rows: read every page, oldest included.
    const actions: string[] = [];
    for (let page = 1; page <= 20; page++) {
      const body = (
        await org.people.owner.agent.get(apiRoutes.audit(org.people.organisationId)).query({ pageSize: 200, page })
      ).body as { entries: { action: string; entity: string }[] };
      actions.push(...body.entries.map((e) => `${e.action} ${e.entity}`));
      if (body.entries.length < 200) break;
    }
    expect(actions).toEqual(
      expect.arrayContaining([
        'create project',
        'create scenario',
        'run run',
        'member-add member',
        'invite invitation',
        'share share',
      ]),
    );
  });
});
