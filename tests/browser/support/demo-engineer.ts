// Setting up a browser test's data the way the app would: the demo engineer signed in over the API, and
// the demo's first scenario to work on.
import request from 'supertest';
import { ScenarioEntity } from '../../../server/db/entities';
import { DEMO_PASSWORD } from '../../../server/db/seed/demo';
import type { TestApp } from '../../support/browser';

export const DEMO_ENGINEER = 'engineer@demo.lanewright.test';

export async function demoEngineerAgent(app: TestApp) {
  const engineer = request.agent(app.url);
  await engineer.post('/api/auth/sign-in').send({ email: DEMO_ENGINEER, password: DEMO_PASSWORD }).expect(200);
  return engineer;
}

export function firstDemoScenario(app: TestApp): Promise<ScenarioEntity> {
  return app.dataSource.getRepository(ScenarioEntity).findOneOrFail({ where: {}, order: { createdAt: 'ASC' } });
}
