// A scenario and its first revision are written together, so no scenario ever exists without content.
import type { EntityManager } from 'typeorm';
import type { Scenario } from '../../shared/scenario/scenario';
import { ScenarioEntity, ScenarioRevisionEntity } from '../db/entities';
import { touchProject } from '../projects/touch-project';

export interface NewScenario {
  projectId: string;
  name: string;
  description: string;
  document: Scenario;
  message: string;
  createdById: string | null;
  /** The client's idempotency key for this create, if it sent one. */
  clientId?: string | null;
}

export async function createScenarioWithFirstRevision(
  manager: EntityManager,
  input: NewScenario,
): Promise<ScenarioEntity> {
  const scenarios = manager.getRepository(ScenarioEntity);
  const scenario = await scenarios.save({
    projectId: input.projectId,
    name: input.name,
    description: input.description,
    latestRevisionId: null,
    createdById: input.createdById,
    clientId: input.clientId ?? null,
  });
  const revision = await manager.getRepository(ScenarioRevisionEntity).save({
    scenarioId: scenario.id,
    number: 1,
    document: input.document,
    message: input.message,
    createdById: input.createdById,
  });
  await scenarios.update({ id: scenario.id }, { latestRevisionId: revision.id });
  await touchProject(manager, input.projectId);
  return { ...scenario, latestRevisionId: revision.id };
}
