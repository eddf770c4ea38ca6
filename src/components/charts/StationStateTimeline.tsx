// What each station was doing over time: one row per station, each time bin coloured by the state
// that held most of it. Runs of equal bins are merged into one mark; hovering shows all shares.
import { scaleBand, scaleLinear } from 'd3';
import { useMemo, type MouseEvent } from 'react';
import { AxisBottom, bandTicks, linearTicks, TICK_FONT } from './Axes';
import { ChartFrame, ChartMessage, plotWidthOf, type Margin } from './ChartFrame';
import type { ChartTable } from './chart-table';
import { estimateTextWidth, formatOne, formatShare } from './format';
import type { LegendItem } from './Legend';
import { ink, stateColour, stateCsvName, stateLabel, type StationState } from './palette';
import { dominantState, groupSumProblem, statesProblem, type StationRef } from './station-states';
import { localPoint, useChartShell } from './useChartShell';
import { checkPositive, firstProblem } from './validate';

export interface StationStateTimelineProps {
  stations: readonly StationRef[];
  timeBinSeconds: number;
  /** Order of the shares inside each bin. */
  states: readonly StationState[];
  /** Shares laid out [station][timeBin][state]. */
  shares: readonly number[];
  startMinutes?: number;
  warmupMinutes?: number;
  title?: string;
  rowHeight?: number;
  width?: number;
  exportName?: string;
}

export interface StateRun {
  station: number;
  fromBin: number;
  toBin: number;
  state: StationState;
}

export function stateRuns(
  stationCount: number,
  binCount: number,
  states: readonly StationState[],
  shares: readonly number[],
): StateRun[] {
  const runs: StateRun[] = [];
  for (let station = 0; station < stationCount; station++) {
    let open: StateRun | null = null;
    for (let bin = 0; bin < binCount; bin++) {
      const state = dominantState(shares, (station * binCount + bin) * states.length, states);
      if (open && state === open.state) {
        open.toBin = bin + 1;
        continue;
      }
      if (open) runs.push(open);
      open = state ? { station, fromBin: bin, toBin: bin + 1, state } : null;
    }
    if (open) runs.push(open);
  }
  return runs;
}

function timelineProblem(props: StationStateTimelineProps) {
  const { stations, states, shares } = props;
  return firstProblem(
    () => checkPositive(props.timeBinSeconds, 'timeBinSeconds'),
    () => statesProblem(states),
    () =>
      stations.length > 0 && shares.length % (stations.length * states.length) !== 0
        ? `shares has ${shares.length} entries, not a whole number of time bins for ${stations.length} stations × ${states.length} states`
        : null,
    () => {
      const bins = stations.length ? shares.length / (stations.length * states.length) : 0;
      return groupSumProblem(shares, states.length, (g) => `stations[${Math.floor(g / bins)}] time bin ${g % bins}`);
    },
  );
}

