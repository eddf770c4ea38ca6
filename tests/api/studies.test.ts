// Studies over the API: who may do what (another organisation's ids answer 404), field paths on bad
// input, limits at their edge, job results saved once however often they are sent, progress and
// status, blocks that merge into the same run result as one run, and cascades.
import { beforeAll, describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import {
  STUDY_LIMITS,
  pendingJobs,
  studyDetailSchema,
  type CreateStudyInput,
  type StudyDetail,
} from '../../shared/api/studies';
import {
  combineBlocks,
  runExperiment,
  runReplicationRange,
  blockFromJson,
  blockToJson,
  type ReplicationBlockJson,
} from '../../workers/engine';
import { StudyEntity, StudyJobResultEntity } from '../../server/db/entities';
import { useCleanDatabase } from './fixtures/database';
import { stackedLoop } from './fixtures/documents';
import { ACTORS, freshContent, useOrganisation, type Actor } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db);

const SETTINGS = { hours: 0.1, warmupMinutes: 1, replications: 3, seed: 7 };

function studyBody(revisionId: string, extra: Partial<CreateStudyInput> = {}): CreateStudyInput {
  return {
    name: 'Fleet size',
    kind: 'carrierSizing',
    revisionId,
    settings: SETTINGS,
    blockSize: 2,
    points: [12, 16].map((n) => ({
      label: `${n} carriers`,
      changes: [{ path: 'carriers.count', op: 'set', value: n }],
    })),
    ...extra,
  };
}

/** Real engine output for each job of point 0 (12 carriers), blocks of two replications. */
const blocks: ReplicationBlockJson[] = [];
beforeAll(async () => {
  const doc = { ...stackedLoop(), carriers: { ...(stackedLoop().carriers as object), count: 12 } };
  for (const range of [
    { first: 0, count: 2 },
    { first: 2, count: 1 },
  ])
    blocks.push(blockToJson(await runReplicationRange(doc, SETTINGS, range)));
});

const doneBody = (pointIndex: number, block: ReplicationBlockJson) => ({
  pointIndex,
  first: block.first,
  count: block.summaries.length,
  outcome: 'done',
  engineVersion: 'test',
  summaries: block.summaries,
  series: block.series,
  events: block.events,
});

async function createStudy(extra: Partial<CreateStudyInput> = {}): Promise<StudyDetail> {
  const res = await org.people.engineer.agent
    .post(apiRoutes.projectStudies(org.content.projectId))
    .send(studyBody(org.content.revisionId, extra));
  expect(res.status, JSON.stringify(res.body).slice(0, 400)).toBe(201);
  return studyDetailSchema.parse(res.body);
}

describe('who may do what with studies', () => {
  const table: Record<string, Record<Actor, number>> = {
    list: { anonymous: 401, outsider: 404, viewer: 200, engineer: 200, owner: 200 },
    create: { anonymous: 401, outsider: 404, viewer: 403, engineer: 201, owner: 201 },
    read: { anonymous: 401, outsider: 404, viewer: 200, engineer: 200, owner: 200 },
    blocks: { anonymous: 401, outsider: 404, viewer: 200, engineer: 200, owner: 200 },
    save: { anonymous: 401, outsider: 404, viewer: 403, engineer: 201, owner: 201 },
    cancel: { anonymous: 401, outsider: 404, viewer: 403, engineer: 200, owner: 200 },
    remove: { anonymous: 401, outsider: 404, viewer: 403, engineer: 200, owner: 200 },
  };
  const rows = Object.entries(table).flatMap(([action, statuses]) =>
    ACTORS.map((actor) => ({ action, actor, status: statuses[actor] })),
  );
  it.each(rows)('$action as $actor answers $status', async ({ action, actor, status }) => {
    const study = await createStudy();
    const agent = org.people.as(actor);
    const call = {
      list: () => agent.get(apiRoutes.projectStudies(org.content.projectId)),
      create: () => agent.post(apiRoutes.projectStudies(org.content.projectId)).send(studyBody(org.content.revisionId)),
      read: () => agent.get(apiRoutes.study(study.id)),
      blocks: () => agent.get(apiRoutes.studyPointBlocks(study.id, 0)),
      save: () => agent.post(apiRoutes.studyResults(study.id)).send(doneBody(0, blocks[0])),
      cancel: () => agent.patch(apiRoutes.study(study.id)).send({ status: 'cancelled' }),
      remove: () => agent.delete(apiRoutes.study(study.id)),
    }[action]!;
    const res = await call();
    expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(status);
    if (status >= 400)
      expect(res.body.error.code).toBe({ 401: 'unauthenticated', 403: 'forbidden', 404: 'not_found' }[status]);
  });

  it('an engineer who did not make a study may not delete it; the owner may', async () => {
    const res = await org.people.owner.agent
      .post(apiRoutes.projectStudies(org.content.projectId))
      .send(studyBody(org.content.revisionId));
    expect((await org.people.engineer.agent.delete(apiRoutes.study(res.body.id))).status).toBe(403);
    const mine = await createStudy();
    expect((await org.people.owner.agent.delete(apiRoutes.study(mine.id))).status).toBe(200);
    expect((await org.people.viewer.agent.get(apiRoutes.study(mine.id))).status).toBe(404);
  });
});

