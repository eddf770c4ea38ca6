// Where carriers are along each lane over time: time runs left to right, position up the panel,
// darker means a carrier holds that place a larger share of the time. Lanes stack as small
// multiples on one time axis and one colour scale.
import { scaleLinear } from 'd3';
import { useMemo, type MouseEvent } from 'react';
import { AxisBottom, AxisLeft, linearTicks } from './Axes';
import { ChartFrame, ChartMessage, plotWidthOf, type Margin } from './ChartFrame';
import type { ChartTable } from './chart-table';
import { formatNumber, formatOne, formatShare } from './format';
import { HatchPattern, useSvgId } from './patterns';
import { ink } from './palette';
import {
  laneGrid,
  laneImage,
  occupancyColour,
  positionBinsOf,
  spaceTimeProblem,
  type LaneGrid,
  type SpaceTimeLane,
} from './space-time-grid';
import { localPoint, useChartShell } from './useChartShell';

export type { SpaceTimeLane } from './space-time-grid';

export interface SpaceTimeHeatmapProps {
  lanes: readonly SpaceTimeLane[];
  timeBinSeconds: number;
  /** Simulated time at the start of the first bin. */
  startMinutes?: number;
  /** Statistics start here; the earlier part is shaded. */
  warmupMinutes?: number;
  title?: string;
  /** Height of each lane's panel in px. */
  laneHeight?: number;
  width?: number;
  exportName?: string;
}

const MARGIN: Margin = { top: 22, right: 16, bottom: 56, left: 70 };
const LANE_GAP = 30;

export function SpaceTimeHeatmap(props: SpaceTimeHeatmapProps) {
  const {
    lanes,
    timeBinSeconds,
    startMinutes = 0,
    warmupMinutes,
    title = 'Carriers along the track over time',
    laneHeight = 130,
  } = props;
  const shell = useChartShell(props.width);
  const warmupId = useSvgId('warmup');
  const plotWidth = plotWidthOf(shell.width, MARGIN);
  const problem = useMemo(() => spaceTimeProblem(lanes, timeBinSeconds), [lanes, timeBinSeconds]);
  const grids = useMemo(
    () => (problem ? [] : lanes.map((lane) => laneGrid(lane, plotWidth))),
    [lanes, plotWidth, problem],
  );
  const images = useMemo(() => grids.map(laneImage), [grids]);

  if (problem)
    return <ChartMessage title={title} tone="problem" message={`This heatmap cannot be drawn: ${problem}.`} />;
  if (grids.length === 0 || grids[0].timeBins === 0) {
    return (
      <ChartMessage
        title={title}
        tone="empty"
        message="No track occupancy was recorded: the run has no lanes or ended before its first time bin."
      />
    );
  }

  const binMinutes = timeBinSeconds / 60;
  const endMinutes = startMinutes + grids[0].timeBins * binMinutes;
  const x = scaleLinear().domain([startMinutes, endMinutes]).range([0, plotWidth]);
  const panelTop = (i: number) => i * (laneHeight + LANE_GAP);
  const plotHeight = panelTop(grids.length) - LANE_GAP;
  const warmupEnd =
    warmupMinutes !== undefined && warmupMinutes > startMinutes ? Math.min(warmupMinutes, endMinutes) : null;

  const showCell = (event: MouseEvent<SVGRectElement>, grid: LaneGrid) => {
    const point = localPoint(event);
    const column = Math.min(grid.columns - 1, Math.max(0, Math.floor((point.x / plotWidth) * grid.columns)));
    const fromTop = Math.min(grid.positions - 1, Math.max(0, Math.floor((point.y / laneHeight) * grid.positions)));
    const position = grid.positions - 1 - fromTop;
    const t0 = startMinutes + column * grid.merge * binMinutes;
    const t1 = Math.min(endMinutes, t0 + grid.merge * binMinutes);
    const p0 = position * grid.lane.positionBinMm;
    const p1 = Math.min(grid.lane.lengthMm, p0 + grid.lane.positionBinMm);
    shell.showTooltip(event, {
      title: grid.lane.laneName,
      rows: [
        ['Time', `${formatOne(t0)}–${formatOne(t1)} min`],
        ['Position', `${formatNumber(p0)}–${formatNumber(p1)} mm`],
        [
          grid.merge > 1 ? `Occupied (mean of ${grid.merge} bins)` : 'Occupied',
          formatShare(grid.cells[column * grid.positions + position]),
        ],
      ],
    });
  };

  return (
    <ChartFrame
      shell={shell}
      title={title}
      subtitle={`${grids.length} lane${grids.length > 1 ? 's' : ''}, ${formatNumber(binMinutes)} min × ${lanes
        .map((l) => `${formatNumber(l.positionBinMm)} mm`)
        .filter((v, i, all) => all.indexOf(v) === i)
        .join(' / ')} cells`}
      summary={spaceTimeSummary(grids, startMinutes, endMinutes)}
      legend={{
        kind: 'ramp',
        label: 'Share of time a carrier occupies this place',
        interpolate: occupancyColour,
        domain: [0, 1],
        tickFormat: (v) => formatShare(v).replace('.0%', '%'),
        extras:
          warmupEnd === null
            ? []
            : [
                {
                  label: `warm-up, ${formatNumber(warmupEnd - startMinutes)} min (not in statistics)`,
                  swatch: { kind: 'box', fill: `url(#${warmupId})`, stroke: ink.DEFAULT },
                },
              ],
      }}
      margin={MARGIN}
      plotHeight={plotHeight}
      table={occupancyTable(grids, startMinutes, binMinutes, warmupEnd)}
      csv={() => occupancyCsv(lanes, startMinutes, binMinutes)}
      exportName={props.exportName ?? 'space-time-heatmap'}
      defs={<HatchPattern id={warmupId} colour={ink.faint} background="rgba(255,255,255,0.55)" spacing={7} />}
    >
      {grids.map((grid, i) => {
        const y = scaleLinear().domain([0, grid.lane.lengthMm]).range([laneHeight, 0]);
        return (
          <g key={grid.lane.laneName + i} transform={`translate(0,${panelTop(i)})`} data-lane={grid.lane.laneName}>
            <text y={-8} fontSize={13} fontWeight={600} fill={ink.DEFAULT}>
              {grid.lane.laneName}
              <tspan fontWeight={400} fill={ink.soft}>{`  ${formatNumber(grid.lane.lengthMm)} mm`}</tspan>
            </text>
            <image
              href={images[i]}
              width={plotWidth}
              height={laneHeight}
              preserveAspectRatio="none"
              style={{ imageRendering: 'pixelated' }}
              data-columns={grid.columns}
              data-rows={grid.positions}
            />
            {warmupEnd !== null && (
              <g pointerEvents="none" data-chart-part="warmup">
                <rect width={x(warmupEnd)} height={laneHeight} fill={`url(#${warmupId})`} />
                <line x1={x(warmupEnd)} x2={x(warmupEnd)} y2={laneHeight} stroke={ink.DEFAULT} strokeDasharray="4 3" />
              </g>
            )}
            <rect width={plotWidth} height={laneHeight} fill="none" stroke={ink.faint} />
            <AxisLeft
              ticks={linearTicks(y, laneHeight / 35)}
              height={laneHeight}
              label={i === 0 ? 'Position (mm)' : ''}
              labelOffset={56}
            />
            <rect
              width={plotWidth}
              height={laneHeight}
              fill="transparent"
              data-chart-part="hit-area"
              onMouseMove={(event) => showCell(event, grid)}
              onMouseLeave={shell.hideTooltip}
            />
          </g>
        );
      })}
      <AxisBottom
        ticks={linearTicks(x, plotWidth / 80)}
        width={plotWidth}
        plotHeight={plotHeight}
        label="Simulated time (min)"
      />
    </ChartFrame>
  );
}

