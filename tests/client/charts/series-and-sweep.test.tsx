import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { CurveWithBand, type SweepPoint } from '../../../src/components/charts/CurveWithBand';
import { TimeSeriesChart } from '../../../src/components/charts/TimeSeriesChart';
import { axisLabel, hoverAt, legendLabels, tooltipRows, WIDTH } from './chart-test-helpers';

const times = [0, 10, 20, 30, 40];
const wip = [0, 6, 9, 10, 10.5];

describe('TimeSeriesChart', () => {
  it('draws a line per series, a band where bounds are given, and names both in the legend', () => {
    const { container } = render(
      <TimeSeriesChart
        timesMinutes={times}
        series={[
          { name: 'WIP', values: wip, lower: wip.map((v) => v - 1), upper: wip.map((v) => v + 1) },
          { name: 'Queue at press', values: [0, 1, 2, 2, 3] },
        ]}
        quantity="Work in progress"
        unit="parts"
        bandLabel="95 % confidence interval"
        width={WIDTH}
      />,
    );
    expect(container.querySelectorAll('[data-chart-part="line"]')).toHaveLength(2);
    expect(container.querySelectorAll('[data-chart-part="band"]')).toHaveLength(1);
    expect(legendLabels(container)).toEqual(['WIP', 'Queue at press', '95 % confidence interval']);
    expect(axisLabel(container, 'x')).toEqual(['Simulated time (min)']);
    expect(axisLabel(container, 'y')).toEqual(['Work in progress (parts)']);
  });

  it('shows the values at the time nearest the pointer, with the interval', () => {
    const { container } = render(
      <TimeSeriesChart
        timesMinutes={times}
        series={[{ name: 'WIP', values: wip, lower: wip.map((v) => v - 1), upper: wip.map((v) => v + 1) }]}
        quantity="Work in progress"
        unit="parts"
        width={WIDTH}
      />,
    );
    const hit = container.querySelector('[data-chart-part="hit-area"]')!;
    hoverAt(hit, Number(hit.getAttribute('width')) * 0.52, 10); // 20.8 min: nearest point is 20 min
    expect(screen.getByRole('tooltip').textContent).toContain('20.0 min');
    expect(tooltipRows()).toEqual({ WIP: '9 parts (8–10)' });
  });

  it('explains an empty series and names mismatched lengths', () => {
    const { rerender } = render(
      <TimeSeriesChart timesMinutes={[]} series={[]} quantity="Work in progress" unit="parts" />,
    );
    expect(screen.getByRole('status').textContent).toMatch(/No work in progress was recorded/);
    rerender(
      <TimeSeriesChart
        timesMinutes={times}
        series={[{ name: 'WIP', values: wip, lower: [1, 2], upper: wip }]}
        quantity="WIP"
        unit="parts"
      />,
    );
    expect(screen.getByRole('alert').textContent).toMatch(/series\[0\]\.lower has 2 points but timesMinutes has 5/);
    rerender(
      <TimeSeriesChart
        timesMinutes={[0, 10, 10, 30, 40]}
        series={[{ name: 'WIP', values: wip }]}
        quantity="WIP"
        unit="parts"
      />,
    );
    expect(screen.getByRole('alert').textContent).toMatch(/timesMinutes\[2\] is 10, not above timesMinutes\[1\]/);
  });
});

const sweep: SweepPoint[] = [
  { x: 8, mean: 150, lower: 145, upper: 155 },
  { x: 10, mean: 190, lower: 184, upper: 196 },
  { x: 12, mean: 205, lower: 199, upper: 211 },
  { x: 14, mean: 207, lower: 200, upper: 214 },
];

describe('CurveWithBand', () => {
  it('draws the band, a point per setting and marks the recommended setting in text', () => {
    const { container } = render(
      <CurveWithBand
        points={sweep}
        xQuantity="Carriers on the track"
        xUnit="count"
        yQuantity="Throughput"
        yUnit="parts/h"
        recommendedX={12}
        recommendedLabel="recommended: 12 carriers"
        width={WIDTH}
      />,
    );
    expect(container.querySelectorAll('[data-chart-part="point"]')).toHaveLength(4);
    expect(container.querySelectorAll('[data-chart-part="band"]')).toHaveLength(1);
    expect(container.querySelector('[data-chart-part="recommended"]')!.textContent).toBe('recommended: 12 carriers');
    expect(legendLabels(container)).toEqual(['mean throughput', '95 % confidence interval', 'recommended setting']);
    expect(axisLabel(container, 'x')).toEqual(['Carriers on the track (count)']);
    expect(axisLabel(container, 'y')).toEqual(['Throughput (parts/h)']);
    // Whole carriers only on the count axis.
    const ticks = Array.from(container.querySelectorAll('[data-chart-part="x-axis"] g text'))
      .map((t) => t.textContent)
      .filter(Boolean);
    expect(ticks.every((t) => /^\d+$/.test(t!))).toBe(true);
  });

  it('shows mean and interval of the nearest setting', () => {
    const { container } = render(
      <CurveWithBand
        points={sweep}
        xQuantity="Carriers on the track"
        xUnit="count"
        yQuantity="Throughput"
        yUnit="parts/h"
        recommendedX={12}
        width={WIDTH}
      />,
    );
    const hit = container.querySelector('[data-chart-part="hit-area"]')!;
    hoverAt(hit, Number(hit.getAttribute('width')) * (2 / 3), 20); // x = 12
    expect(screen.getByRole('tooltip').textContent).toContain('Carriers on the track: 12 (recommended)');
    expect(tooltipRows()).toEqual({ 'Mean throughput': '205 parts/h', Interval: '199–211 parts/h' });
  });

  it('refuses a recommendation that is not a swept point and a mean outside its band', () => {
    const { rerender } = render(
      <CurveWithBand
        points={sweep}
        xQuantity="Carriers"
        xUnit="count"
        yQuantity="Throughput"
        yUnit="parts/h"
        recommendedX={13}
      />,
    );
    expect(screen.getByRole('alert').textContent).toMatch(/recommendedX 13 is not one of the swept points/);
    rerender(
      <CurveWithBand
        points={[sweep[0], { ...sweep[1], lower: 195 }]}
        xQuantity="Carriers"
        xUnit="count"
        yQuantity="Throughput"
        yUnit="parts/h"
      />,
    );
    expect(screen.getByRole('alert').textContent).toMatch(/points\[1\] has its mean 190 outside its band 195–196/);
    rerender(<CurveWithBand points={[]} xQuantity="Carriers" xUnit="count" yQuantity="Throughput" yUnit="parts/h" />);
    expect(screen.getByRole('status').textContent).toMatch(/The sweep has no finished points yet/);
  });
});

describe('TimeSeriesChart screen-reader table', () => {
  it('keeps long series to about a hundred spoken rows and says how it thinned them', () => {
    const long = Array.from({ length: 1000 }, (_, i) => i);
    render(
      <TimeSeriesChart
        timesMinutes={long}
        series={[{ name: 'WIP', values: long.map((i) => i % 7) }]}
        quantity="Work in progress"
        unit="parts"
        width={WIDTH}
      />,
    );
    const table = screen.getByRole('table');
    expect(table.querySelectorAll('tbody tr')).toHaveLength(100);
    expect(table.querySelector('caption')!.textContent).toBe(
      'Work in progress (parts) over simulated time, every 10th point (the CSV export has all)',
    );
    expect(table.querySelector('tbody tr:nth-child(2)')!.textContent).toBe('10.0' + '3');
  });
});
