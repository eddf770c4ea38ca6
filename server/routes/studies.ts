// Studies of a project. Viewers read; engineers create, save job results, cancel and resume; the
// author or an owner deletes. Saving a job result is idempotent on (study, point, first replication):
// the first save answers 201, a retry 200 with `saved: false`, and progress never counts a job twice.
import express, { type RequestHandler } from 'express';
import { z } from 'zod';
import { canEdit } from '../../shared/api/roles';
import {
  createStudySchema,
  saveJobResultSchema,
  updateStudySchema,
  type SaveJobResultInput,
} from '../../shared/api/studies';
import type { FieldIssue } from '../../shared/api/errors';
import { summariesCarrySeries } from '../../shared/studies/replication-summary-json';
import { loadProject, loadStudy } from '../access/loaders';
import { requireRole } from '../access/require-role';
import type { AppContext } from '../app-context';
import { audited } from '../audit/record-audit';
import { ScenarioRevisionEntity, StudyEntity, StudyPointEntity, type ProjectEntity } from '../db/entities';
import { badRequest, conflict, forbidden, HttpError } from '../http/http-error';
import { currentUser, loaded } from '../http/request-context';
import { validate } from '../http/validate';
import { saveJobResult } from '../studies/save-job-result';
import {
  assertServerStudyAllowed,
  queueStudyRound,
  unqueueStudy,
  type StudyQueueHandle,
} from '../studies/server-studies';
import { studyProgress } from '../studies/study-progress';
import { listStudies, pointBlocks, settleStatus, studyDetail, studyListItem } from '../studies/study-queries';
import type { DataSource } from 'typeorm';

const requireStudyAuthorOrOwner: RequestHandler = (req, _res, next) => {
  const role = loaded(req, 'role');
  const study = loaded(req, 'study');
  if (role === 'owner' || (canEdit(role) && study.createdById === currentUser(req).id)) return next();
  next(forbidden('Only the study’s author or an organisation owner may delete this study.'));
};

/** Server studies need the job queue, which the web server starts; an app built without it refuses them. */
function requireQueue(ctx: AppContext): StudyQueueHandle {
  if (!ctx.queue)
    throw new HttpError(
      503,
      'unavailable',
      'The server’s job queue is not running, so this study cannot run on the server.',
      [{ path: 'runOn', message: 'the server’s job queue is not running; run the study in the browser' }],
    );
  return ctx.queue;
}

const pointParamsSchema = z.object({
  id: z.uuid({ message: 'must be a valid id (UUID)' }),
  pointIndex: z.coerce
    .number({ error: 'must be a whole number' })
    .int('must be a whole number')
    .min(0, 'must be 0 or more'),
});

/** The revisions among `ids` that belong to scenarios of the project. */
async function revisionsInProject(ds: DataSource, project: ProjectEntity, ids: string[]): Promise<Set<string>> {
  const rows = await ds
    .getRepository(ScenarioRevisionEntity)
    .createQueryBuilder('revision')
    .innerJoin('scenarios', 'scenario', 'scenario.id = revision.scenario_id')
    .select('revision.id', 'id')
    .where('revision.id IN (:...ids) AND scenario.project_id = :projectId', { ids, projectId: project.id })
    .getRawMany<{ id: string }>();
  return new Set(rows.map((r) => r.id));
}

function checkJobKey(study: StudyEntity, body: SaveJobResultInput): FieldIssue[] {
  const { replications } = study.settings;
  const issues: FieldIssue[] = [];
  if (body.pointIndex >= study.pointCount)
    issues.push({ path: 'pointIndex', message: `must be below ${study.pointCount}, the number of points` });
  if (body.first >= replications || body.first % study.blockSize !== 0) {
    issues.push({
      path: 'first',
      message: `must be a multiple of the block size ${study.blockSize} below ${replications}, the replications`,
    });
  } else if (body.count !== Math.min(study.blockSize, replications - body.first)) {
    issues.push({
      path: 'count',
      message: `must be ${Math.min(study.blockSize, replications - body.first)} for the job starting at replication ${body.first}`,
    });
  }
  if (body.outcome === 'done') {
    if (body.summaries.length !== body.count)
      issues.push({
        path: 'summaries',
        message: `must hold ${body.count} replication summaries, one per replication of the job`,
      });
    if (!body.series && !summariesCarrySeries(body.summaries))
      issues.push({
        path: 'series',
        message: "is required: the block's mean heatmap series, unless every summary carries its own",
      });
    if (body.events.length !== body.count)
      issues.push({ path: 'events', message: `must hold ${body.count} event counts, one per replication of the job` });
  }
  return issues;
}

