// Headline figures side by side: each run's mean with its 95 % interval, and under every run after the
// first its difference from the first with the interval on that difference. "Significant" is written
// out, so the verdict reads in black and white.
import { Table, Td, Th } from '../../../components/ui/table';
import type { MeanDifference } from '../../../../workers/analysis/compare-means';
import { isBetter, METRICS, type Comparison, type Metric } from '../utils/comparison';
import { formatNumber, formatSigned } from '../../../lib/format-number';

function DifferenceCell({ metric, d }: { metric: Metric; d: MeanDifference }) {
  if (d.unavailable)
    return <span className="text-ink-soft">{formatSigned(d.difference, metric.decimals)} (no interval)</span>;
  const verdict = d.significant
    ? isBetter(metric, d.difference)
      ? 'better, significant'
      : 'worse, significant'
    : 'not significant';
  return (
    <span className="flex flex-col">
      <span className="tabular-nums">
        {formatSigned(d.difference, metric.decimals)}{' '}
        <span className="text-ink-soft">
          [{formatSigned(d.ciLow, metric.decimals)}, {formatSigned(d.ciHigh, metric.decimals)}]
        </span>
      </span>
      <span
        className={`text-xs font-semibold ${d.significant ? 'text-ink' : 'text-ink-soft'}`}
        data-verdict={d.significant ? 'significant' : 'not-significant'}
      >
        {d.significant ? '● ' : '○ '}
        {verdict}
      </span>
    </span>
  );
}

export function HeadlineTable({ comparison }: { comparison: Comparison }) {
  const [reference] = comparison.figures;
  return (
    <Table
      caption="Headline figures with 95 % intervals and differences from the first run"
      data-testid="headline-table"
    >
      <thead>
        <tr>
          <Th>Figure</Th>
          {comparison.figures.map((f, i) => (
            <Th key={f.run.id} className="min-w-44">
              {f.run.label}
              {i === 0 && <span className="block text-xs font-normal">reference</span>}
            </Th>
          ))}
        </tr>
      </thead>
      <tbody>
        {METRICS.map((metric) => (
          <tr key={metric.key}>
            <Th scope="row" className="font-semibold text-ink">
              {metric.label} <span className="block text-xs font-normal text-ink-soft">{metric.unit}</span>
            </Th>
            {comparison.figures.map((f) => {
              const v = f.values[metric.key];
              return (
                <Td key={f.run.id}>
                  <span className="block font-semibold tabular-nums">{formatNumber(v.mean, metric.decimals)}</span>
                  <span className="block text-xs text-ink-soft tabular-nums">
                    95 % {formatNumber(v.ciLow, metric.decimals)} – {formatNumber(v.ciHigh, metric.decimals)}
                  </span>
                  {f.differences && (
                    <span className="mt-1 block border-t border-paper-sunk pt-1 text-sm">
                      <span className="sr-only">Difference from {reference.run.label}: </span>
                      <DifferenceCell metric={metric} d={f.differences[metric.key]} />
                    </span>
                  )}
                </Td>
              );
            })}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
