// Run reads. Lists join only the scenario name and revision number and never select `results`.
import type { DataSource, SelectQueryBuilder } from 'typeorm';
import type { RunListItem } from '../../shared/api/runs';
import { RunEntity } from '../db/entities';
import { toRunDetail, toRunListItem } from '../mappers/runs';

export interface RunFilters {
  projectId?: string;
  scenarioId?: string;
  revisionId?: string;
  createdBy?: string;
}

function runsQuery(ds: DataSource): SelectQueryBuilder<RunEntity> {
  return ds
    .getRepository(RunEntity)
    .createQueryBuilder('run')
    .innerJoin('run.scenario', 'scenario')
    .addSelect(['scenario.id', 'scenario.name', 'scenario.projectId'])
    .innerJoin('run.revision', 'revision')
    .addSelect(['revision.id', 'revision.number', 'revision.conveyorMode'])
    .leftJoinAndSelect('run.createdBy', 'author');
}

export async function listRuns(ds: DataSource, filters: RunFilters): Promise<RunListItem[]> {
  const query = runsQuery(ds).orderBy('run.createdAt', 'DESC');
  if (filters.projectId) query.andWhere('scenario.projectId = :projectId', { projectId: filters.projectId });
  if (filters.scenarioId) query.andWhere('run.scenarioId = :scenarioId', { scenarioId: filters.scenarioId });
  if (filters.revisionId) query.andWhere('run.revisionId = :revisionId', { revisionId: filters.revisionId });
  if (filters.createdBy) query.andWhere('run.createdById = :createdBy', { createdBy: filters.createdBy });
  return (await query.getMany()).map(toRunListItem);
}

export async function runListItem(ds: DataSource, id: string): Promise<RunListItem> {
  return toRunListItem(await runsQuery(ds).where('run.id = :id', { id }).getOneOrFail());
}

export async function runDetail(ds: DataSource, id: string) {
  return toRunDetail(await runsQuery(ds).addSelect('run.results').where('run.id = :id', { id }).getOneOrFail());
}
