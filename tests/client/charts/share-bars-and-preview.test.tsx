import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { DistributionPreview } from '../../../src/components/charts/DistributionPreview';
import { ShareBars } from '../../../src/components/charts/ShareBars';
import { axisLabel, hoverAt, legendLabels, tooltipRows, WIDTH } from './chart-test-helpers';

describe('ShareBars', () => {
  it('splits each carrier bar into working, moving and waiting with the exact shares on hover', () => {
    const { container } = render(
      <ShareBars
        items={[
          { id: 'all', label: 'All carriers', moving: 0.3, waiting: 0.25, working: 0.45 },
          { id: 'c7', label: 'Carrier 7', moving: 0.5, waiting: 0, working: 0.5 },
        ]}
        width={WIDTH}
      />,
    );
    expect(container.querySelectorAll('rect[data-category]')).toHaveLength(5);
    expect(legendLabels(container)).toEqual(['working (in a station)', 'moving', 'waiting (queued or blocked)']);
    expect(axisLabel(container, 'x')).toEqual(['Share of carrier time after warm-up (%)']);
    hoverAt(container.querySelector('[data-item="all"] rect[data-category="moving"]')!, 1, 1);
    expect(tooltipRows()).toEqual({
      'working (in a station)': '45.0%',
      moving: '30.0%',
      'waiting (queued or blocked)': '25.0%',
    });
  });

  it('explains missing statistics and names an impossible share', () => {
    const { rerender } = render(<ShareBars items={[]} />);
    expect(screen.getByRole('status').textContent).toMatch(/the run moved no carriers after warm-up/);
    rerender(<ShareBars items={[{ id: 'a', label: 'All', moving: 0.5, waiting: 1.2, working: 0 }]} />);
    expect(screen.getByRole('alert').textContent).toMatch(/items\[0\]\.waiting is 1\.2; a share lies between 0 and 1/);
  });
});

describe('DistributionPreview', () => {
  it('draws the estimated shape of samples and speaks its range and mean', () => {
    const { container } = render(<DistributionPreview label="Cycle time of Press" samples={[8, 9, 9.5, 10, 12]} />);
    const svg = screen.getByRole('img');
    expect(svg.getAttribute('aria-label')).toBe('Cycle time of Press: from 8 to 12 s, mean 9.7 s');
    expect(container.querySelectorAll('[data-chart-part="shape"]')).toHaveLength(1);
    expect(container.querySelector('title')!.textContent).toBe(svg.getAttribute('aria-label'));
  });

  it('draws a density function over its domain, its mean from the curve', () => {
    const triangle = (x: number) => (x < 2 || x > 4 ? 0 : 1 - Math.abs(x - 3));
    render(<DistributionPreview label="Fitting" density={triangle} domain={[2, 4]} />);
    expect(screen.getByRole('img').getAttribute('aria-label')).toBe('Fitting: from 2 to 4 s, mean 3 s');
  });

  it('says "no data" without samples and names a missing domain', () => {
    const { rerender } = render(<DistributionPreview label="Unload" samples={[]} />);
    expect(screen.getByRole('img').getAttribute('aria-label')).toBe('Unload: no data');
    rerender(<DistributionPreview label="Unload" density={() => 1} />);
    expect(screen.getByRole('alert').textContent).toMatch(/domain is needed to draw a density function/);
  });
});

describe('DistributionPreview with a large time study', () => {
  it('keeps the exact range and mean of all samples (mean 12.495) while drawing the shape from a thinned set', () => {
    const samples = Array.from({ length: 100_000 }, (_, i) => 10 + (i % 500) / 100);
    render(<DistributionPreview label="Study" samples={samples} />);
    expect(screen.getByRole('img').getAttribute('aria-label')).toBe('Study: from 10 to 14.99 s, mean 12.49 s');
  });
});
