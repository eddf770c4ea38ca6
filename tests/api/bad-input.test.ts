// Bad requests on every route get a 400 (or 413/415) in the one error shape, with the field paths that
// are wrong; never a 500, and never a stack trace.
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { JSON_BODY_LIMIT_BYTES } from '../../server/http/limits';
import { useCleanDatabase } from './fixtures/database';
import { appFor, type Agent } from './fixtures/app';
import { stackedLoop } from './fixtures/documents';
import { useOrganisation } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db, { contentPerTest: false });
let consoleError: ReturnType<typeof vi.spyOn>;

beforeEach(() => {
  consoleError = vi.spyOn(console, 'error');
});

afterEach(() => {
  expect(consoleError, 'a request reached the unexpected-error path').not.toHaveBeenCalled();
  consoleError.mockRestore();
});

type Method = 'post' | 'patch';
interface BodyRoute {
  name: string;
  method: Method;
  path: () => string;
  anonymous?: boolean;
  /** Body with wrong types, and the field paths the answer must name. */
  wrong: () => object;
  wrongFields: string[];
  /** Field paths the answer to `{}` must name. */
  emptyFields: string[];
}

const withCarriers = (count: unknown) => ({
  ...stackedLoop(),
  carriers: { ...(stackedLoop().carriers as object), count },
});

const bodyRoutes: BodyRoute[] = [
  {
    name: 'sign-up',
    method: 'post',
    path: () => apiRoutes.signUp,
    anonymous: true,
    wrong: () => ({ email: 5, password: true, name: [], organisationName: {} }),
    wrongFields: ['email', 'password', 'name', 'organisationName'],
    emptyFields: ['email', 'password', 'name', 'organisationName'],
  },
  {
    name: 'sign-in',
    method: 'post',
    path: () => apiRoutes.signIn,
    anonymous: true,
    wrong: () => ({ email: 'no-at-sign', password: 3 }),
    wrongFields: ['email', 'password'],
    emptyFields: ['email', 'password'],
  },
  {
    name: 'create project',
    method: 'post',
    path: () => apiRoutes.projects,
    wrong: () => ({ name: 42, description: 7, organisationId: 'x' }),
    wrongFields: ['name', 'description', 'organisationId'],
    emptyFields: ['name'],
  },
  {
    name: 'update project',
    method: 'patch',
    path: () => apiRoutes.project(org.content.projectId),
    wrong: () => ({ name: '', description: 3 }),
    wrongFields: ['name', 'description'],
    emptyFields: [''],
  },
  {
    name: 'create scenario',
    method: 'post',
    path: () => apiRoutes.projectScenarios(org.content.projectId),
    wrong: () => ({ name: 'Ok', document: withCarriers(-3) }),
    wrongFields: ['document.carriers.count'],
    emptyFields: ['name', 'document'],
  },
  {
    name: 'update scenario',
    method: 'patch',
    path: () => apiRoutes.scenario(org.content.scenarioId),
    wrong: () => ({ name: ['x'] }),
    wrongFields: ['name'],
    emptyFields: [''],
  },
  {
    name: 'save revision',
    method: 'post',
    path: () => apiRoutes.scenarioRevisions(org.content.scenarioId),
    wrong: () => ({ document: { ...stackedLoop(), schemaVersion: 99 }, baseRevisionNumber: 'one' }),
    wrongFields: ['document.schemaVersion', 'baseRevisionNumber'],
    emptyFields: ['document'],
  },
  {
    name: 'save run',
    method: 'post',
    path: () => apiRoutes.scenarioRuns(org.content.scenarioId),
    wrong: () => ({ clientRunId: 'x', revisionId: 7, settings: { hours: -1 }, results: { engineVersion: 1 } }),
    wrongFields: ['clientRunId', 'revisionId', 'settings.hours', 'results.engineVersion'],
    emptyFields: ['clientRunId', 'revisionId', 'settings', 'results'],
  },
  {
    name: 'rename run',
    method: 'patch',
    path: () => apiRoutes.run(org.content.runId),
    wrong: () => ({ name: 12 }),
    wrongFields: ['name'],
    emptyFields: ['name'],
  },
  {
    name: 'invite member',
    method: 'post',
    path: () => apiRoutes.invitations(org.people.organisationId),
    wrong: () => ({ email: 'not-an-email', role: 'boss' }),
    wrongFields: ['email', 'role'],
    emptyFields: ['email', 'role'],
  },
  {
    name: 'change member',
    method: 'patch',
    path: () => apiRoutes.member(org.people.organisationId, org.people.viewer.id),
    wrong: () => ({ role: 'admin' }),
    wrongFields: ['role'],
    emptyFields: ['role'],
  },
];

function caller(route: { anonymous?: boolean }): Agent {
  return route.anonymous ? request.agent(appFor(db())) : org.people.owner.agent;
}

function expectError(res: request.Response, status: number, code: string) {
  expect(res.status, JSON.stringify(res.body)).toBe(status);
  expect(res.headers['content-type']).toMatch(/application\/json/);
  expect(Object.keys(res.body)).toEqual(['error']);
  expect(res.body.error.code).toBe(code);
  expect(res.body.error.message).not.toMatch(/\n\s+at /);
}

const paths = (res: request.Response) => res.body.error.fields.map((f: { path: string }) => f.path);

