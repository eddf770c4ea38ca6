// Two carrier-sizing studies compared as the compare-studies page does: both read over the API by a
// viewer, their job results made by the engine for the stacked and the side-by-side layouts with one
// seed, so the matched points pair replication by replication. A study of another organisation answers
// 404, so it cannot be pulled into a comparison. Gridlocked and skipped points are stored as such and
// settle the study with their reasons.
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { studyDetailSchema, studyJobs, type CreateStudyInput, type StudyDetail } from '../../shared/api/studies';
import { pairedDifference } from '../../workers/analysis/compare-means';
import { carrierSizingPoints } from '../../workers/studies/build-points';
import { runStudyJob } from '../../workers/studies/run-study-job';
import { compareStudies, labelStudies } from '../../src/features/study-compare/utils/study-comparison';
import { useCleanDatabase } from './fixtures/database';
import { sideBySideLoop, stackedLoop } from './fixtures/documents';
import { useOrganisation } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db);

const SETTINGS = { hours: 0.25, warmupMinutes: 2, replications: 3, seed: 11 };

async function sideBySideRevision(): Promise<string> {
  const res = await org.people.engineer.agent
    .post(`/api/projects/${org.content.projectId}/scenarios`)
    .send({ name: 'Side by side', document: sideBySideLoop() });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.latestRevision.id;
}

async function createStudy(revisionId: string, counts: number[]): Promise<StudyDetail> {
  const body: CreateStudyInput = {
    name: 'Fleet size',
    kind: 'carrierSizing',
    revisionId,
    settings: SETTINGS,
    blockSize: 3,
    points: carrierSizingPoints(counts),
  };
  const res = await org.people.engineer.agent.post(apiRoutes.projectStudies(org.content.projectId)).send(body);
  expect(res.status, JSON.stringify(res.body).slice(0, 400)).toBe(201);
  return studyDetailSchema.parse(res.body);
}

/** Runs every job of a study with the engine and saves each result, as a browser worker would. */
async function runAndSave(study: StudyDetail, document: Record<string, unknown>) {
  for (const job of studyJobs(study)) {
    const answer = await runStudyJob(document, job);
    if (answer.outcome === 'cancelled') throw new Error('not cancelled in this test');
    const key = { pointIndex: job.pointIndex, first: job.first, count: job.count };
    const body =
      answer.outcome === 'done'
        ? {
            ...key,
            outcome: 'done',
            engineVersion: answer.engineVersion,
            summaries: answer.block.summaries,
            series: answer.block.series,
            events: answer.block.events,
          }
        : { ...key, outcome: answer.outcome, message: answer.message };
    const res = await org.people.engineer.agent.post(apiRoutes.studyResults(study.id)).send(body);
    expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(201);
  }
}

const read = async (id: string) => {
  const res = await org.people.viewer.agent.get(apiRoutes.study(id));
  expect(res.status).toBe(200);
  return studyDetailSchema.parse(res.body);
};

describe('comparing studies read over the API', () => {
  it('pairs the matched points of two layouts run with one seed', async () => {
    const stacked = await createStudy(org.content.revisionId, [6, 12]);
    const sideBySide = await createStudy(await sideBySideRevision(), [12, 6]);
    await runAndSave(stacked, stackedLoop());
    await runAndSave(sideBySide, sideBySideLoop());
    const [a, b] = await Promise.all([read(stacked.id), read(sideBySide.id)]);
    expect([a.status, b.status]).toEqual(['done', 'done']);

    const comparison = compareStudies(labelStudies([a, b]));
    expect(comparison.pairing).toBe('paired');
    expect(comparison.rows.map((r) => r.x)).toEqual([6, 12]);
    const throughputs = (s: StudyDetail, carriers: number) => {
      const point = s.points.find((p) => p.changes[0].value === carriers)!;
      return s.results.find((r) => r.pointIndex === point.index)!.figures.map((f) => f.throughputPerHour);
    };
    expect(comparison.rows[1].differences[1]).toEqual(pairedDifference(throughputs(a, 12), throughputs(b, 12)));
  }, 120_000);

  it('another organisation cannot read a study to compare (404)', async () => {
    const study = await createStudy(org.content.revisionId, [6]);
    const res = await org.people.outsider.agent.get(apiRoutes.study(study.id));
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('stores gridlocked and skipped points with their reasons and settles the study', async () => {
    const study = await createStudy(org.content.revisionId, [82, 90]);
    const post = (pointIndex: number, outcome: string, message: string) =>
      org.people.engineer.agent
        .post(apiRoutes.studyResults(study.id))
        .send({ pointIndex, first: 0, count: 3, outcome, message });
    expect((await post(0, 'gridlock', 'gridlock at t=6.2 s: no carrier can move')).status).toBe(201);
    const last = await post(1, 'skipped', 'not run: 82 carriers already gridlock this track');
    expect(last.status).toBe(201);
    expect(last.body).toMatchObject({ saved: true, status: 'failedPoints', jobsDone: 2 });
    const detail = await read(study.id);
    expect(detail.results.map((r) => [r.outcome, r.message])).toEqual([
      ['gridlock', 'gridlock at t=6.2 s: no carrier can move'],
      ['skipped', 'not run: 82 carriers already gridlock this track'],
    ]);
    const bad = await post(1, 'crashed', 'x');
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.error.fields)).toMatch(/outcome/);
  });
});
