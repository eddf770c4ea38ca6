import { describe, expect, it } from 'vitest';
import { validateScenario } from '../../workers/engine';
import { serialLine } from '../../workers/engine/testing/line-builder';
import { exampleFiles, loadExample } from './helpers';

type Doc = ReturnType<typeof serialLine> & Record<string, unknown>;

function base(): Doc {
  return serialLine({
    stations: [
      { cycle: { kind: 'fixed', value: 5 } },
      { cycle: { kind: 'fixed', value: 6 } },
      { cycle: { kind: 'fixed', value: 3 } },
    ],
    carriers: 4,
  }) as Doc;
}

function issuesOf(doc: unknown) {
  const outcome = validateScenario(doc);
  if (outcome.ok) throw new Error('expected the scenario to be refused');
  return outcome.issues;
}

describe('scenario validation', () => {
  it.each(exampleFiles())('accepts the example %s', (file) => {
    const outcome = validateScenario(loadExample(file));
    expect(outcome.ok ? [] : outcome.issues).toEqual([]);
  });

  it('refuses a station on an unknown lane, naming the path and the known lanes', () => {
    const doc = base();
    doc.steps[1].stations[0].laneId = 'L9';
    expect(issuesOf(doc)).toContainEqual({
      path: 'steps[1].stations[0].laneId',
      message: 'no lane "L9"; known lanes: work, return',
    });
  });

  it('refuses a station no carrier can reach from loading', () => {
    const doc = base();
    doc.lanes.push({
      id: 'island',
      name: 'Island',
      deckId: 'deck',
      modules: [{ lengthMm: doc.lanes[0].modules[0].lengthMm, count: 1 }],
      start: { xMm: 0, yMm: 2000 },
      heading: 'east',
    });
    doc.steps[1].stations[0].laneId = 'island';
    const issues = issuesOf(doc);
    expect(issues.map((i) => i.path)).toContain('steps[1].stations[0].laneId');
    expect(issues.find((i) => i.path === 'steps[1].stations[0].laneId')?.message).toMatch(
      /cannot be reached from the load station/,
    );
  });

  it('refuses a track whose loop does not close back to loading', () => {
    const doc = base();
    doc.links = [{ fromLaneId: 'work', toLaneId: 'return' }];
    expect(
      issuesOf(doc)
        .map((i) => i.message)
        .join('\n'),
    ).toMatch(/loop must close/);
  });

  it('refuses a step without a station', () => {
    const doc = base();
    doc.steps[1].stations = [];
    expect(issuesOf(doc)).toContainEqual({
      path: 'steps[1].stations',
      message: 'step "step-S2" has no station; add at least one',
    });
  });

  it('refuses more carriers than the track holds', () => {
    const doc = base();
    doc.carriers.count = 500;
    const issue = issuesOf(doc).find((i) => i.path === 'carriers.count');
    expect(issue?.message).toMatch(/^500 carriers do not fit: the track holds \d+/);
  });

  it('refuses a distribution with impossible parameters at its path', () => {
    const doc = base();
    doc.steps[1].stations[0].cycleTimeSeconds = { kind: 'triangular', min: 5, mode: 9, max: 8 };
    expect(issuesOf(doc).map((i) => i.path)).toContain('steps[1].stations[0].cycleTimeSeconds.mode');
  });

  it('refuses non-positive lengths and speeds', () => {
    const doc = base();
    doc.carriers.loaded.aMaxMmPerS2 = 0;
    doc.lanes[0].modules[0].count = 0;
    const paths = issuesOf(doc).map((i) => i.path);
    expect(paths).toContain('carriers.loaded.aMaxMmPerS2');
    expect(paths).toContain('lanes[0].modules[0].count');
  });

  it('refuses a rework target after the inspection', () => {
    const doc = base();
    doc.steps[1] = {
      ...doc.steps[1],
      kind: 'inspect',
      rejectShare: 0.1,
      reworkShare: 0.1,
      reworkStepId: 'step-S3',
    } as Doc['steps'][number];
    expect(issuesOf(doc).map((i) => i.path)).toContain('steps[1].reworkStepId');
  });

  it('refuses a station placed off its lane', () => {
    const doc = base();
    doc.steps[2].stations[0].positionMm = 1e6;
    expect(issuesOf(doc).map((i) => i.path)).toContain('steps[2].stations[0].positionMm');
  });
});
