import { render, screen } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import beltBaseline from '../../../shared/examples/belt-baseline.json';
import stackedLoop from '../../../shared/examples/stacked-loop.json';
import type { RunResult } from '../../../shared/results/run-result';
import { scenarioSchema } from '../../../shared/scenario/scenario';
import { LayoutDrawing } from '../../../src/components/layout/layout-drawing';
import { ResultHeadline } from '../../../src/features/results/components/result-headline';
import { StationResults } from '../../../src/features/results/components/station-results';
import { runExperiment } from '../../../workers/engine';
import { RESULT_SETTINGS } from './support/engine-result';

let belt: RunResult;

beforeAll(async () => {
  belt = await runExperiment(beltBaseline, RESULT_SETTINGS, { now: () => performance.now() });
}, 60_000);

describe('belt conveyor baseline marks', () => {
  it('tags the drawing of a belt scenario and leaves a carrier layout untagged', () => {
    const { unmount } = render(<LayoutDrawing document={scenarioSchema.parse(beltBaseline)} />);
    expect(screen.getByText('Belt conveyor baseline')).toBeTruthy();
    unmount();
    render(<LayoutDrawing document={scenarioSchema.parse(stackedLoop)} />);
    expect(screen.queryByText('Belt conveyor baseline')).toBeNull();
  });

  it('tags the headline of a belt run and says its station cycles include stop and locate', () => {
    expect(belt.conveyor).toBe('belt');
    render(
      <>
        <ResultHeadline result={belt} />
        <StationResults result={belt} stepNames={undefined} fileBase="belt" />
      </>,
    );
    expect(screen.getByText('Belt conveyor baseline')).toBeTruthy();
    expect(screen.getByTestId('belt-cycle-note').textContent).toMatch(
      /mean cycle includes the time to stop and locate/,
    );
  });
});
