// Time-study reads and their API shapes. Lists never select the samples; the detail adds them and the
// analysis, computed once when the study is stored (studies stored before that get theirs on first read).
import type { DataSource, SelectQueryBuilder } from 'typeorm';
import type { TimeStudyDetail, TimeStudyListItem } from '../../shared/api/time-studies';
import { analyseTimeStudy } from '../../workers/analysis';
import { TimeStudyEntity } from '../db/entities';
import { iso, toUserRef } from '../mappers/common';

export function toTimeStudyListItem(study: TimeStudyEntity): TimeStudyListItem {
  return {
    id: study.id,
    scenarioId: study.scenarioId,
    stationId: study.stationId,
    name: study.name,
    fileName: study.fileName,
    column: study.sampleColumn,
    count: study.sampleCount,
    mean: study.mean,
    sd: study.sd,
    createdBy: toUserRef(study.createdBy),
    createdAt: iso(study.createdAt),
  };
}

function studiesQuery(ds: DataSource): SelectQueryBuilder<TimeStudyEntity> {
  return ds.getRepository(TimeStudyEntity).createQueryBuilder('study').leftJoinAndSelect('study.createdBy', 'author');
}

export async function listTimeStudies(
  ds: DataSource,
  scenarioId: string,
  stationId?: string,
): Promise<TimeStudyListItem[]> {
  const query = studiesQuery(ds)
    .where('study.scenarioId = :scenarioId', { scenarioId })
    .orderBy('study.createdAt', 'DESC')
    .addOrderBy('study.id', 'ASC');
  if (stationId !== undefined) query.andWhere('study.stationId = :stationId', { stationId });
  return (await query.getMany()).map(toTimeStudyListItem);
}

export async function timeStudyDetail(ds: DataSource, id: string): Promise<TimeStudyDetail> {
  const study = await studiesQuery(ds)
    .addSelect(['study.samples', 'study.analysis'])
    .where('study.id = :id', { id })
    .getOneOrFail();
  let analysis = study.analysis;
  if (analysis === null) {
    analysis = analyseTimeStudy(study.samples);
    await ds.getRepository(TimeStudyEntity).update({ id }, { analysis });
  }
  return { ...toTimeStudyListItem(study), samples: study.samples, analysis };
}
