// What each step's stations did, aligned by step across the compared runs: one row per step, one
// bar per run. Each bar carries its figures in words, so it reads without colour.
import { stateColour, stateLabel } from '../../../components/charts';
import type { StationState } from '../../../../shared/results/run-result';
import type { StepRow, StepShares } from '../utils/steps';

const SHOWN: readonly StationState[] = ['processing', 'starved', 'blocked', 'down', 'onBreak'];
const percent = (share: number) => `${Math.round(share * 100)} %`;

function Bar({ shares }: { shares: StepShares }) {
  const words = SHOWN.filter((s) => shares[s] >= 0.005).map((s) => `${stateLabel[s]} ${percent(shares[s])}`);
  return (
    <div className="flex flex-col gap-1">
      {/* SVG fills print even where browsers leave out background colours. */}
      <svg className="h-4 w-full" viewBox="0 0 100 4" preserveAspectRatio="none" aria-hidden>
        {SHOWN.map((s, i) => {
          const x = SHOWN.slice(0, i).reduce((sum, before) => sum + shares[before] * 100, 0);
          return <rect key={s} x={x} y={0} width={shares[s] * 100} height={4} fill={stateColour[s]} />;
        })}
        <rect
          x={0}
          y={0}
          width={100}
          height={4}
          fill="none"
          stroke="currentColor"
          strokeWidth={0.4}
          vectorEffect="non-scaling-stroke"
        />
      </svg>
      <p className="text-xs text-ink-soft">
        {words.join(' · ')}
        {shares.stations > 1 && ` (mean of ${shares.stations} stations)`}
      </p>
    </div>
  );
}

export function StepStateBars({ rows, labels }: { rows: readonly StepRow[]; labels: readonly string[] }) {
  return (
    <div className="flex flex-col gap-3" data-testid="step-state-bars">
      <div className="flex flex-wrap gap-4 text-xs text-ink-soft" aria-hidden>
        {SHOWN.map((s) => (
          <span key={s} className="flex items-center gap-1">
            <svg className="size-3" viewBox="0 0 12 12">
              <rect x={0.5} y={0.5} width={11} height={11} fill={stateColour[s]} stroke="currentColor" />
            </svg>
            {stateLabel[s]}
          </span>
        ))}
      </div>
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Share of time in each state, by step and run</caption>
        <thead>
          <tr>
            <th scope="col" className="w-40 border-b border-ink-faint/40 px-2 py-1 text-left text-ink-soft">
              Step
            </th>
            {labels.map((label) => (
              <th key={label} scope="col" className="border-b border-ink-faint/40 px-2 py-1 text-left text-ink-soft">
                {label}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.stepId} className="break-inside-avoid">
              <th scope="row" className="border-b border-paper-sunk px-2 py-2 text-left align-top font-semibold">
                {row.name}
              </th>
              {row.shares.map((shares, i) => (
                <td key={labels[i]} className="border-b border-paper-sunk px-2 py-2 align-top">
                  {shares ? <Bar shares={shares} /> : <span className="text-ink-soft">no station for this step</span>}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