function spaceTimeSummary(grids: readonly LaneGrid[], start: number, end: number): string {
  const busiest = grids.map((grid) => {
    let best = 0;
    let bestShare = -1;
    for (let p = 0; p < grid.positions; p++) {
      let sum = 0;
      for (let c = 0; c < grid.columns; c++) sum += grid.cells[c * grid.positions + p];
      if (sum > bestShare) [best, bestShare] = [p, sum];
    }
    const from = best * grid.lane.positionBinMm;
    return `${grid.lane.laneName} is busiest at ${formatNumber(from)}–${formatNumber(Math.min(grid.lane.lengthMm, from + grid.lane.positionBinMm))} mm (mean ${formatShare(bestShare / grid.columns)} occupied)`;
  });
  return `Occupancy of ${grids.length} lane${grids.length > 1 ? 's' : ''} from ${formatOne(start)} to ${formatOne(end)} min. ${busiest.join('; ')}.`;
}

/** Per lane and position: the mean after warm-up and the highest share, which is what a reader scans for. */
function occupancyTable(
  grids: readonly LaneGrid[],
  start: number,
  binMinutes: number,
  warmupEnd: number | null,
): ChartTable {
  const rows: (string | number)[][] = [];
  for (const { lane, positions, timeBins } of grids) {
    const firstBin = warmupEnd === null ? 0 : Math.min(timeBins, Math.ceil((warmupEnd - start) / binMinutes - 1e-9));
    for (let p = 0; p < positions; p++) {
      let sum = 0;
      let peak = 0;
      let peakBin = firstBin;
      for (let t = firstBin; t < timeBins; t++) {
        const share = lane.values[t * positions + p];
        sum += share;
        if (share > peak) [peak, peakBin] = [share, t];
      }
      const from = p * lane.positionBinMm;
      rows.push([
        lane.laneName,
        `${formatNumber(from)}–${formatNumber(Math.min(lane.lengthMm, from + lane.positionBinMm))}`,
        formatShare(timeBins > firstBin ? sum / (timeBins - firstBin) : 0),
        formatShare(peak),
        formatOne(start + peakBin * binMinutes),
      ]);
    }
  }
  return {
    caption: 'Share of time a carrier occupies each place of each lane, after warm-up',
    columns: ['Lane', 'Position (mm)', 'Mean share', 'Highest share', 'Highest at (min)'],
    rows,
  };
}

function occupancyCsv(lanes: readonly SpaceTimeLane[], start: number, binMinutes: number): ChartTable {
  const rows: (string | number)[][] = [];
  for (const lane of lanes) {
    const positions = positionBinsOf(lane);
    lane.values.forEach((share, index) => {
      const t = Math.floor(index / positions);
      rows.push([lane.laneName, start + t * binMinutes, (index % positions) * lane.positionBinMm, share]);
    });
  }
  return {
    caption: 'Track occupancy',
    columns: ['lane', 'time_start_min', 'position_start_mm', 'occupied_share'],
    rows,
  };
}
