// Time studies of a scenario's stations: engineers upload a CSV of measured cycle times, every member
// lists and reads them with their analysis, engineers delete them. Each change is audited on the scenario.
import express, { type Request } from 'express';
import type { AuditInput } from '../audit/record-audit';
import { audited } from '../audit/record-audit';
import { listTimeStudiesQuerySchema, uploadTimeStudyFieldsSchema } from '../../shared/api/time-studies';
import { loadScenario } from '../access/loaders';
import { requireRole } from '../access/require-role';
import type { AppContext } from '../app-context';
import { TimeStudyEntity } from '../db/entities';
import { badRequest } from '../http/http-error';
import { currentUser, loaded } from '../http/request-context';
import { parseInput, validate } from '../http/validate';
import { csvTextOf } from '../time-studies/csv-text';
import { loadedTimeStudy, loadTimeStudy } from '../time-studies/load-time-study';
import { readCycleTimes } from '../time-studies/read-cycle-times';
import { receiveTimeStudyUpload } from '../time-studies/receive-upload';
import { listTimeStudies, timeStudyDetail } from '../time-studies/time-study-queries';
import { analyseTimeStudy } from '../../workers/analysis';
import { mean, sumOfSquares } from '../../workers/analysis/describe-samples';

/** The file's name without its extension, as the study's name when none is given. */
function nameFromFile(fileName: string): string {
  const base = fileName.replace(/\.[^.]*$/, '').trim();
  return (base || 'Time study').slice(0, 120);
}

/** Studies belong to the scenario's data, so their trail sits on the scenario (action `update`). */
function studyAudit(
  req: Request,
  study: TimeStudyEntity,
  change: 'time study added' | 'time study deleted',
  organisationId: string | null,
): AuditInput {
  return {
    organisationId,
    actorId: currentUser(req).id,
    action: 'update',
    entity: 'scenario',
    entityId: study.scenarioId,
    detail: { change, timeStudyId: study.id, name: study.name, stationId: study.stationId, samples: study.sampleCount },
  };
}

export function timeStudiesRouter(ctx: AppContext) {
  const { ds } = ctx;
  const router = express.Router();

  router.post(
    '/scenarios/:id/time-studies',
    loadScenario(ctx),
    requireRole('engineer'),
    receiveTimeStudyUpload,
    async (req, res) => {
      const scenario = loaded(req, 'scenario');
      const fields = parseInput(uploadTimeStudyFieldsSchema, req.body ?? {}, 'body');
      if (!req.file)
        throw badRequest('Attach the CSV of measured cycle times in the form field named "file".', [
          { path: 'file', message: 'is required' },
        ]);
      const { column, samples } = readCycleTimes(csvTextOf(req.file.buffer, req.file.originalname));
      const m = mean(samples);
      const study = await audited(
        ds,
        (manager) =>
          manager.getRepository(TimeStudyEntity).save({
            scenarioId: scenario.id,
            stationId: fields.stationId,
            name: fields.name ?? nameFromFile(req.file?.originalname ?? ''),
            fileName: req.file?.originalname ?? '',
            sampleColumn: column,
            sampleCount: samples.length,
            mean: m,
            sd: samples.length > 1 ? Math.sqrt(sumOfSquares(samples, m) / (samples.length - 1)) : 0,
            samples,
            analysis: analyseTimeStudy(samples),
            createdById: currentUser(req).id,
          }),
        (saved) => studyAudit(req, saved, 'time study added', scenario.project?.organisationId ?? null),
      );
      res.status(201).json(await timeStudyDetail(ds, study.id));
    },
  );

  router.get(
    '/scenarios/:id/time-studies',
    loadScenario(ctx),
    validate({ query: listTimeStudiesQuerySchema }, async ({ query }, req, res) => {
      res.json(await listTimeStudies(ds, loaded(req, 'scenario').id, query.stationId));
    }),
  );

  router.get('/time-studies/:id', loadTimeStudy(ctx), async (req, res) => {
    res.json(await timeStudyDetail(ds, loadedTimeStudy(req).id));
  });

  router.delete('/time-studies/:id', loadTimeStudy(ctx), requireRole('engineer'), async (req, res) => {
    const study = loadedTimeStudy(req);
    await audited(
      ds,
      (manager) => manager.getRepository(TimeStudyEntity).delete({ id: study.id }),
      studyAudit(req, study, 'time study deleted', study.scenario?.project?.organisationId ?? null),
    );
    res.json({ ok: true });
  });

  return router;
}