describe.each(bodyRoutes)('$name', (route) => {
  it('names every missing field', async () => {
    const res = await caller(route)[route.method](route.path()).send({});
    expectError(res, 400, 'bad_request');
    expect(paths(res)).toEqual(expect.arrayContaining(route.emptyFields));
    const absent = res.body.error.fields.filter(
      (f: { path: string }) => f.path !== '' && route.emptyFields.includes(f.path),
    );
    for (const field of absent) expect(field.message).toBe('is required');
  });

  it('names every field of the wrong type', async () => {
    const res = await caller(route)[route.method](route.path()).send(route.wrong());
    expectError(res, 400, 'bad_request');
    expect(paths(res)).toEqual(expect.arrayContaining(route.wrongFields));
    for (const field of res.body.error.fields) expect(field.message.length).toBeGreaterThan(0);
  });

  it('answers malformed JSON with 400 bad_request', async () => {
    const res = await caller(route)
      [route.method](route.path())
      .set('Content-Type', 'application/json')
      .send('{"name": "unterminated');
    expectError(res, 400, 'bad_request');
    expect(res.body.error.message).toMatch(/not valid JSON/);
  });

  it('answers a body over the limit with 413', async () => {
    const huge = JSON.stringify({ name: 'x'.repeat(JSON_BODY_LIMIT_BYTES) });
    const res = await caller(route)[route.method](route.path()).set('Content-Type', 'application/json').send(huge);
    expectError(res, 413, 'payload_too_large');
  });

  it('answers a body that is not JSON with 415', async () => {
    const res = await caller(route)[route.method](route.path()).set('Content-Type', 'text/plain').send('name=x');
    expectError(res, 415, 'unsupported_media_type');
  });

  it('answers a missing body with 400', async () => {
    const res = await caller(route)[route.method](route.path());
    expectError(res, 400, 'bad_request');
  });
});

describe('route parameters and query strings', () => {
  const notUuid = 'not-a-uuid';
  const idRoutes: Array<[string, 'get' | 'patch' | 'delete' | 'post', string]> = [
    ['project', 'get', apiRoutes.project(notUuid)],
    ['project', 'patch', apiRoutes.project(notUuid)],
    ['project', 'delete', apiRoutes.project(notUuid)],
    ['project scenarios', 'get', apiRoutes.projectScenarios(notUuid)],
    ['project scenarios', 'post', apiRoutes.projectScenarios(notUuid)],
    ['project runs', 'get', apiRoutes.projectRuns(notUuid)],
    ['scenario', 'get', apiRoutes.scenario(notUuid)],
    ['scenario', 'patch', apiRoutes.scenario(notUuid)],
    ['scenario', 'delete', apiRoutes.scenario(notUuid)],
    ['revisions', 'get', apiRoutes.scenarioRevisions(notUuid)],
    ['revisions', 'post', apiRoutes.scenarioRevisions(notUuid)],
    ['revision', 'get', apiRoutes.scenarioRevision(notUuid, 1)],
    ['scenario runs', 'get', apiRoutes.scenarioRuns(notUuid)],
    ['scenario runs', 'post', apiRoutes.scenarioRuns(notUuid)],
    ['run', 'get', apiRoutes.run(notUuid)],
    ['run', 'patch', apiRoutes.run(notUuid)],
    ['run', 'delete', apiRoutes.run(notUuid)],
    ['members', 'get', apiRoutes.members(notUuid)],
    ['invitations', 'post', apiRoutes.invitations(notUuid)],
    ['member', 'patch', apiRoutes.member(notUuid, notUuid)],
    ['member', 'delete', apiRoutes.member(notUuid, notUuid)],
    ['audit', 'get', apiRoutes.audit(notUuid)],
  ];

  it.each(idRoutes)('%s %s with a malformed id answers 400 naming "id"', async (_name, method, path) => {
    const res = await org.people.owner.agent[method](path).send({});
    expectError(res, 400, 'bad_request');
    expect(paths(res)).toEqual(['id']);
  });

  it('a malformed member user id answers 400 naming "userId"', async () => {
    const res = await org.people.owner.agent
      .patch(apiRoutes.member(org.people.organisationId, 'nobody'))
      .send({ role: 'viewer' });
    expectError(res, 400, 'bad_request');
    expect(paths(res)).toEqual(['userId']);
  });

  it.each([
    [
      'revision number that is not a number',
      () => `${apiRoutes.scenarioRevisions(org.content.scenarioId)}/latest`,
      ['number'],
    ],
    ['revision number zero', () => apiRoutes.scenarioRevision(org.content.scenarioId, 0), ['number']],
    ['project filter that is not an id', () => `${apiRoutes.projects}?organisationId=abc`, ['organisationId']],
    [
      'run filters that are not ids',
      () => `${apiRoutes.scenarioRuns(org.content.scenarioId)}?revisionId=abc&createdBy=def`,
      ['revisionId', 'createdBy'],
    ],
    [
      'project run filter that is not an id',
      () => `${apiRoutes.projectRuns(org.content.projectId)}?revisionId=1`,
      ['revisionId'],
    ],
    ['audit page size out of range', () => `${apiRoutes.audit(org.people.organisationId)}?pageSize=0`, ['pageSize']],
    ['audit date that is not a date', () => `${apiRoutes.audit(org.people.organisationId)}?from=yesterday`, ['from']],
  ] as const)('a %s answers 400 naming the field', async (_name, path, fields) => {
    const res = await org.people.owner.agent.get(path());
    expectError(res, 400, 'bad_request');
    expect(paths(res)).toEqual(fields);
  });

  it('unknown API routes answer 404 in the same shape', async () => {
    for (const [method, path] of [
      ['get', '/api/nothing-here'],
      ['post', `/api/projects/${org.content.projectId}/archive`],
      ['put', apiRoutes.project(org.content.projectId)],
      ['get', '/api'],
    ] as const) {
      const res = await org.people.owner.agent[method](path).send({});
      expectError(res, 404, 'not_found');
    }
  });
});
