import { render } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { LeadTimeHistogram } from '../../../src/features/results/components/lead-time-histogram';
import { clipHistogram } from '../../../src/features/results/utils/clip-histogram';

// 995 parts: 990 finish within 40 s, five wait out a break and finish 300–305 s after loading.
const counts = [0, 900, 80, 10, ...Array.from({ length: 56 }, () => 0), 5];
const leadTime = { mean: 16, p50: 15, p95: 25, histogram: { binWidthSeconds: 10, counts } };

describe('lead-time histogram clipping', () => {
  it('stops at the bin holding the 99th percentile and gathers the rest in one bar', () => {
    // Cumulative counts 0, 900, 980, 990: the 99th percentile (985.05 of 995 parts) falls in bin 3.
    const clipped = clipHistogram(counts, 10);
    expect(clipped.counts).toEqual([0, 900, 80, 10]);
    expect(clipped.overflow).toEqual({ fromSeconds: 40, count: 5 });
    expect(clipped.total).toBe(995);
  });

  it('leaves a histogram without a long tail whole', () => {
    expect(clipHistogram([3, 50, 40, 7, 0, 0], 2)).toEqual({ counts: [3, 50, 40, 7], overflow: null, total: 100 });
  });

  it('draws the gathered bar and says in the caption where the axis stops', () => {
    const { container } = render(<LeadTimeHistogram leadTime={leadTime} exportName="lead" />);
    const bars = Array.from(container.querySelectorAll('[data-chart-part="marks"] rect'));
    expect(bars.map((bar) => Number(bar.getAttribute('data-count')))).toEqual([0, 900, 80, 10, 5]);
    expect(bars[4].getAttribute('data-overflow')).toBe('true');
    expect(container.querySelector('[data-overflow-label]')?.textContent).toBe('≥ 40 s');
    // The subtitle wraps onto lines of its own, so spaces at the breaks are not in the text.
    const squeeze = (text: string | null) => (text ?? '').replace(/\s+/g, '');
    expect(squeeze(container.textContent)).toContain(
      squeeze('the axis stops at the 99th percentile and the last bar gathers the 5 parts at 40 s or more'),
    );
  });
});