export function studiesRouter(ctx: AppContext) {
  const { ds } = ctx;
  const router = express.Router();

  router.get('/projects/:id/studies', loadProject(ctx), async (req, res) => {
    res.json(await listStudies(ds, loaded(req, 'project').id));
  });

  router.post(
    '/projects/:id/studies',
    loadProject(ctx),
    requireRole('engineer'),
    validate({ body: createStudySchema }, async ({ body }, req, res) => {
      const project = loaded(req, 'project');
      const user = currentUser(req);
      const wanted = [
        ...new Set([body.revisionId, ...body.points.flatMap((p) => (p.revisionId ? [p.revisionId] : []))]),
      ];
      const known = await revisionsInProject(ds, project, wanted);
      const issues: FieldIssue[] = [];
      if (!known.has(body.revisionId))
        issues.push({ path: 'revisionId', message: 'is not a revision of a scenario in this project' });
      body.points.forEach((p, i) => {
        if (p.revisionId && !known.has(p.revisionId))
          issues.push({ path: `points[${i}].revisionId`, message: 'is not a revision of a scenario in this project' });
      });
      if (issues.length > 0)
        throw badRequest(
          `Invalid input in the request body: ${issues.map((i) => `${i.path} ${i.message}`).join('; ')}`,
          issues,
        );
      const blockSize = Math.min(body.blockSize ?? body.settings.replications, body.settings.replications);
      const queue = body.runOn === 'server' ? requireQueue(ctx) : undefined;
      const study = await audited(
        ds,
        async (manager) => {
          if (queue) await assertServerStudyAllowed(manager, project.organisationId);
          const saved = await manager.getRepository(StudyEntity).save({
            projectId: project.id,
            revisionId: body.revisionId,
            name: body.name,
            kind: body.kind,
            settings: body.settings,
            commonRandomNumbers: body.commonRandomNumbers,
            blockSize,
            reduction: body.reduction ?? null,
            axes: body.axes,
            status: 'running',
            pointCount: body.points.length,
            jobCount: body.points.length * Math.ceil(body.settings.replications / blockSize),
            runOn: body.runOn,
            createdById: user.id,
          });
          await manager.getRepository(StudyPointEntity).insert(
            body.points.map((p, index) => ({
              studyId: saved.id,
              index,
              revisionId: p.revisionId ?? body.revisionId,
              label: p.label,
              changes: p.changes,
            })),
          );
          if (queue) await queueStudyRound(manager, queue, saved);
          return saved;
        },
        (saved) => ({
          organisationId: project.organisationId,
          actorId: user.id,
          action: 'create',
          entity: 'study',
          entityId: saved.id,
          detail: { kind: body.kind, points: body.points.length, runOn: body.runOn },
        }),
      );
      res.status(201).json(await studyDetail(ds, study.id));
    }),
  );

  router.get('/studies/:id', loadStudy(ctx), async (req, res) => {
    res.json(await studyDetail(ds, loaded(req, 'study').id));
  });

  router.get('/studies/:id/progress', loadStudy(ctx), async (req, res) => {
    res.json(await studyProgress(ds, loaded(req, 'study')));
  });

  router.get(
    '/studies/:id/points/:pointIndex/blocks',
    loadStudy(ctx),
    validate({ params: pointParamsSchema }, async ({ params }, req, res) => {
      const study = loaded(req, 'study');
      if (params.pointIndex >= study.pointCount)
        throw badRequest(`Invalid input in the address: pointIndex must be below ${study.pointCount}`, [
          { path: 'pointIndex', message: `must be below ${study.pointCount}, the number of points` },
        ]);
      res.json(await pointBlocks(ds, study.id, params.pointIndex));
    }),
  );

  router.patch(
    '/studies/:id',
    loadStudy(ctx),
    requireRole('engineer'),
    validate({ body: updateStudySchema }, async ({ body }, req, res) => {
      const study = loaded(req, 'study');
      const finished = study.status === 'done' || study.status === 'failedPoints';
      if (body.status === 'cancelled' && finished)
        throw conflict('This study has finished; there is nothing to cancel.', [
          { path: 'status', message: 'the study has already finished' },
        ]);
      const changes = {
        ...(body.name !== undefined && { name: body.name }),
        ...(body.status !== undefined && !finished && { status: body.status }),
      };
      const onServer = study.runOn === 'server' && changes.status !== undefined && changes.status !== study.status;
      const queue = onServer ? requireQueue(ctx) : undefined;
      await audited(
        ds,
        async (manager) => {
          if (queue && changes.status === 'running')
            await assertServerStudyAllowed(manager, study.project?.organisationId ?? '');
          await manager.getRepository(StudyEntity).update({ id: study.id }, changes);
          if (queue && changes.status === 'running') await queueStudyRound(manager, queue, study);
          if (queue && changes.status === 'cancelled') await unqueueStudy(manager, queue, study);
        },
        {
          organisationId: study.project?.organisationId ?? null,
          actorId: currentUser(req).id,
          action: 'update',
          entity: 'study',
          entityId: study.id,
          detail: changes,
        },
      );
      res.json(await studyListItem(ds, study.id));
    }),
  );

  router.delete('/studies/:id', loadStudy(ctx), requireStudyAuthorOrOwner, async (req, res) => {
    const study = loaded(req, 'study');
    if (study.runOn === 'server' && study.status === 'running' && ctx.queue)
      await unqueueStudy(ds.manager, ctx.queue, study);
    await audited(ds, (manager) => manager.getRepository(StudyEntity).delete({ id: study.id }), {
      organisationId: study.project?.organisationId ?? null,
      actorId: currentUser(req).id,
      action: 'delete',
      entity: 'study',
      entityId: study.id,
      detail: { name: study.name },
    });
    res.json({ ok: true });
  });

  router.post(
    '/studies/:id/results',
    loadStudy(ctx),
    requireRole('engineer'),
    validate({ body: saveJobResultSchema }, async ({ body }, req, res) => {
      const study = loaded(req, 'study');
      const issues = checkJobKey(study, body);
      if (issues.length > 0)
        throw badRequest(
          `Invalid input in the request body: ${issues.map((i) => `${i.path} ${i.message}`).join('; ')}`,
          issues,
        );
      const saved = await saveJobResult(ds, study.id, body, currentUser(req).id);
      const { status, jobsDone } = await settleStatus(ds, study);
      res.status(saved ? 201 : 200).json({ saved, status, jobsDone });
    }),
  );

  return router;
}
