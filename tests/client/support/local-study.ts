// A carrier-sizing study run in this process by the engine, shaped as the API returns it, for tests of
// what the client makes of studies.
import { createStudySchema, type StudyDetail } from '../../../shared/api/studies';
import type { RunSettings } from '../../../shared/scenario/run-settings';
import { carrierSizingPoints } from '../../../workers/studies/build-points';
import { runStudyLocally } from '../../../workers/studies/run-study-locally';

const uuid = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;

export async function localSizingStudy(
  n: number,
  scenarioName: string,
  document: unknown,
  counts: number[],
  settings: RunSettings,
): Promise<StudyDetail> {
  const definition = createStudySchema.parse({
    name: `Sizing ${n}`,
    kind: 'carrierSizing',
    revisionId: uuid(n),
    settings,
    blockSize: 2,
    points: carrierSizingPoints(counts),
  });
  const points = definition.points.map((p, index) => ({
    index,
    label: p.label,
    revisionId: uuid(n),
    changes: p.changes,
  }));
  const local = await runStudyLocally(
    { id: uuid(n), kind: 'carrierSizing', settings, commonRandomNumbers: true, blockSize: 2, points },
    { [uuid(n)]: document },
  );
  return {
    ...local,
    projectId: uuid(0),
    name: definition.name,
    kind: 'carrierSizing',
    runOn: 'browser',
    revisionId: uuid(n),
    scenarioId: uuid(n),
    scenarioName,
    revisionNumber: 1,
    reduction: null,
    status: 'done',
    pointCount: points.length,
    jobCount: local.results.length,
    jobsDone: local.results.length,
    createdBy: null,
    createdAt: new Date(0).toISOString(),
    updatedAt: new Date(0).toISOString(),
    axes: [],
  };
}
