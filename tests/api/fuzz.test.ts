// Malformed requests across every registered route (fast-check): odd ids, percent-encodings, numbers past
// every range, bodies of the wrong shape, text PostgreSQL cannot store, mislabelled encodings. None may
// answer 500; each answer is JSON in the one error shape or a success.
import fc from 'fast-check';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { apiErrorSchema } from '../../shared/api/errors';
import { registeredRoutes } from '../../server/http/route-table';
import { useCleanDatabase } from './fixtures/database';
import { stackedLoop } from './fixtures/documents';
import { appFor } from './fixtures/app';
import { runBody, useOrganisation } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db, { contentPerTest: false });
const RUNS = 1_200;

const oddSegment = fc.oneof(
  fc.uuid(),
  fc.string({ maxLength: 40 }).map(encodeURIComponent),
  fc.constantFrom(
    '%C0%AF',
    '%E0%A4%A',
    '%',
    '%00',
    '%ZZ',
    '..',
    '%2e%2e',
    '99999999999999999999',
    '2147483648',
    '-1',
    '0',
    '1e308',
    'NaN',
    '%F0%9F%98%80',
    'null',
    '%u0000',
    'a'.repeat(300),
  ),
);

const oddText = fc.oneof(
  fc.string({ maxLength: 30 }),
  fc.constantFrom('\u0000', 'a\u0000b', '\ud800', 'x\udc00y', '\u202e', '🙂'.repeat(50), 'x'.repeat(5000)),
);
const oddNumber = fc.oneof(
  fc.double(),
  fc.integer(),
  fc.constantFrom(2 ** 31, 2 ** 53, -(2 ** 63), 1e308, -1e308, Number.MIN_VALUE, 0.1),
);
const oddValue: fc.Arbitrary<unknown> = fc.oneof(
  oddText,
  oddNumber,
  fc.boolean(),
  fc.constant(null),
  fc.array(oddNumber, { maxLength: 5 }),
  fc.dictionary(fc.string({ maxLength: 8 }), oddText, { maxKeys: 3 }),
);

/** Bodies near the real shapes, with one part broken, and bodies of no particular shape. */
const oddBody = (context: { revisionId: string }) =>
  fc.oneof(
    fc.record(
      { name: oddValue, description: oddValue, organisationId: oddValue, clientId: oddValue },
      { requiredKeys: [] },
    ),
    fc
      .record(
        { name: oddText, document: fc.constant(stackedLoop()), clientId: oddValue },
        { requiredKeys: ['document'] },
      )
      .chain((b) =>
        fc
          .tuple(fc.constantFrom('name', 'carriers', 'steps', 'lanes', 'calendar', 'track', 'schemaVersion'), oddValue)
          .map(([key, value]) => ({ ...b, document: { ...b.document, [key]: value } })),
      ),
    fc
      .tuple(fc.constantFrom('clientRunId', 'revisionId', 'settings', 'results', 'name'), oddValue)
      .map(([key, value]) => ({ ...runBody(context.revisionId), [key]: value })),
    fc.record(
      { email: oddValue, password: oddValue, role: oddValue, baseRevisionNumber: oddNumber, message: oddText },
      { requiredKeys: [] },
    ),
    fc.anything({ maxDepth: 3 }),
    fc.constantFrom(
      '{"unterminated',
      '[]',
      'null',
      '"text"',
      '{"a":"\\ud800"}',
      '{"name":"\\u0000"}',
      '{"__proto__":{"x":1}}',
      '1e999',
    ),
  );

const oddHeaders = fc.record(
  {
    'Content-Type': fc.constantFrom(
      'application/json',
      'application/json; charset=latin1',
      'text/plain',
      'multipart/form-data; boundary=x',
      'application/x-www-form-urlencoded',
    ),
    'Content-Encoding': fc.constantFrom('gzip', 'deflate', 'br', 'identity', 'compress'),
  },
  { requiredKeys: [] },
);
/** Mostly plain JSON, so most requests get past the body parser to the routes' own checks. */
const headersArb = fc.oneof(
  { arbitrary: fc.constant({ 'Content-Type': 'application/json' }), weight: 6 },
  { arbitrary: oddHeaders, weight: 1 },
);

describe('fuzzing every route', () => {
  it(`${RUNS} malformed requests across all routes: none answers 500`, async () => {
    const app = appFor(db());
    const routes = registeredRoutes(app);
    const statuses = new Map<number, number>();
    const failures: string[] = [];
    await fc.assert(
      fc.asyncProperty(
        fc.constantFrom(...routes),
        fc.array(
          fc.oneof(
            oddSegment,
            fc.constantFrom(
              org.content.projectId,
              org.content.scenarioId,
              org.content.runId,
              org.people.organisationId,
              org.people.viewer.id,
            ),
          ),
          { minLength: 3, maxLength: 3 },
        ),
        fc.option(oddBody({ revisionId: org.content.revisionId }), { nil: undefined }),
        headersArb,
        fc.constantFrom('owner', 'anonymous', 'viewer') as fc.Arbitrary<'owner' | 'anonymous' | 'viewer'>,
        fc.dictionary(
          fc.constantFrom('limit', 'offset', 'sort', 'stationId', 'revisionId', 'createdBy', 'organisationId'),
          fc.oneof(oddSegment, oddText),
          { maxKeys: 3 },
        ),
        async (route, segments, body, headers, actor, query) => {
          let i = 0;
          const path = route.path.replace(/:[A-Za-z]+/g, () => segments[i++ % segments.length]);
          // Sign-in, sign-up and sign-out would replace or end the shared agents' sessions; they go out anonymously.
          const agent =
            actor === 'anonymous' || route.path.startsWith('/api/auth/') ? request(app) : org.people[actor].agent;
          let call = agent[route.method.toLowerCase() as 'get' | 'post' | 'patch' | 'delete'](path).query(query);
          for (const [name, value] of Object.entries(headers)) call = call.set(name, value);
          if (body !== undefined) call = call.send(typeof body === 'string' ? body : JSON.stringify(body));
          const res = await call;
          statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
          if (res.status >= 500) failures.push(`${route.method} ${path} → ${res.status}: ${res.text.slice(0, 200)}`);
          if (res.status >= 400)
            expect(
              apiErrorSchema.safeParse(res.body).success,
              `${route.method} ${path}: ${res.text.slice(0, 200)}`,
            ).toBe(true);
        },
      ),
      { numRuns: RUNS, seed: 20261202 },
    );
    expect(failures).toEqual([]);
    // Some requests must get through to the handlers, or the fuzzing tested only the front door.
    expect([...statuses.keys()].some((s) => s < 300)).toBe(true);
    console.log('fuzz statuses:', Object.fromEntries([...statuses].sort((a, b) => a[0] - b[0])));
  }, 600_000);
});
