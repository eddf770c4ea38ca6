// The demo organisation: seeded once with three roles, one project and two scenarios from the published
// examples; seeding again changes nothing, not even what users changed in the demo.
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { loadConfig } from '../../server/config';
import { DEMO_ACCOUNTS, DEMO_ORGANISATION_ID, DEMO_PASSWORD, seedDemo } from '../../server/db/seed/demo';
import { OrganisationEntity, ProjectEntity, ScenarioRevisionEntity, UserEntity } from '../../server/db/entities';
import { useCleanDatabase } from './fixtures/database';
import { appFor } from './fixtures/app';
import { mailTo, tokenIn } from './fixtures/mail';
import { sideBySideLoop, stackedLoop } from './fixtures/documents';

const db = useCleanDatabase();

async function snapshot() {
  const rows = await Promise.all(
    [
      'users',
      'organisations',
      'memberships',
      'projects',
      'scenarios',
      'scenario_revisions',
      'runs',
      'audit_entries',
    ].map(async (table) => {
      const data = await db().query(`SELECT * FROM ${table} ORDER BY 1`);
      return [table, data] as const;
    }),
  );
  return Object.fromEntries(rows);
}

describe('demo seed', () => {
  it('creates the three demo accounts with their roles and the project with two scenarios at revision 1', async () => {
    await seedDemo(db());
    const app = appFor(db());
    const roles: string[] = [];
    for (const account of DEMO_ACCOUNTS) {
      const agent = request.agent(app);
      const res = await agent.post(apiRoutes.signIn).send({ email: account.email, password: DEMO_PASSWORD });
      expect(res.status).toBe(200);
      roles.push(res.body.memberships[0].role);
    }
    expect(roles).toEqual(['owner', 'engineer', 'viewer']);

    const viewer = request.agent(app);
    await viewer.post(apiRoutes.signIn).send({ email: 'viewer@demo.lanewright.test', password: 'demo-password' });
    const projects = await viewer.get(apiRoutes.projects);
    expect(projects.body).toHaveLength(1);
    const scenarios = await viewer.get(apiRoutes.projectScenarios(projects.body[0].id));
    expect(scenarios.body).toHaveLength(2);
    expect(scenarios.body.map((s: { latestRevision: { number: number } }) => s.latestRevision.number)).toEqual([1, 1]);
    const names = await db()
      .getRepository(ScenarioRevisionEntity)
      .find({ select: { id: true, document: true } });
    expect(names.map((r) => r.document.name).sort()).toEqual([stackedLoop().name, sideBySideLoop().name].sort());
  });

  it('a second run changes nothing and keeps what users changed', async () => {
    await seedDemo(db());
    await db()
      .getRepository(ProjectEntity)
      .update({ organisationId: DEMO_ORGANISATION_ID }, { name: 'Renamed by a user' });
    const before = await snapshot();
    await seedDemo(db());
    expect(await snapshot()).toEqual(before);
  });

  it('is skipped when LANEWRIGHT_DEMO=off', async () => {
    await seedDemo(db(), loadConfig({ LANEWRIGHT_DEMO: 'off' }));
    expect(await db().getRepository(OrganisationEntity).count()).toBe(0);
    expect(await db().getRepository(UserEntity).count()).toBe(0);
  });

  it('refuses to take over an existing account that uses a demo e-mail', async () => {
    const app = appFor(db());
    const email = 'owner@demo.lanewright.test';
    const asked = await request(app)
      .post(apiRoutes.signUp)
      .send({ email, password: 'someone-else-1', name: 'Someone', organisationName: 'Elsewhere' });
    expect(asked.status).toBe(202);
    const token = tokenIn(await mailTo(email, /Finish creating/));
    const res = await request(app).post('/api/auth/sign-up/confirm').send({ token });
    expect(res.status).toBe(201);
    await expect(seedDemo(db())).rejects.toThrow(/already belong/);
    expect(await db().getRepository(OrganisationEntity).count()).toBe(1);
  });
});
