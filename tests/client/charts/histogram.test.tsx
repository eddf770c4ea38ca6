import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { gaussianKde, histogramBins, silvermanBandwidth } from '../../../src/components/charts/density';
import { Histogram } from '../../../src/components/charts/Histogram';
import { axisLabel, hoverAt, legendLabels, tooltipRows, WIDTH } from './chart-test-helpers';

const samples = [4.1, 4.4, 4.9, 5.0, 5.2, 5.3, 5.5, 5.9, 6.4, 7.8];

describe('histogram bins and densities', () => {
  it('puts every sample in exactly one bin of equal width', () => {
    const bins = histogramBins(samples, 4);
    expect(bins.reduce((sum, b) => sum + b.count, 0)).toBe(samples.length);
    const widths = new Set(bins.map((b) => +(b.x1 - b.x0).toFixed(9)));
    expect(widths.size).toBe(1);
    expect(bins[0].x0).toBeLessThanOrEqual(4.1);
    expect(bins[bins.length - 1].x1).toBeGreaterThan(7.8);
  });

  it("computes Silverman's rule-of-thumb bandwidth", () => {
    // Silverman, "Density Estimation for Statistics and Data Analysis", 1986, eq. (3.31):
    // h = 0.9 · min(s, IQR/1.34) · n^(−1/5). For 1..10: s = 3.02765, IQR (linear quantiles) = 4.5,
    // IQR/1.34 = 3.35821, so h = 0.9 · 3.02765 · 10^(−0.2) = 1.71931.
    expect(silvermanBandwidth([1, 2, 3, 4, 5, 6, 7, 8, 9, 10])).toBeCloseTo(1.71931, 4);
  });

  it('draws the Gaussian kernel density: one sample at 0 with bandwidth 1 is the standard normal density', () => {
    // φ(0) = 1/√(2π) = 0.398942, φ(1) = 0.241971 (Abramowitz & Stegun 1964, table 26.1).
    const density = gaussianKde([0], 1);
    expect(density(0)).toBeCloseTo(0.398942, 6);
    expect(density(1)).toBeCloseTo(0.241971, 6);
  });
});

describe('Histogram', () => {
  it('draws one bar per bin with heights proportional to the counts', () => {
    const { container } = render(
      <Histogram values={samples} quantity="Lead time" unit="min" binCount={4} width={WIDTH} />,
    );
    const bars = Array.from(container.querySelectorAll('[data-chart-part="marks"] rect'));
    const bins = histogramBins(samples, 4);
    expect(bars).toHaveLength(bins.length);
    const perSample = Number(bars[0].getAttribute('height')) / bins[0].count;
    bars.forEach((bar, i) => expect(Number(bar.getAttribute('height'))).toBeCloseTo(bins[i].count * perSample, 6));
    expect(axisLabel(container, 'x')).toEqual(['Lead time (min)']);
    expect(axisLabel(container, 'y')).toEqual(['Samples (count)']);
  });

  it('overlays fitted densities at count scale with a legend entry each', () => {
    const uniform = (x: number) => (x >= 4 && x <= 8 ? 0.25 : 0);
    const { container } = render(
      <Histogram
        values={samples}
        quantity="Lead time"
        unit="min"
        binCount={4}
        fits={[{ label: 'uniform 4–8 min', pdf: uniform }]}
        width={WIDTH}
      />,
    );
    expect(container.querySelectorAll('[data-chart-part="fit"]')).toHaveLength(1);
    expect(legendLabels(container)).toEqual(['samples (n = 10)', 'uniform 4–8 min']);
    const bar = container.querySelector('[data-chart-part="marks"] rect')!;
    hoverAt(bar, 3, 3);
    const bins = histogramBins(samples, 4);
    const width = bins[0].x1 - bins[0].x0;
    // Expected count in a bin = density × n × bin width.
    expect(tooltipRows()['uniform 4–8 min expects']).toBe(String(+(0.25 * 10 * width).toPrecision(4)));
    expect(tooltipRows()['Samples']).toBe(String(bins[0].count));
  });

  it('explains that there are no samples, and names a bad sample', () => {
    const { rerender } = render(<Histogram values={[]} quantity="Lead time" unit="min" />);
    expect(screen.getByRole('status').textContent).toMatch(/No lead time samples to show yet/);
    rerender(<Histogram values={[1, 2, Number.POSITIVE_INFINITY]} quantity="Lead time" unit="min" />);
    expect(screen.getByRole('alert').textContent).toMatch(/values\[2\] must be a finite number, got Infinity/);
  });
});

describe('Histogram with a large time study', () => {
  it('draws 150 000 samples without exhausting the call stack', () => {
    const values = Array.from({ length: 150_000 }, (_, i) => 5 + (i % 1000) / 100);
    render(<Histogram values={values} quantity="Cycle time" unit="s" width={WIDTH} />);
    expect(screen.getByRole('img').getAttribute('aria-label')).toContain('samples from 5 to 14.99 s');
  });
});
