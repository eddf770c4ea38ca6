import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { StationStateBars, type StationStateBarsStation } from '../../../src/components/charts/StationStateBars';
import { axisLabel, hoverAt, legendLabels, tooltipRows, WIDTH } from './chart-test-helpers';

const stations: StationStateBarsStation[] = [
  { id: 'load', name: 'Load', shares: { processing: 0.5, starved: 0.3, blocked: 0.2, down: 0 } },
  { id: 'fit', name: 'Fitting', shares: { processing: 0.9, starved: 0.05, blocked: 0, down: 0.05 } },
  { id: 'test', name: 'Test', shares: { processing: 0.6, starved: 0.1, blocked: 0.25, down: 0.05 } },
];

const order = (container: Element) =>
  Array.from(container.querySelectorAll('[data-item]')).map((group) => group.getAttribute('data-item'));

describe('StationStateBars', () => {
  it('draws one segment per non-zero share and lists the four states', () => {
    const { container } = render(<StationStateBars stations={stations} width={WIDTH} />);
    expect(container.querySelectorAll('rect[data-category]')).toHaveLength(10);
    expect(legendLabels(container)).toEqual(['processing', 'starved', 'blocked', 'down']);
    expect(axisLabel(container, 'x')).toEqual(['Share of simulated time after warm-up (%)']);
  });

  it('marks the bottleneck with a text label beside its bar, not by colour alone', () => {
    const { container } = render(
      <StationStateBars stations={stations} bottleneckId="fit" bottleneckShare={0.8} width={WIDTH} />,
    );
    const notes = container.querySelectorAll('[data-chart-part="note"]');
    expect(notes).toHaveLength(1);
    expect(notes[0].textContent).toBe('◀ bottleneck (80.0% of the time)');
    expect(notes[0].closest('[data-item]')!.getAttribute('data-item')).toBe('fit');
    expect(screen.getByRole('img').getAttribute('aria-label')).toContain(
      'The bottleneck is Fitting, processing 90.0% of the time.',
    );
  });

  it('sorts by line order, by name or by a state share, largest first', () => {
    const { container, rerender } = render(<StationStateBars stations={stations} width={WIDTH} />);
    expect(order(container)).toEqual(['load', 'fit', 'test']);
    rerender(<StationStateBars stations={stations} sortBy="blocked" width={WIDTH} />);
    expect(order(container)).toEqual(['test', 'load', 'fit']);
    rerender(<StationStateBars stations={stations} sortBy="name" width={WIDTH} />);
    expect(order(container)).toEqual(['fit', 'load', 'test']);
  });

  it('shows every share of the hovered station', () => {
    const { container } = render(<StationStateBars stations={stations} bottleneckId="fit" width={WIDTH} />);
    hoverAt(container.querySelector('[data-item="test"] rect[data-category="blocked"]')!, 10, 10);
    expect(tooltipRows()).toEqual({ processing: '60.0%', starved: '10.0%', blocked: '25.0%', down: '5.0%' });
  });

  it('adds on break only when a station reports it', () => {
    const withIdle = [
      ...stations,
      { id: 'man', name: 'Manual', shares: { processing: 0.5, starved: 0.1, blocked: 0, down: 0, onBreak: 0.4 } },
    ];
    const { container } = render(<StationStateBars stations={withIdle} width={WIDTH} />);
    expect(legendLabels(container)).toContain('on break');
    expect(
      within(screen.getByRole('table'))
        .getAllByRole('columnheader')
        .map((th) => th.textContent),
    ).toContain('on break');
  });

  it('explains an empty line and names shares that do not cover the whole time', () => {
    const { rerender } = render(<StationStateBars stations={[]} />);
    expect(screen.getByRole('status').textContent).toMatch(/the line has no stations yet/);
    rerender(
      <StationStateBars
        stations={[stations[0], { ...stations[1], shares: { ...stations[1].shares, processing: 0.6 } }]}
      />,
    );
    expect(screen.getByRole('alert').textContent).toMatch(/stations\[1\]\.shares \(Fitting\) add up to 0\.7/);
    rerender(
      <StationStateBars stations={[{ ...stations[0], shares: { ...stations[0].shares, blocked: Number.NaN } }]} />,
    );
    expect(screen.getByRole('alert').textContent).toMatch(/stations\[0\]\.shares\.blocked must be a finite number/);
  });
});
