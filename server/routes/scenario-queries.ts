// Reads that assemble scenario views: latest-revision summaries (without documents) and run counts,
// each fetched in one query for a whole list.
import { In, type DataSource } from 'typeorm';
import type { ScenarioDetail, ScenarioSummary } from '../../shared/api/scenarios';
import { RunEntity, ScenarioEntity, ScenarioRevisionEntity } from '../db/entities';
import { toScenarioDetail, toScenarioSummary } from '../mappers/scenarios';

/** The columns a revision summary needs: never the document. */
export const revisionSummaryColumns = {
  id: true,
  scenarioId: true,
  number: true,
  message: true,
  conveyorMode: true,
  createdAt: true,
  createdById: true,
} as const;

export async function runCounts(ds: DataSource, scenarioIds: string[]): Promise<Map<string, number>> {
  if (scenarioIds.length === 0) return new Map();
  const rows = await ds
    .getRepository(RunEntity)
    .createQueryBuilder('r')
    .select('r.scenario_id', 'scenarioId')
    .addSelect('COUNT(*)::int', 'count')
    .where({ scenarioId: In(scenarioIds) })
    .groupBy('r.scenario_id')
    .getRawMany<{ scenarioId: string; count: number }>();
  return new Map(rows.map((r) => [r.scenarioId, r.count]));
}

export async function scenarioSummaries(ds: DataSource, scenarios: ScenarioEntity[]): Promise<ScenarioSummary[]> {
  const revisionIds = scenarios.map((s) => s.latestRevisionId).filter((id): id is string => id !== null);
  const revisions = revisionIds.length
    ? await ds
        .getRepository(ScenarioRevisionEntity)
        .find({ where: { id: In(revisionIds) }, select: revisionSummaryColumns, relations: { createdBy: true } })
    : [];
  const byId = new Map(revisions.map((r) => [r.id, r]));
  const counts = await runCounts(
    ds,
    scenarios.map((s) => s.id),
  );
  return scenarios.flatMap((s) => {
    const latest = s.latestRevisionId ? byId.get(s.latestRevisionId) : undefined;
    return latest ? [toScenarioSummary(s, latest, counts.get(s.id) ?? 0)] : [];
  });
}

/** A scenario's latest revision id; null only inside the transaction that creates the scenario. */
export function latestRevisionIdOf(scenario: ScenarioEntity): string {
  if (!scenario.latestRevisionId) throw new Error(`scenario ${scenario.id} has no revision`);
  return scenario.latestRevisionId;
}

export async function scenarioDetail(ds: DataSource, scenarioId: string): Promise<ScenarioDetail> {
  const scenario = await ds
    .getRepository(ScenarioEntity)
    .findOneOrFail({ where: { id: scenarioId }, relations: { createdBy: true } });
  const latest = await ds
    .getRepository(ScenarioRevisionEntity)
    .findOneOrFail({ where: { id: latestRevisionIdOf(scenario) }, relations: { createdBy: true } });
  const counts = await runCounts(ds, [scenarioId]);
  return toScenarioDetail(scenario, latest, counts.get(scenarioId) ?? 0);
}
