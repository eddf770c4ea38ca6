import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { StationStateTimeline, stateRuns } from '../../../src/components/charts/StationStateTimeline';
import { axisLabel, hoverAt, legendLabels, tooltipRows, WIDTH } from './chart-test-helpers';

const stations = [
  { id: 's1', name: 'Press' },
  { id: 's2', name: 'Leak test' },
];
const states = ['processing', 'starved', 'blocked', 'down'] as const;
// [station][bin][state]; four bins of 30 s each.
const shares = [
  // Press: processing, processing, blocked, processing
  [0.8, 0.2, 0, 0],
  [0.7, 0.3, 0, 0],
  [0.1, 0, 0.9, 0],
  [0.6, 0.4, 0, 0],
  // Leak test: down, down, starved, nothing recorded
  [0, 0, 0, 1],
  [0.2, 0, 0, 0.8],
  [0.25, 0.75, 0, 0],
  [0, 0, 0, 0],
].flat();

describe('StationStateTimeline', () => {
  it('merges runs of bins with the same dominant state into one mark each', () => {
    const { container } = render(
      <StationStateTimeline stations={stations} timeBinSeconds={30} states={states} shares={shares} width={WIDTH} />,
    );
    const marks = Array.from(container.querySelectorAll('[data-chart-part="marks"] rect')).map((rect) =>
      rect.getAttribute('data-state'),
    );
    expect(marks).toEqual(['processing', 'blocked', 'processing', 'down', 'starved']);
    expect(stateRuns(2, 4, states, shares).map((run) => [run.station, run.fromBin, run.toBin])).toEqual([
      [0, 0, 2],
      [0, 2, 3],
      [0, 3, 4],
      [1, 0, 2],
      [1, 2, 3],
    ]);
  });

  it('names every station, labels the time axis with its unit and lists each state in the legend', () => {
    const { container } = render(
      <StationStateTimeline
        stations={stations}
        timeBinSeconds={30}
        states={states}
        shares={shares}
        warmupMinutes={0.5}
        width={WIDTH}
      />,
    );
    const names = Array.from(container.querySelectorAll('[data-chart-part="y-axis"] text')).map(
      (text) => text.textContent,
    );
    expect(names).toEqual(['Press', 'Leak test']);
    expect(axisLabel(container, 'x')).toEqual(['Simulated time (min)']);
    expect(legendLabels(container)).toEqual(['processing', 'starved', 'blocked', 'down', 'end of warm-up']);
  });

  it('shows all four shares of the bin under the pointer', () => {
    const { container } = render(
      <StationStateTimeline stations={stations} timeBinSeconds={30} states={states} shares={shares} width={WIDTH} />,
    );
    const row = container.querySelector('[data-station="s2"]')!;
    hoverAt(row, Number(row.getAttribute('width')) * (2.5 / 4), 5);
    expect(screen.getByRole('tooltip').textContent).toContain('Leak test, 1.0–1.5 min');
    expect(tooltipRows()).toEqual({ processing: '25.0%', starved: '75.0%', blocked: '0.0%', down: '0.0%' });
  });

  it('gives screen readers each station’s share of the run per state', () => {
    render(
      <StationStateTimeline stations={stations} timeBinSeconds={30} states={states} shares={shares} width={WIDTH} />,
    );
    const firstRow = screen.getByRole('table').querySelector('tbody tr')!;
    expect(Array.from(firstRow.children).map((cell) => cell.textContent)).toEqual([
      'Press',
      '55.0%',
      '22.5%',
      '22.5%',
      '0.0%',
    ]);
  });

  it('explains an empty line and names the faulty field', () => {
    const { rerender } = render(<StationStateTimeline stations={[]} timeBinSeconds={30} states={states} shares={[]} />);
    expect(screen.getByRole('status').textContent).toMatch(/No station states were recorded/);
    rerender(<StationStateTimeline stations={stations} timeBinSeconds={30} states={states} shares={shares.slice(1)} />);
    expect(screen.getByRole('alert').textContent).toMatch(
      /shares has 31 entries, not a whole number of time bins for 2 stations × 4 states/,
    );
    const overfull = [...shares];
    overfull[4 * 5 + 1] = 0.5; // Leak test, bin 1: 0.2 + 0.5 + 0.8
    rerender(<StationStateTimeline stations={stations} timeBinSeconds={30} states={states} shares={overfull} />);
    expect(screen.getByRole('alert').textContent).toMatch(
      /shares for stations\[1\] time bin 1 add up to 1\.5, more than 1/,
    );
  });
});
