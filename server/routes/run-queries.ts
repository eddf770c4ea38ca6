// Run reads. Lists join only the scenario name and revision number and never select `results`.
import type { DataSource, EntityManager, SelectQueryBuilder } from 'typeorm';
import {
  FORMER_MEMBER,
  type ListRunsQuery,
  type RunFilterChoices,
  type RunListItem,
  type RunSort,
  type RunsPage,
} from '../../shared/api/runs';
import { RunEntity } from '../db/entities';
import { toRunDetail, toRunListItem } from '../mappers/runs';

/** The list's scope: one of them is set by the route. */
export type RunScope = { projectId: string } | { scenarioId: string };

/**
 * What each sortable column orders by. Text sorts ignore case; a run with no author (account deleted)
 * sorts last either way.
 */
const SORT_EXPRESSION: Record<RunSort, string> = {
  name: 'LOWER(run.name)',
  scenario: 'LOWER(scenario.name)',
  revision: 'revision.number',
  author: 'LOWER(author.name)',
  createdAt: 'run.createdAt',
  throughput: 'run.throughputPerHourMean',
  takt: 'run.taktSecondsMean',
  carriers: 'run.carriers',
};

function runsQuery(ds: DataSource | EntityManager): SelectQueryBuilder<RunEntity> {
  return ds
    .getRepository(RunEntity)
    .createQueryBuilder('run')
    .innerJoin('run.scenario', 'scenario')
    .addSelect(['scenario.id', 'scenario.name', 'scenario.projectId'])
    .innerJoin('run.revision', 'revision')
    .addSelect(['revision.id', 'revision.number', 'revision.conveyorMode'])
    .leftJoinAndSelect('run.createdBy', 'author');
}

function inScope(query: SelectQueryBuilder<RunEntity>, scope: RunScope): SelectQueryBuilder<RunEntity> {
  return 'projectId' in scope
    ? query.where('scenario.projectId = :projectId', { projectId: scope.projectId })
    : query.where('run.scenarioId = :scenarioId', { scenarioId: scope.scenarioId });
}

function filtered(query: SelectQueryBuilder<RunEntity>, filters: ListRunsQuery): SelectQueryBuilder<RunEntity> {
  if (filters.revisionId) query.andWhere('run.revisionId = :revisionId', { revisionId: filters.revisionId });
  if (filters.createdBy === FORMER_MEMBER) query.andWhere('run.createdById IS NULL');
  else if (filters.createdBy) query.andWhere('run.createdById = :createdBy', { createdBy: filters.createdBy });
  if (filters.revision !== undefined) query.andWhere('revision.number = :revision', { revision: filters.revision });
  if (filters.carriers !== undefined) query.andWhere('run.carriers = :carriers', { carriers: filters.carriers });
  if (filters.since) query.andWhere('run.createdAt >= :since', { since: new Date(filters.since) });
  if (filters.minThroughput !== undefined)
    query.andWhere('run.throughputPerHourMean >= :minThroughput', { minThroughput: filters.minThroughput });
  if (filters.maxTakt !== undefined) query.andWhere('run.taktSecondsMean <= :maxTakt', { maxTakt: filters.maxTakt });
  return query;
}

/** Distinct authors, revision numbers and carrier counts of every run in scope, in one scan. */
async function filterChoices(ds: DataSource, scope: RunScope): Promise<RunFilterChoices> {
  const [row] = await ds.query(
    `SELECT
       COALESCE(array_agg(DISTINCT revision.number ORDER BY revision.number), '{}') AS revisions,
       COALESCE(array_agg(DISTINCT run.carriers ORDER BY run.carriers), '{}') AS carriers,
       COALESCE(jsonb_agg(DISTINCT jsonb_build_object('id', run.created_by_id, 'name', COALESCE(author.name, ''))), '[]') AS authors
     FROM runs run
     JOIN scenarios scenario ON scenario.id = run.scenario_id
     JOIN scenario_revisions revision ON revision.id = run.revision_id
     LEFT JOIN users author ON author.id = run.created_by_id
     WHERE ${'projectId' in scope ? 'scenario.project_id' : 'run.scenario_id'} = $1`,
    ['projectId' in scope ? scope.projectId : scope.scenarioId],
  );
  const authors = (row.authors as { id: string | null; name: string }[]).sort((a, b) => a.name.localeCompare(b.name));
  return { authors, revisions: row.revisions.map(Number), carriers: row.carriers.map(Number) };
}

/** One page of a scope's runs, sorted and filtered in SQL, with the total and the filter menus' values. */
export async function listRunsPage(ds: DataSource, scope: RunScope, filters: ListRunsQuery): Promise<RunsPage> {
  const direction = filters.order === 'asc' ? 'ASC' : 'DESC';
  const page = filtered(inScope(runsQuery(ds), scope), filters)
    .orderBy(SORT_EXPRESSION[filters.sort], direction, 'NULLS LAST')
    .addOrderBy('run.id', direction)
    .offset(filters.offset)
    .limit(filters.limit);
  const [items, total, choices] = await Promise.all([
    page.getMany(),
    filtered(inScope(runsQuery(ds), scope), filters).getCount(),
    filterChoices(ds, scope),
  ]);
  return { items: items.map(toRunListItem), total, offset: filters.offset, limit: filters.limit, choices };
}

/** One run as lists show it; pass the transaction's manager to read a run saved in it. */
export async function runListItem(ds: DataSource | EntityManager, id: string): Promise<RunListItem> {
  return toRunListItem(await runsQuery(ds).where('run.id = :id', { id }).getOneOrFail());
}

export async function runDetail(ds: DataSource, id: string) {
  return toRunDetail(await runsQuery(ds).addSelect('run.results').where('run.id = :id', { id }).getOneOrFail());
}
