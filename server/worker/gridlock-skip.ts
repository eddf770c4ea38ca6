// Carrier sizing on the server skips counts above one that already gridlocked, as the browser does:
// more carriers on the same track only lock it sooner, and running them would cost the workers time
// for a known answer. The workers share no memory, so the rule reads the gridlocked points from the
// stored results as each job starts; a job started before the gridlock was stored simply runs.
import { In, type DataSource } from 'typeorm';
import { gridlockCeiling, gridlockSkipReason, type StudyJob } from '../../shared/api/studies';
import { StudyJobResultEntity, StudyPointEntity, type StudyEntity } from '../db/entities';

/** Why this job of the study is not run, or null to run it. */
export async function gridlockSkip(
  ds: DataSource,
  study: Pick<StudyEntity, 'id' | 'kind'>,
  job: Pick<StudyJob, 'changes'>,
): Promise<string | null> {
  if (study.kind !== 'carrierSizing') return null;
  const locked = await ds
    .getRepository(StudyJobResultEntity)
    .find({ select: { pointIndex: true }, where: { studyId: study.id, outcome: 'gridlock' } });
  if (locked.length === 0) return null;
  const points = await ds
    .getRepository(StudyPointEntity)
    .findBy({ studyId: study.id, index: In([...new Set(locked.map((r) => r.pointIndex))]) });
  return gridlockSkipReason(gridlockCeiling(points), job);
}
