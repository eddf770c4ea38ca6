// Scenarios and revisions as the API shows them (shared/api/scenarios.ts).
import type { Revision, RevisionSummary, ScenarioDetail, ScenarioSummary } from '../../shared/api/scenarios';
import type { ScenarioEntity, ScenarioRevisionEntity } from '../db/entities';
import { iso, toUserRef } from './common';

export function toRevisionSummary(revision: ScenarioRevisionEntity): RevisionSummary {
  return {
    id: revision.id,
    scenarioId: revision.scenarioId,
    number: revision.number,
    message: revision.message,
    conveyorMode: revision.conveyorMode,
    createdBy: toUserRef(revision.createdBy),
    createdAt: iso(revision.createdAt),
  };
}

export function toRevision(revision: ScenarioRevisionEntity): Revision {
  return { ...toRevisionSummary(revision), document: revision.document };
}

export function toScenarioSummary(
  scenario: ScenarioEntity,
  latest: ScenarioRevisionEntity,
  runCount: number,
): ScenarioSummary {
  return {
    id: scenario.id,
    projectId: scenario.projectId,
    name: scenario.name,
    description: scenario.description,
    latestRevision: toRevisionSummary(latest),
    runCount,
    createdBy: toUserRef(scenario.createdBy),
    createdAt: iso(scenario.createdAt),
    updatedAt: iso(scenario.updatedAt),
  };
}

export function toScenarioDetail(
  scenario: ScenarioEntity,
  latest: ScenarioRevisionEntity,
  runCount: number,
): ScenarioDetail {
  return { ...toScenarioSummary(scenario, latest, runCount), document: latest.document };
}