describe('making a study', () => {
  it('stores points, settings and the job plan; lists show progress', async () => {
    const study = await createStudy();
    expect(study).toMatchObject({
      kind: 'carrierSizing',
      status: 'running',
      pointCount: 2,
      jobCount: 4,
      jobsDone: 0,
      blockSize: 2,
      commonRandomNumbers: true,
      revisionNumber: 1,
      scenarioName: 'Stacked',
    });
    expect(study.points.map((p) => p.changes[0].value)).toEqual([12, 16]);
    expect(pendingJobs(study).map((j) => [j.pointIndex, j.first, j.count])).toEqual([
      [0, 0, 2],
      [0, 2, 1],
      [1, 0, 2],
      [1, 2, 1],
    ]);
    const list = await org.people.viewer.agent.get(apiRoutes.projectStudies(org.content.projectId));
    expect(list.body.map((s: { id: string }) => s.id)).toContain(study.id);
  });

  it('names every bad field by its path', async () => {
    const res = await org.people.engineer.agent.post(apiRoutes.projectStudies(org.content.projectId)).send({
      ...studyBody(org.content.revisionId),
      kind: 'guess',
      settings: { ...SETTINGS, replications: 0 },
      points: [{ label: '', changes: [{ path: 'carriers..count', op: 'grow', value: 'x' }] }],
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.map((f: { path: string }) => f.path).sort()).toEqual(
      [
        'kind',
        'points[0].changes[0].op',
        'points[0].changes[0].path',
        'points[0].changes[0].value',
        'points[0].label',
        'settings.replications',
      ].sort(),
    );
  });

  it('refuses a revision of another organisation, by field', async () => {
    const elsewhere = await org.people.outsider.agent
      .post('/api/projects')
      .send({ name: 'Theirs', organisationId: org.people.outsider.organisationId });
    const scenario = await org.people.outsider.agent
      .post(apiRoutes.projectScenarios(elsewhere.body.id))
      .send({ name: 'Theirs', document: stackedLoop() });
    const res = await org.people.engineer.agent.post(apiRoutes.projectStudies(org.content.projectId)).send(
      studyBody(org.content.revisionId, {
        points: [{ label: 'theirs', revisionId: scenario.body.latestRevision.id }],
      }),
    );
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual([
      { path: 'points[0].revisionId', message: 'is not a revision of a scenario in this project' },
    ]);
  });

  it('takes the most points allowed and refuses one more, saying the limit', async () => {
    const points = (n: number) => Array.from({ length: n }, (_, i) => ({ label: `point ${i}` }));
    const settings = { hours: 0.01, warmupMinutes: 0, replications: 1, seed: 1 };
    const most = await org.people.engineer.agent
      .post(apiRoutes.projectStudies(org.content.projectId))
      .send(studyBody(org.content.revisionId, { settings, blockSize: 1, points: points(STUDY_LIMITS.pointsMax) }));
    expect(most.status).toBe(201);
    const over = await org.people.engineer.agent
      .post(apiRoutes.projectStudies(org.content.projectId))
      .send(studyBody(org.content.revisionId, { settings, blockSize: 1, points: points(STUDY_LIMITS.pointsMax + 1) }));
    expect(over.status).toBe(400);
    expect(over.body.error.fields).toEqual([
      { path: 'points', message: `a study may have at most ${STUDY_LIMITS.pointsMax} points; use a coarser grid` },
    ]);
  });

  it('refuses more jobs or simulated hours than allowed, saying how many it would be', async () => {
    const points = Array.from({ length: 100 }, (_, i) => ({ label: `point ${i}` }));
    const jobs = await org.people.engineer.agent.post(apiRoutes.projectStudies(org.content.projectId)).send(
      studyBody(org.content.revisionId, {
        settings: { hours: 0.01, warmupMinutes: 0, replications: 41, seed: 1 },
        blockSize: 1,
        points,
      }),
    );
    expect(jobs.status).toBe(400);
    expect(jobs.body.error.fields[0]).toEqual({
      path: 'blockSize',
      message: `the study would have 4100 jobs; at most ${STUDY_LIMITS.jobsMax} are allowed in the browser (run larger studies on the server), so use larger blocks or fewer points`,
    });
    const atLimit = await org.people.engineer.agent.post(apiRoutes.projectStudies(org.content.projectId)).send(
      studyBody(org.content.revisionId, {
        settings: { hours: 0.01, warmupMinutes: 0, replications: 40, seed: 1 },
        blockSize: 1,
        points,
      }),
    );
    expect(atLimit.status).toBe(201);
    const hours = await org.people.engineer.agent.post(apiRoutes.projectStudies(org.content.projectId)).send(
      studyBody(org.content.revisionId, {
        settings: { hours: 501, warmupMinutes: 0, replications: 1, seed: 1 },
        blockSize: 1,
        points,
      }),
    );
    expect(hours.status).toBe(400);
    expect(hours.body.error.fields[0].path).toBe('settings.hours');
    expect(hours.body.error.fields[0].message).toContain('50100 hours');
  });
});

describe('job results', () => {
  it('a job sent twice or at once from several tabs counts once', async () => {
    const study = await createStudy();
    const send = () => org.people.engineer.agent.post(apiRoutes.studyResults(study.id)).send(doneBody(0, blocks[0]));
    const answers = await Promise.all([send(), send(), send()]);
    expect(answers.map((a) => a.status).sort()).toEqual([200, 200, 201]);
    expect(answers.map((a) => a.body.saved).sort()).toEqual([false, false, true]);
    expect((await send()).body).toEqual({ saved: false, status: 'running', jobsDone: 1 });
    expect(await db().getRepository(StudyJobResultEntity).countBy({ studyId: study.id })).toBe(1);
  });

  it('checks the job key against the study, by field', async () => {
    const study = await createStudy();
    const res = await org.people.engineer.agent
      .post(apiRoutes.studyResults(study.id))
      .send({ ...doneBody(0, blocks[0]), pointIndex: 2, first: 1 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.map((f: { path: string }) => f.path)).toEqual(['pointIndex', 'first']);
    const short = await org.people.engineer.agent
      .post(apiRoutes.studyResults(study.id))
      .send({ ...doneBody(0, blocks[0]), summaries: blocks[0].summaries.slice(1) });
    expect(short.body.error.fields).toEqual([
      { path: 'summaries', message: 'must hold 2 replication summaries, one per replication of the job' },
    ]);
    const broken = await org.people.engineer.agent.post(apiRoutes.studyResults(study.id)).send({
      ...doneBody(0, blocks[0]),
      summaries: [{ ...blocks[0].summaries[0], lead: [1, 2] }, blocks[0].summaries[1]],
    });
    expect(broken.body.error.fields[0].path).toBe('summaries[0].lead');
    const seriesless = await org.people.engineer.agent
      .post(apiRoutes.studyResults(study.id))
      .send({ ...doneBody(0, blocks[0]), series: undefined });
    expect(seriesless.status).toBe(400);
    expect(seriesless.body.error.fields).toEqual([
      { path: 'series', message: "is required: the block's mean heatmap series, unless every summary carries its own" },
    ]);
  });

  it('takes a result in the older form, each summary with its own series, and hands it back as stored', async () => {
    const study = await createStudy();
    const block = blocks[0];
    const older = {
      ...doneBody(0, block),
      series: undefined,
      summaries: block.summaries.map((s) => ({ ...s, ...block.series })),
    };
    const res = await org.people.engineer.agent.post(apiRoutes.studyResults(study.id)).send(older);
    expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(201);
    const stored = await org.people.viewer.agent.get(apiRoutes.studyPointBlocks(study.id, 0));
    expect(stored.body.blocks[0].series).toBeUndefined();
    expect(stored.body.blocks[0].summaries[0].laneHeat).toEqual(block.series?.laneHeat);
  });

  it('finishes as done, or as failed points when a job stopped, and blocks merge into one run result', async () => {
    const study = await createStudy();
    const engineer = org.people.engineer.agent;
    for (const block of blocks)
      expect((await engineer.post(apiRoutes.studyResults(study.id)).send(doneBody(0, block))).status).toBe(201);
    await engineer.post(apiRoutes.studyResults(study.id)).send({
      pointIndex: 1,
      first: 0,
      count: 2,
      outcome: 'stopped',
      message: 'gridlock: every carrier waits for another',
    });
    const last = await engineer
      .post(apiRoutes.studyResults(study.id))
      .send({ pointIndex: 1, first: 2, count: 1, outcome: 'stopped', message: 'gridlock' });
    expect(last.body).toEqual({ saved: true, status: 'failedPoints', jobsDone: 4 });
    const detail = studyDetailSchema.parse((await org.people.viewer.agent.get(apiRoutes.study(study.id))).body);
    expect(detail.results.find((r) => r.pointIndex === 1)?.message).toContain('gridlock');
    expect(
      detail.results.filter((r) => r.pointIndex === 0).flatMap((r) => r.figures.map((f) => f.throughputPerHour)),
    ).toEqual(blocks.flatMap((b) => b.summaries.map((s) => s.throughputPerHour)));
    const stored = await org.people.viewer.agent.get(apiRoutes.studyPointBlocks(study.id, 0));
    const doc = { ...stackedLoop(), carriers: { ...(stackedLoop().carriers as object), count: 12 } };
    const merged = combineBlocks(doc, SETTINGS, stored.body.blocks.map(blockFromJson));
    const whole = await runExperiment(doc, SETTINGS);
    expect(merged.throughputPerHour.mean).toBeCloseTo(whole.throughputPerHour.mean, 6);
    expect(merged.stations.map((s) => s.bottleneckShare)).toEqual(
      whole.stations.map((s) => expect.closeTo(s.bottleneckShare, 4)),
    );
  });

  it('cancel keeps finished jobs; resume carries on; a finished study cannot be cancelled', async () => {
    const study = await createStudy();
    const engineer = org.people.engineer.agent;
    await engineer.post(apiRoutes.studyResults(study.id)).send(doneBody(0, blocks[0]));
    expect((await engineer.patch(apiRoutes.study(study.id)).send({ status: 'cancelled' })).body).toMatchObject({
      status: 'cancelled',
      jobsDone: 1,
    });
    expect((await engineer.patch(apiRoutes.study(study.id)).send({ status: 'running' })).body).toMatchObject({
      status: 'running',
      jobsDone: 1,
    });
    for (const [p, block] of [
      [0, blocks[1]],
      [1, blocks[0]],
      [1, blocks[1]],
    ] as const)
      await engineer.post(apiRoutes.studyResults(study.id)).send(doneBody(p, block));
    const done = await engineer.get(apiRoutes.study(study.id));
    expect(done.body).toMatchObject({ status: 'done', jobsDone: 4 });
    const cancel = await engineer.patch(apiRoutes.study(study.id)).send({ status: 'cancelled' });
    expect(cancel.status).toBe(409);
    expect(cancel.body.error.fields).toEqual([{ path: 'status', message: 'the study has already finished' }]);
  });
});

describe('cascades', () => {
  it('deleting the project removes its studies and their results', async () => {
    const content = await freshContent(org.people);
    const res = await org.people.engineer.agent
      .post(apiRoutes.projectStudies(content.projectId))
      .send(studyBody(content.revisionId));
    await org.people.engineer.agent.post(apiRoutes.studyResults(res.body.id)).send(doneBody(0, blocks[0]));
    expect((await org.people.engineer.agent.delete(apiRoutes.project(content.projectId))).status).toBe(200);
    expect(await db().getRepository(StudyEntity).countBy({ id: res.body.id })).toBe(0);
    expect(await db().getRepository(StudyJobResultEntity).countBy({ studyId: res.body.id })).toBe(0);
  });
});
