// What each kind of share link points at: how to find the organisation that owns the subject (for the
// role check) and what an anonymous holder of the link receives. A further kind is one more entry here,
// one more value in ShareKind and the table's check constraint (a migration).
import type { DataSource } from 'typeorm';
import type { ShareKind, SharedView } from '../../shared/api/shares';
import { organisationsOfRuns } from '../comparisons/comparison-runs';
import { ComparisonEntity, RunEntity, ScenarioRevisionEntity, StudyEntity } from '../db/entities';
import { runDetail } from '../routes/run-queries';
import { studyDetail } from '../studies/study-queries';

interface ShareSubject {
  what: string;
  /** The owning organisation, or null when the subject does not exist. */
  organisationOf(ds: DataSource, subjectId: string): Promise<string | null>;
  view(ds: DataSource, subjectId: string, base: { expiresAt: string; organisationName: string }): Promise<SharedView>;
}

export const shareSubjects: Record<ShareKind, ShareSubject> = {
  run: {
    what: 'The run',
    async organisationOf(ds, subjectId) {
      const run = await ds
        .getRepository(RunEntity)
        .findOne({ where: { id: subjectId }, relations: { scenario: { project: true } } });
      return run?.scenario?.project?.organisationId ?? null;
    },
    async view(ds, subjectId, base) {
      const run = await runDetail(ds, subjectId);
      // The holder of the link sees the result, not who in the organisation made it.
      return { kind: 'run', ...base, run: { ...run, createdBy: null } };
    },
  },
  study: {
    what: 'The study',
    async organisationOf(ds, subjectId) {
      const study = await ds
        .getRepository(StudyEntity)
        .findOne({ where: { id: subjectId }, relations: { project: true } });
      return study?.project?.organisationId ?? null;
    },
    async view(ds, subjectId, base) {
      const study = await studyDetail(ds, subjectId);
      const revision = await ds.getRepository(ScenarioRevisionEntity).findOneByOrFail({ id: study.revisionId });
      return { kind: 'study', ...base, study: { ...study, createdBy: null }, document: revision.document };
    },
  },
  comparison: {
    what: 'The comparison',
    async organisationOf(ds, subjectId) {
      const comparison = await ds.getRepository(ComparisonEntity).findOneBy({ id: subjectId });
      if (!comparison) return null;
      // A run deleted (or moved away) since makes the whole comparison unavailable.
      const owners = await organisationsOfRuns(ds, comparison.runIds);
      return owners.every((owner) => owner === comparison.organisationId) ? comparison.organisationId : null;
    },
    async view(ds, subjectId, base) {
      const comparison = await ds.getRepository(ComparisonEntity).findOneByOrFail({ id: subjectId });
      const runs = [];
      for (const runId of comparison.runIds) {
        const run = await runDetail(ds, runId);
        const revision = await ds.getRepository(ScenarioRevisionEntity).findOneByOrFail({ id: run.revisionId });
        runs.push({ run: { ...run, createdBy: null }, document: revision.document });
      }
      return { kind: 'comparison', ...base, runs };
    },
  },
};
