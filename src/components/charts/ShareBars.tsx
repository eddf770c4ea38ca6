// How carriers spend their time: moving, waiting (queued or blocked) and at work in a station.
import { ChartMessage } from './ChartFrame';
import { formatShare } from './format';
import { StackedShareBars, type ShareCategory } from './StackedShareBars';
import { checkNamedShares, type Problem } from './validate';

export interface CarrierShareItem {
  id: string;
  /** e.g. "All carriers", "Carrier 7" or a scenario name when comparing. */
  label: string;
  moving: number;
  waiting: number;
  working: number;
}

export interface ShareBarsProps {
  items: readonly CarrierShareItem[];
  title?: string;
  width?: number;
  exportName?: string;
}

const CATEGORIES: readonly (ShareCategory & { key: 'moving' | 'waiting' | 'working' })[] = [
  { key: 'working', label: 'working (in a station)', colour: '#009e73' },
  { key: 'moving', label: 'moving', colour: '#56b4e9' },
  { key: 'waiting', label: 'waiting (queued or blocked)', colour: '#e69f00' },
];

function shareBarsProblem(items: readonly CarrierShareItem[]): Problem {
  for (const [i, item] of items.entries()) {
    const values = CATEGORIES.map((c) => item[c.key]);
    const problem = checkNamedShares(
      CATEGORIES.map((c) => [c.key, item[c.key]] as const),
      `items[${i}]`,
    );
    if (problem) return problem;
    const sum = values.reduce((a, b) => a + b, 0);
    if (sum > 1.005) return `items[${i}] (${item.label}) shares add up to ${sum}, more than 1`;
  }
  return null;
}

export function ShareBars(props: ShareBarsProps) {
  const { items, title = 'How carriers spend their time' } = props;
  const problem = shareBarsProblem(items);
  if (problem) return <ChartMessage title={title} tone="problem" message={`These bars cannot be drawn: ${problem}.`} />;
  if (items.length === 0)
    return (
      <ChartMessage
        title={title}
        tone="empty"
        message="No carrier statistics to show: the run moved no carriers after warm-up."
      />
    );
  const first = items[0];
  return (
    <StackedShareBars
      title={title}
      summary={`${first.label}: working ${formatShare(first.working)}, moving ${formatShare(first.moving)}, waiting ${formatShare(first.waiting)}.`}
      categories={CATEGORIES}
      items={items.map((item) => ({ id: item.id, label: item.label, shares: CATEGORIES.map((c) => item[c.key]) }))}
      axisLabel="Share of carrier time after warm-up (%)"
      tableCaption="Share of time carriers spend working, moving and waiting"
      exportName={props.exportName ?? 'carrier-time-shares'}
      width={props.width}
    />
  );
}
