// Runs as the API shows them (shared/api/runs.ts). List items never carry `results`.
import type { RunDetail, RunListItem } from '../../shared/api/runs';
import type { RunEntity } from '../db/entities';
import { iso, toUserRef } from './common';

/** Expects `scenario` (id, name) and `revision` (id, number, conveyorMode) joined, and `createdBy` loaded. */
export function toRunListItem(run: RunEntity): RunListItem {
  return {
    id: run.id,
    scenarioId: run.scenarioId,
    scenarioName: run.scenario?.name ?? '',
    revisionId: run.revisionId,
    revisionNumber: run.revision?.number ?? 0,
    conveyorMode: run.revision?.conveyorMode ?? 'carriers',
    name: run.name,
    seed: run.seed,
    engineVersion: run.engineVersion,
    settings: run.settings,
    summary: run.summary,
    serverChecked: run.serverChecked,
    createdBy: toUserRef(run.createdBy),
    createdAt: iso(run.createdAt),
  };
}

export function toRunDetail(run: RunEntity): RunDetail {
  return { ...toRunListItem(run), results: run.results };
}
