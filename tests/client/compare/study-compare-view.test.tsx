// The comparison of studies on screen: one curve per study with its band, a cross on the axis where a
// study gridlocked (never a zero), each layout's recommended fleet, and written-out verdicts.
import { render, screen } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import sideBySideLoop from '../../../shared/examples/side-by-side-loop.json';
import stackedLoop from '../../../shared/examples/stacked-loop.json';
import type { StudyDetail } from '../../../shared/api/studies';
import { scenarioSchema } from '../../../shared/scenario/scenario';
import { StudyCompareView } from '../../../src/features/study-compare/components/study-compare-view';
import { labelStudies } from '../../../src/features/study-compare/utils/study-comparison';
import { localSizingStudy } from '../support/local-study';

const SETTINGS = { hours: 1, warmupMinutes: 10, replications: 3, seed: 9 };
let stacked: StudyDetail;
let sideBySide: StudyDetail;

beforeAll(async () => {
  [stacked, sideBySide] = await Promise.all([
    localSizingStudy(1, 'Stacked', stackedLoop, [8, 20, 82], SETTINGS),
    localSizingStudy(2, 'Side by side', sideBySideLoop, [8, 20, 40], SETTINGS),
  ]);
}, 60_000);

describe('StudyCompareView', () => {
  it('draws every study, crosses the gridlocked count and names each recommendation', () => {
    const { container } = render(
      <StudyCompareView
        studies={labelStudies([stacked, sideBySide])}
        scenarios={[scenarioSchema.parse(stackedLoop), scenarioSchema.parse(sideBySideLoop)]}
        details={['stacked details', 'side-by-side details']}
        question="Which layout?"
        notes={<p>notes</p>}
      />,
    );
    const chart = container.querySelector('[data-chart="study-comparison-throughput"]')!;
    expect(chart).not.toBeNull();
    expect(chart.querySelectorAll('[data-series-index]')).toHaveLength(2);
    // 82 carriers gridlock the stacked loop: no point there, a cross on the axis instead.
    expect(chart.querySelectorAll('[data-chart-part="point"]')).toHaveLength(5);
    expect(chart.querySelectorAll('[data-chart-part="stop"]')).toHaveLength(1);
    expect(chart.querySelector('[data-chart-part="stop"] title')?.textContent).toBe('82: gridlock');
    expect(screen.getByTestId('study-pairing').textContent).toMatch(/Every difference is paired/);
    expect(screen.getByTestId('study-advice').textContent).toMatch(/Stacked: .*Side by side: /);
    const table = screen.getByTestId('study-differences');
    expect(table.textContent).toMatch(/gridlock at t=/);
    expect(table.querySelectorAll('[data-verdict]')).toHaveLength(2);
  });
});