export function StationStateTimeline(props: StationStateTimelineProps) {
  const {
    stations,
    states,
    shares,
    timeBinSeconds,
    startMinutes = 0,
    warmupMinutes,
    title = 'Station states over time',
    rowHeight = 26,
  } = props;
  const shell = useChartShell(props.width);
  const problem = useMemo(() => timelineProblem(props), [props]);
  const bins = problem || stations.length === 0 ? 0 : shares.length / (stations.length * states.length);
  const runs = useMemo(
    () => (bins ? stateRuns(stations.length, bins, states, shares) : []),
    [bins, stations.length, states, shares],
  );

  if (problem)
    return <ChartMessage title={title} tone="problem" message={`This timeline cannot be drawn: ${problem}.`} />;
  if (bins === 0)
    return (
      <ChartMessage
        title={title}
        tone="empty"
        message="No station states were recorded: the line has no stations or the run ended before its first time bin."
      />
    );

  const nameWidth = Math.min(170, Math.max(...stations.map((s) => estimateTextWidth(s.name, TICK_FONT))) + 14);
  const margin: Margin = { top: 4, right: 16, bottom: 56, left: nameWidth };
  const plotWidth = plotWidthOf(shell.width, margin);
  const binMinutes = timeBinSeconds / 60;
  const endMinutes = startMinutes + bins * binMinutes;
  const x = scaleLinear().domain([startMinutes, endMinutes]).range([0, plotWidth]);
  const y = scaleBand<string>()
    .domain(stations.map((_, i) => String(i)))
    .range([0, stations.length * rowHeight])
    .paddingInner(0.18);
  const plotHeight = stations.length * rowHeight;
  const showWarmup = warmupMinutes !== undefined && warmupMinutes > startMinutes && warmupMinutes < endMinutes;
  const binX = (bin: number) => x(startMinutes + bin * binMinutes);

  const showBin = (event: MouseEvent<SVGRectElement>, station: number) => {
    const bin = Math.min(bins - 1, Math.max(0, Math.floor((localPoint(event).x / plotWidth) * bins)));
    const offset = (station * bins + bin) * states.length;
    const t0 = startMinutes + bin * binMinutes;
    shell.showTooltip(event, {
      title: `${stations[station].name}, ${formatOne(t0)}–${formatOne(t0 + binMinutes)} min`,
      rows: states.map((state, s) => [stateLabel[state], formatShare(shares[offset + s])] as const),
    });
  };

  return (
    <ChartFrame
      shell={shell}
      title={title}
      subtitle={`Each ${formatOne(binMinutes)} min bin shows its main state`}
      summary={timelineSummary(stations, states, shares, bins)}
      legend={{
        kind: 'swatches',
        items: [
          ...states.map((state): LegendItem => ({
            label: stateLabel[state],
            swatch: { kind: 'box', fill: stateColour[state] },
          })),
          ...(showWarmup
            ? [
                {
                  label: 'end of warm-up',
                  swatch: { kind: 'line', colour: ink.DEFAULT, dash: '4 3', strokeWidth: 1.5 },
                } as LegendItem,
              ]
            : []),
        ],
      }}
      margin={margin}
      plotHeight={plotHeight}
      table={stateTotalsTable(stations, states, shares, bins)}
      csv={() => timelineCsv(stations, states, shares, bins, startMinutes, binMinutes)}
      exportName={props.exportName ?? 'station-state-timeline'}
    >
      <g data-chart-part="marks">
        {runs.map((run) => (
          <rect
            key={`${run.station}-${run.fromBin}`}
            x={binX(run.fromBin)}
            y={y(String(run.station))}
            width={Math.max(0.5, binX(run.toBin) - binX(run.fromBin))}
            height={y.bandwidth()}
            fill={stateColour[run.state]}
            data-state={run.state}
          />
        ))}
      </g>
      {showWarmup && (
        <line
          x1={x(warmupMinutes)}
          x2={x(warmupMinutes)}
          y1={-3}
          y2={plotHeight + 3}
          stroke={ink.DEFAULT}
          strokeWidth={1.5}
          strokeDasharray="4 3"
          pointerEvents="none"
          data-chart-part="warmup"
        />
      )}
      {stations.map((station, i) => (
        <rect
          key={station.id}
          y={y(String(i))}
          width={plotWidth}
          height={y.bandwidth()}
          fill="transparent"
          data-chart-part="hit-area"
          data-station={station.id}
          onMouseMove={(event) => showBin(event, i)}
          onMouseLeave={shell.hideTooltip}
        />
      ))}
      <g data-chart-part="y-axis">
        {bandTicks(y, (key) => stations[Number(key)].name).map((tick) => (
          <text
            key={tick.label + tick.position}
            x={-8}
            y={tick.position}
            dy="0.35em"
            textAnchor="end"
            fontSize={TICK_FONT}
            fill={ink.DEFAULT}
          >
            {tick.label}
          </text>
        ))}
      </g>
      <AxisBottom
        ticks={linearTicks(x, plotWidth / 80)}
        width={plotWidth}
        plotHeight={plotHeight}
        label="Simulated time (min)"
        labelOffset={34}
      />
    </ChartFrame>
  );
}

function meanShares(
  states: readonly StationState[],
  shares: readonly number[],
  bins: number,
  station: number,
): number[] {
  return states.map((_, s) => {
    let sum = 0;
    for (let bin = 0; bin < bins; bin++) sum += shares[(station * bins + bin) * states.length + s];
    return sum / bins;
  });
}

function timelineSummary(
  stations: readonly StationRef[],
  states: readonly StationState[],
  shares: readonly number[],
  bins: number,
): string {
  const parts = stations.map((station, i) => {
    const means = meanShares(states, shares, bins, i);
    const top = means.indexOf(Math.max(...means));
    return `${station.name} mostly ${stateLabel[states[top]]} (${formatShare(means[top])})`;
  });
  return `States of ${stations.length} stations over ${bins} time bins. ${parts.join('; ')}.`;
}

function stateTotalsTable(
  stations: readonly StationRef[],
  states: readonly StationState[],
  shares: readonly number[],
  bins: number,
): ChartTable {
  return {
    caption: 'Share of the whole run each station spent in each state',
    columns: ['Station', ...states.map((state) => stateLabel[state])],
    rows: stations.map((station, i) => [station.name, ...meanShares(states, shares, bins, i).map(formatShare)]),
  };
}

export function timelineCsv(
  stations: readonly StationRef[],
  states: readonly StationState[],
  shares: readonly number[],
  bins: number,
  start: number,
  binMinutes: number,
): ChartTable {
  const rows: (string | number)[][] = [];
  stations.forEach((station, i) => {
    for (let bin = 0; bin < bins; bin++) {
      const offset = (i * bins + bin) * states.length;
      rows.push([station.id, station.name, start + bin * binMinutes, ...states.map((_, s) => shares[offset + s])]);
    }
  });
  return {
    caption: 'Station states',
    columns: ['station_id', 'station', 'time_start_min', ...states.map((s) => `${stateCsvName(s)}_share`)],
    rows,
  };
}
