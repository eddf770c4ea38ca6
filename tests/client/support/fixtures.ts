// Answers shaped like the API's, built from the shared schemas' types so a
// contract change breaks these fixtures at compile time.
import type { Me } from '../../../shared/api/auth';
import type { Project } from '../../../shared/api/projects';
import type { Role } from '../../../shared/api/roles';
import type { RevisionSummary, ScenarioDetail, ScenarioSummary } from '../../../shared/api/scenarios';
import { scenarioSchema } from '../../../shared/scenario/scenario';
import stackedLoop from '../../../shared/examples/stacked-loop.json';

export const uuid = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;

export const ORG_ID = uuid(1);
export const USER = { id: uuid(2), name: 'Ada Fieldhouse', email: 'ada@example.test' };
const WHEN = '2026-11-30T09:15:00.000Z';

export function me(role: Role = 'engineer'): Me {
  return { user: USER, memberships: [{ organisationId: ORG_ID, organisationName: 'Northgate Fixtures', role }] };
}

/** The session check's answer: who is signed in, or nobody (`null`, still a 200). */
export function session(who: Me | null) {
  return { status: 200, body: { me: who } };
}

export function project(overrides: Partial<Project> = {}): Project {
  return {
    id: uuid(10),
    organisationId: ORG_ID,
    name: 'Cartridge line 2',
    description: 'Second valve-cartridge line for the new plant hall.',
    scenarioCount: 0,
    createdBy: USER,
    createdAt: WHEN,
    updatedAt: WHEN,
    ...overrides,
  };
}

export function revision(number: number, overrides: Partial<RevisionSummary> = {}): RevisionSummary {
  return {
    id: uuid(100 + number),
    scenarioId: uuid(20),
    number,
    message: number === 1 ? 'Started from the stacked example' : `Change ${number}`,
    conveyorMode: 'carriers',
    createdBy: USER,
    createdAt: WHEN,
    ...overrides,
  };
}

export function scenarioSummary(overrides: Partial<ScenarioSummary> = {}): ScenarioSummary {
  return {
    id: uuid(20),
    projectId: uuid(10),
    name: 'Stacked, 20 carriers',
    description: 'Work on top, return below.',
    latestRevision: revision(2),
    runCount: 0,
    createdBy: USER,
    createdAt: WHEN,
    updatedAt: WHEN,
    ...overrides,
  };
}

export function scenarioDetail(overrides: Partial<ScenarioSummary> = {}): ScenarioDetail {
  return { ...scenarioSummary(overrides), document: scenarioSchema.parse(stackedLoop) };
}
