// Study reads: lists with progress counted from stored job results, the detail with points and the
// figures of every job, and the full engine summaries of one point for merging into a run result.
import type { DataSource } from 'typeorm';
import type { PointBlocks, StudyDetail, StudyListItem, StudyStatus } from '../../shared/api/studies';
import type { ReplicationSummaryJson } from '../../shared/studies/replication-summary-json';
import { StudyEntity, StudyJobFailureEntity, StudyJobResultEntity, StudyPointEntity } from '../db/entities';
import { iso, toUserRef } from '../mappers/common';

type Loaded = StudyEntity & {
  revision: { id: string; number: number; scenarioId: string; scenario?: { name: string } };
};

function studiesQuery(ds: DataSource) {
  return ds
    .getRepository(StudyEntity)
    .createQueryBuilder('study')
    .innerJoin('study.revision', 'revision')
    .addSelect(['revision.id', 'revision.number', 'revision.scenarioId'])
    .innerJoin('revision.scenario', 'scenario')
    .addSelect(['scenario.id', 'scenario.name'])
    .leftJoinAndSelect('study.createdBy', 'author');
}

async function jobsDone(ds: DataSource, ids: string[]): Promise<Map<string, number>> {
  if (ids.length === 0) return new Map();
  const rows: { studyId: string; n: string }[] = await ds
    .getRepository(StudyJobResultEntity)
    .createQueryBuilder('r')
    .select('r.studyId', 'studyId')
    .addSelect('COUNT(*)', 'n')
    .where('r.studyId IN (:...ids)', { ids })
    .groupBy('r.studyId')
    .getRawMany();
  return new Map(rows.map((r) => [r.studyId, Number(r.n)]));
}

function toListItem(study: Loaded, done: number): StudyListItem {
  return {
    id: study.id,
    projectId: study.projectId,
    name: study.name,
    kind: study.kind,
    revisionId: study.revisionId,
    scenarioId: study.revision.scenarioId,
    scenarioName: study.revision.scenario?.name ?? '',
    revisionNumber: study.revision.number,
    settings: study.settings,
    commonRandomNumbers: study.commonRandomNumbers,
    blockSize: study.blockSize,
    reduction: study.reduction,
    status: study.status,
    runOn: study.runOn,
    pointCount: study.pointCount,
    jobCount: study.jobCount,
    jobsDone: done,
    createdBy: toUserRef(study.createdBy),
    createdAt: iso(study.createdAt),
    updatedAt: iso(study.updatedAt),
  };
}

export async function listStudies(ds: DataSource, projectId: string): Promise<StudyListItem[]> {
  const studies = (await studiesQuery(ds)
    .where('study.projectId = :projectId', { projectId })
    .orderBy('study.createdAt', 'DESC')
    .getMany()) as Loaded[];
  const done = await jobsDone(
    ds,
    studies.map((s) => s.id),
  );
  return studies.map((s) => toListItem(s, done.get(s.id) ?? 0));
}

export async function studyListItem(ds: DataSource, id: string): Promise<StudyListItem> {
  const study = (await studiesQuery(ds).where('study.id = :id', { id }).getOneOrFail()) as Loaded;
  return toListItem(study, (await jobsDone(ds, [id])).get(id) ?? 0);
}

export async function studyDetail(ds: DataSource, id: string): Promise<StudyDetail> {
  const study = (await studiesQuery(ds).where('study.id = :id', { id }).getOneOrFail()) as Loaded;
  const points = await ds.getRepository(StudyPointEntity).find({ where: { studyId: id }, order: { index: 'ASC' } });
  const results = await ds
    .getRepository(StudyJobResultEntity)
    .find({ where: { studyId: id }, order: { pointIndex: 'ASC', first: 'ASC' } });
  return {
    ...toListItem(study, results.length),
    axes: study.axes,
    points: points.map((p) => ({ index: p.index, label: p.label, revisionId: p.revisionId, changes: p.changes })),
    results: results.map((r) => ({
      pointIndex: r.pointIndex,
      first: r.first,
      count: r.count,
      outcome: r.outcome,
      message: r.message,
      figures: r.figures,
    })),
  };
}

export async function pointBlocks(ds: DataSource, studyId: string, pointIndex: number): Promise<PointBlocks> {
  const rows = await ds
    .getRepository(StudyJobResultEntity)
    .createQueryBuilder('r')
    .addSelect(['r.summaries', 'r.events', 'r.series'])
    .where('r.studyId = :studyId AND r.pointIndex = :pointIndex AND r.outcome = :done', {
      studyId,
      pointIndex,
      done: 'done',
    })
    .orderBy('r.first', 'ASC')
    .getMany();
  return {
    pointIndex,
    engineVersion: rows[0]?.engineVersion ?? null,
    blocks: rows.map((r) => ({
      first: r.first,
      summaries: r.summaries as ReplicationSummaryJson[],
      events: r.events ?? [],
      ...(r.series ? { series: r.series } : {}),
    })),
  };
}

/**
 * Once every job has a result (or, on the server, failed on every attempt) the study is done, or done with
 * failed points. The status changes in one conditional update, so of several workers finishing the last
 * jobs at once exactly one learns that it finished the study (`finishedNow`), and sends the notice.
 */
export async function settleStatus(
  ds: DataSource,
  study: Pick<StudyEntity, 'id' | 'jobCount' | 'status'>,
): Promise<{ status: StudyStatus; jobsDone: number; finishedNow: boolean }> {
  const results = ds.getRepository(StudyJobResultEntity);
  const done = await results.countBy({ studyId: study.id });
  const failedJobs = await ds.getRepository(StudyJobFailureEntity).countBy({ studyId: study.id });
  if (done + failedJobs < study.jobCount) return { status: study.status, jobsDone: done, finishedNow: false };
  const failed = await results
    .createQueryBuilder('r')
    .where('r.studyId = :id AND r.outcome <> :done', { id: study.id, done: 'done' })
    .getCount();
  const status: StudyStatus = failed + failedJobs > 0 ? 'failedPoints' : 'done';
  const updated = await ds
    .createQueryBuilder()
    .update(StudyEntity)
    .set({ status, finishedAt: () => 'now()' })
    .where('id = :id AND status <> :status', { id: study.id, status })
    .returning(['id'])
    .execute();
  return { status, jobsDone: done, finishedNow: (updated.raw as unknown[]).length > 0 };
}
