// How each station spent its time (processing, starved, blocked, down), with the bottleneck named in
// text beside its bar so it does not depend on colour.
import { ChartMessage } from './ChartFrame';
import { formatShare } from './format';
import { stateColour, stateCsvName, stateLabel, type StationState } from './palette';
import { StackedShareBars, type ShareItem } from './StackedShareBars';
import { checkNamedShares, type Problem } from './validate';

export type StateShares = Partial<Record<StationState, number>> &
  Record<'processing' | 'starved' | 'blocked' | 'down', number>;

export interface StationStateBarsStation {
  id: string;
  name: string;
  shares: StateShares;
}

export type StationSortKey = 'line-order' | 'name' | StationState;

export interface StationStateBarsProps {
  /** In line order; sorting is done here. */
  stations: readonly StationStateBarsStation[];
  bottleneckId?: string | null;
  /** Share of the run in which the bottleneck station was the bottleneck; shown beside the label. */
  bottleneckShare?: number;
  /** Line order, by name, or by one state's share (largest first). */
  sortBy?: StationSortKey;
  title?: string;
  width?: number;
  exportName?: string;
}

const BASE_STATES = ['processing', 'starved', 'blocked', 'down'] as const;
/** Rounding in time-weighted sums leaves shares a hair off 1; past this the data is wrong. */
const SUM_TOLERANCE = 0.005;

export function sortStations(
  stations: readonly StationStateBarsStation[],
  sortBy: StationSortKey,
): StationStateBarsStation[] {
  const sorted = [...stations];
  if (sortBy === 'name') sorted.sort((a, b) => a.name.localeCompare(b.name));
  else if (sortBy !== 'line-order') sorted.sort((a, b) => (b.shares[sortBy] ?? 0) - (a.shares[sortBy] ?? 0));
  return sorted;
}

function barsProblem(stations: readonly StationStateBarsStation[], states: readonly StationState[]): Problem {
  for (const [i, station] of stations.entries()) {
    const values = states.map((state) => station.shares[state] ?? 0);
    const problem = checkNamedShares(
      states.map((state, s) => [state, values[s]] as const),
      `stations[${i}].shares`,
    );
    if (problem) return problem;
    const sum = values.reduce((a, b) => a + b, 0);
    if (Math.abs(sum - 1) > SUM_TOLERANCE)
      return `stations[${i}].shares (${station.name}) add up to ${sum}; the states must cover the whole time, adding up to 1`;
  }
  return null;
}

export function StationStateBars(props: StationStateBarsProps) {
  const {
    stations,
    bottleneckId,
    bottleneckShare,
    sortBy = 'line-order',
    title = 'Where each station spends its time',
  } = props;
  const states: StationState[] = stations.some((s) => (s.shares.onBreak ?? 0) > 0)
    ? [...BASE_STATES, 'onBreak']
    : [...BASE_STATES];
  const problem = barsProblem(stations, states);
  if (problem) return <ChartMessage title={title} tone="problem" message={`These bars cannot be drawn: ${problem}.`} />;
  if (stations.length === 0)
    return (
      <ChartMessage title={title} tone="empty" message="No station states to show: the line has no stations yet." />
    );

  const bottleneck = stations.find((s) => s.id === bottleneckId);
  const note =
    bottleneckShare === undefined ? '◀ bottleneck' : `◀ bottleneck (${formatShare(bottleneckShare)} of the time)`;
  const items: ShareItem[] = sortStations(stations, sortBy).map((station) => ({
    id: station.id,
    label: station.name,
    shares: states.map((state) => station.shares[state] ?? 0),
    note: station.id === bottleneckId ? note : undefined,
    shortNote: station.id === bottleneckId ? '◀ bottleneck' : undefined,
    emphasis: station.id === bottleneckId,
  }));
  const busiest = [...stations].sort((a, b) => b.shares.processing - a.shares.processing)[0];

  return (
    <StackedShareBars
      title={title}
      subtitle={
        sortBy === 'line-order'
          ? 'In line order'
          : `Sorted by ${sortBy === 'name' ? 'name' : `${stateLabel[sortBy]} share`}`
      }
      summary={`${stations.length} stations. ${bottleneck ? `The bottleneck is ${bottleneck.name}, processing ${formatShare(bottleneck.shares.processing)} of the time. ` : ''}Busiest: ${busiest.name} (${formatShare(busiest.shares.processing)} processing).`}
      categories={states.map((state) => ({
        key: state,
        label: stateLabel[state],
        colour: stateColour[state],
        csvName: stateCsvName(state),
      }))}
      items={items}
      axisLabel="Share of simulated time after warm-up (%)"
      tableCaption="Share of time each station spent in each state"
      exportName={props.exportName ?? 'station-states'}
      width={props.width}
    />
  );
}
