// Every point of a study with its figures, or the reason it has none.
import { POINT_STATE_WORDS, type PointStatistics } from '../../../../workers/studies/point-statistics';
import type { ConfidenceInterval } from '../../../../workers/engine/stats';
import { Table, Td, Th } from '../../../components/ui/table';

function show(ci: ConfidenceInterval | null, digits = 1): string {
  if (!ci) return '–';
  return `${ci.mean.toFixed(digits)} ± ${ci.halfWidth.toFixed(digits)}`;
}

export function PointTable({ stats }: { stats: PointStatistics[] }) {
  return (
    <Table caption="Figures of every point: means with 95 % interval half-widths">
      <thead>
        <tr>
          <Th>Point</Th>
          <Th>State</Th>
          <Th className="text-right">Throughput (parts/h)</Th>
          <Th className="text-right">WIP (parts)</Th>
          <Th className="text-right">Lead time (s)</Th>
        </tr>
      </thead>
      <tbody>
        {stats.map((s) => (
          <tr key={s.index} data-point-state={s.state}>
            <Td>{s.label}</Td>
            <Td>
              {POINT_STATE_WORDS[s.state]}
              {s.message && <span className="block max-w-md text-xs text-danger">{s.message}</span>}
            </Td>
            <Td className="text-right tabular-nums">{show(s.throughput)}</Td>
            <Td className="text-right tabular-nums">{show(s.wip, 2)}</Td>
            <Td className="text-right tabular-nums">{show(s.leadSeconds, 0)}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
