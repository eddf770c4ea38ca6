import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { LineBalanceChart, type BalanceStep } from '../../../src/components/charts/LineBalanceChart';
import { axisLabel, hoverAt, legendLabels, tooltipRows, WIDTH } from './chart-test-helpers';

const steps: BalanceStep[] = [
  { id: 'press', name: 'Press', meanCycleSeconds: 9, sdCycleSeconds: 0.5, parallelStations: 1 },
  { id: 'screw', name: 'Screwdriver', meanCycleSeconds: 4, sdCycleSeconds: 0, parallelStations: 1 },
  { id: 'fit', name: 'Manual fitting', meanCycleSeconds: 24, sdCycleSeconds: 3, parallelStations: 2 },
];

describe('LineBalanceChart', () => {
  it('draws a bar per step at mean ÷ parallel stations, a whisker where there is spread and a raw-mean marker for parallel steps', () => {
    const { container } = render(<LineBalanceChart steps={steps} taktSeconds={10} width={WIDTH} />);
    expect(container.querySelectorAll('[data-chart-part="bar"]')).toHaveLength(3);
    expect(container.querySelectorAll('[data-chart-part="whisker"]')).toHaveLength(2);
    expect(container.querySelectorAll('[data-chart-part="raw-mean"]')).toHaveLength(1);
    const heights = Array.from(container.querySelectorAll('[data-chart-part="bar"]')).map((bar) =>
      Number(bar.getAttribute('height')),
    );
    // Bars stand on a common baseline, so their heights are proportional to 9, 4 and 24 / 2 = 12 s.
    expect(heights[0] / heights[1]).toBeCloseTo(9 / 4, 6);
    expect(heights[2] / heights[0]).toBeCloseTo(12 / 9, 6);
  });

  it('outlines and hatches only the steps over takt, and labels the takt line with its value', () => {
    const { container } = render(<LineBalanceChart steps={steps} taktSeconds={10} width={WIDTH} />);
    const over = container.querySelectorAll('[data-over-takt="true"] [data-chart-part="bar"]');
    expect(over).toHaveLength(1);
    expect(over[0].closest('[data-step]')!.getAttribute('data-step')).toBe('fit');
    expect(over[0].getAttribute('fill')).toMatch(/^url\(#over-takt-/);
    expect(over[0].getAttribute('stroke-width')).toBe('2');
    expect(container.querySelector('[data-chart-part="takt"]')!.textContent).toBe('takt 10.00 s');
    expect(legendLabels(container)).toEqual([
      'mean cycle ÷ parallel stations',
      'over takt',
      '±1 sd (÷ parallel stations)',
      'mean cycle of one station',
      'takt',
    ]);
    expect(axisLabel(container, 'y')).toEqual(['Cycle time (s)']);
    expect(screen.getByText('Manual fitting ×2')).toBeTruthy();
  });

  it('gives the raw and effective cycle times in the tooltip', () => {
    const { container } = render(<LineBalanceChart steps={steps} taktSeconds={10} width={WIDTH} />);
    hoverAt(container.querySelector('[data-step="fit"] [data-chart-part="bar"]')!, 5, 5);
    expect(tooltipRows()).toEqual({
      'Mean cycle, one station': '24.00 s',
      'Standard deviation': '3.00 s',
      'Parallel stations': '2',
      'Effective cycle': '12.00 s',
      'Over takt by': '2.00 s',
    });
    hoverAt(container.querySelector('[data-step="screw"] [data-chart-part="bar"]')!, 5, 5);
    expect(tooltipRows()['Share of takt']).toBe('40.0%');
  });

  it('says when there are no steps and names invalid fields', () => {
    const { rerender } = render(<LineBalanceChart steps={[]} taktSeconds={10} />);
    expect(screen.getByRole('status').textContent).toMatch(/No process steps yet/);
    rerender(<LineBalanceChart steps={steps} taktSeconds={-1} />);
    expect(screen.getByRole('alert').textContent).toMatch(/taktSeconds must be a number above zero, got -1/);
    rerender(<LineBalanceChart steps={[steps[0], { ...steps[1], parallelStations: 1.5 }]} taktSeconds={10} />);
    expect(screen.getByRole('alert').textContent).toMatch(
      /steps\[1\]\.parallelStations must be a whole number of at least 1, got 1\.5/,
    );
  });
});
