// Every matched point of the compared studies: each study's throughput with its 95 % interval, and
// under every study after the first its difference from the first with the interval on that
// difference. The verdict is written out, so the table reads in black and white.
import type { MeanDifference } from '../../../../workers/analysis/compare-means';
import { POINT_STATE_WORDS, type PointStatistics } from '../../../../workers/studies/point-statistics';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatNumber, formatSigned } from '../../../lib/format-number';
import type { StudyComparison } from '../utils/study-comparison';

function Figures({ stats }: { stats: PointStatistics }) {
  const ci = stats.throughput;
  if (!ci)
    return (
      <span className="text-ink-soft" data-point-state={stats.state} title={stats.message ?? undefined}>
        {stats.state === 'pending' ? 'not run yet' : POINT_STATE_WORDS[stats.state]}
        {stats.message && <span className="block max-w-56 text-xs">{stats.message}</span>}
      </span>
    );
  return (
    <span className="block tabular-nums">
      <span className="font-semibold">{formatNumber(ci.mean, 1)}</span>{' '}
      <span className="text-xs text-ink-soft">± {formatNumber(ci.halfWidth, 1)}</span>
    </span>
  );
}

function Difference({ d }: { d: MeanDifference }) {
  if (d.unavailable)
    return <span className="text-xs text-ink-soft">{formatSigned(d.difference, 1)} (no interval)</span>;
  return (
    <span className="block text-xs">
      <span className="tabular-nums">
        {formatSigned(d.difference, 1)} [{formatSigned(d.ciLow, 1)}, {formatSigned(d.ciHigh, 1)}]
      </span>{' '}
      <span
        className={d.significant ? 'font-semibold text-ink' : 'text-ink-soft'}
        data-verdict={d.significant ? 'significant' : 'not-significant'}
      >
        {d.significant ? '● significant' : '○ not significant'}, {d.method === 'paired' ? 'paired' : 'Welch'}
      </span>
    </span>
  );
}

export function PointDifferencesTable({ comparison }: { comparison: StudyComparison }) {
  const reference = comparison.studies[0].label;
  return (
    <Table
      caption="Throughput (parts/h) at each point: mean ± 95 % half-width; below, the difference from the first study"
      data-testid="study-differences"
    >
      <thead>
        <tr>
          <Th>{comparison.axis ? comparison.axis.label : 'Point'}</Th>
          {comparison.studies.map((s, i) => (
            <Th key={s.id} className="min-w-40">
              {s.label}
              {i === 0 && <span className="block text-xs font-normal">reference</span>}
            </Th>
          ))}
        </tr>
      </thead>
      <tbody>
        {comparison.rows.map((row) => (
          <tr key={row.key}>
            <Th scope="row" className="font-semibold text-ink">
              {comparison.axis && row.x !== null ? formatNumber(row.x, Number.isInteger(row.x) ? 0 : 2) : row.label}
            </Th>
            {row.cells.map((cell, s) => (
              <Td key={comparison.studies[s].id}>
                {cell ? <Figures stats={cell.stats} /> : <span className="text-ink-soft">not in this study</span>}
                {row.differences[s] && (
                  <span className="mt-1 block border-t border-paper-sunk pt-1">
                    <span className="sr-only">Difference from {reference}: </span>
                    <Difference d={row.differences[s]} />
                  </span>
                )}
              </Td>
            ))}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
