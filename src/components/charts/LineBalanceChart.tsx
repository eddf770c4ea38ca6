// Line balance: each step's effective cycle time (mean ÷ parallel stations) against the takt the
// line must reach. Steps over takt are hatched and outlined, so they stand out without colour.
import { max, scaleBand, scaleLinear } from 'd3';
import type { MouseEvent } from 'react';
import { AxisBottom, AxisLeft, bandTicks, linearTicks, TICK_FONT } from './Axes';
import { ChartFrame, ChartMessage, plotWidthOf, type Margin } from './ChartFrame';
import type { LegendItem } from './Legend';
import { estimateTextWidth, formatShare, formatTwo } from './format';
import { HatchPattern, useSvgId } from './patterns';
import { ink, paper } from './palette';
import { useChartShell } from './useChartShell';
import { checkFinite, checkPositive, firstProblem, type Problem } from './validate';

export interface BalanceStep {
  id: string;
  name: string;
  /** Mean cycle time of one station of this step. */
  meanCycleSeconds: number;
  sdCycleSeconds: number;
  /** Stations sharing the step's work (parallel positions or lanes). */
  parallelStations: number;
}

export interface LineBalanceChartProps {
  steps: readonly BalanceStep[];
  taktSeconds: number;
  title?: string;
  plotHeight?: number;
  width?: number;
  exportName?: string;
}

const BAR = '#0072b2';
const OVER = '#d55e00';

export const effectiveCycle = (step: BalanceStep) => step.meanCycleSeconds / step.parallelStations;

function balanceProblem(steps: readonly BalanceStep[], taktSeconds: number): Problem {
  return firstProblem(
    () => checkPositive(taktSeconds, 'taktSeconds'),
    ...steps.map(
      (step, i) => () =>
        firstProblem(
          () => checkFinite(step.meanCycleSeconds, `steps[${i}].meanCycleSeconds`),
          () =>
            step.meanCycleSeconds < 0
              ? `steps[${i}].meanCycleSeconds must be zero or more, got ${step.meanCycleSeconds}`
              : null,
          () => checkFinite(step.sdCycleSeconds, `steps[${i}].sdCycleSeconds`),
          () =>
            step.sdCycleSeconds < 0
              ? `steps[${i}].sdCycleSeconds must be zero or more, got ${step.sdCycleSeconds}`
              : null,
          () =>
            Number.isInteger(step.parallelStations) && step.parallelStations >= 1
              ? null
              : `steps[${i}].parallelStations must be a whole number of at least 1, got ${step.parallelStations}`,
        ),
    ),
  );
}

const stepLabel = (step: BalanceStep) =>
  step.parallelStations > 1 ? `${step.name} ×${step.parallelStations}` : step.name;

export function LineBalanceChart(props: LineBalanceChartProps) {
  const { steps, taktSeconds, title = 'Line balance against takt', plotHeight = 280 } = props;
  const shell = useChartShell(props.width);
  const hatchId = useSvgId('over-takt');
  const problem = balanceProblem(steps, taktSeconds);
  if (problem) return <ChartMessage title={title} tone="problem" message={`This chart cannot be drawn: ${problem}.`} />;
  if (steps.length === 0)
    return (
      <ChartMessage
        title={title}
        tone="empty"
        message="No process steps yet: add stations to the scenario to see their balance against takt."
      />
    );

  const longest = Math.max(...steps.map((step) => estimateTextWidth(stepLabel(step), TICK_FONT)));
  const provisional = plotWidthOf(shell.width, { top: 0, right: 90, bottom: 0, left: 64 }) / steps.length;
  const tilt = longest > provisional * 0.92;
  const margin: Margin = { top: 12, right: 90, bottom: tilt ? Math.min(150, longest * 0.6 + 48) : 56, left: 64 };
  const plotWidth = plotWidthOf(shell.width, margin);
  const x = scaleBand<string>()
    .domain(steps.map((s) => s.id))
    .range([0, plotWidth])
    .padding(0.3);
  const top =
    max([
      taktSeconds,
      ...steps.map((s) => Math.max(s.meanCycleSeconds, effectiveCycle(s) + s.sdCycleSeconds / s.parallelStations)),
    ]) ?? taktSeconds;
  const y = scaleLinear()
    .domain([0, top * 1.08])
    .nice()
    .range([plotHeight, 0]);
  const anyParallel = steps.some((s) => s.parallelStations > 1);
  const over = steps.filter((s) => effectiveCycle(s) > taktSeconds);

  const legendItems: LegendItem[] = [
    { label: 'mean cycle ÷ parallel stations', swatch: { kind: 'box', fill: BAR } },
    { label: 'over takt', swatch: { kind: 'box', fill: `url(#${hatchId})`, stroke: ink.DEFAULT } },
    { label: '±1 sd (÷ parallel stations)', swatch: { kind: 'whisker', colour: ink.DEFAULT } },
    ...(anyParallel
      ? [{ label: 'mean cycle of one station', swatch: { kind: 'diamond', colour: ink.DEFAULT } } as LegendItem]
      : []),
    { label: 'takt', swatch: { kind: 'line', colour: ink.DEFAULT, dash: '6 4', strokeWidth: 2 } },
  ];

  const show = (event: MouseEvent<SVGElement>, step: BalanceStep) => {
    const effective = effectiveCycle(step);
    shell.showTooltip(event, {
      title: step.name,
      rows: [
        ['Mean cycle, one station', `${formatTwo(step.meanCycleSeconds)} s`],
        ['Standard deviation', `${formatTwo(step.sdCycleSeconds)} s`],
        ['Parallel stations', String(step.parallelStations)],
        ['Effective cycle', `${formatTwo(effective)} s`],
        effective > taktSeconds
          ? ['Over takt by', `${formatTwo(effective - taktSeconds)} s`]
          : ['Share of takt', formatShare(effective / taktSeconds)],
      ],
    });
  };

  return (
    <ChartFrame
      shell={shell}
      title={title}
      subtitle={`Takt ${formatTwo(taktSeconds)} s; ${over.length === 0 ? 'every step is within takt' : `${over.length} step${over.length > 1 ? 's' : ''} over takt`}`}
      summary={`${steps.length} steps against a takt of ${formatTwo(taktSeconds)} s. ${over.length === 0 ? 'All steps are within takt.' : `Over takt: ${over.map((s) => `${s.name} (${formatTwo(effectiveCycle(s))} s)`).join(', ')}.`}`}
      legend={{ kind: 'swatches', items: legendItems }}
      margin={margin}
      plotHeight={plotHeight}
      table={{
        caption: `Effective cycle time per step against a takt of ${formatTwo(taktSeconds)} s`,
        columns: [
          'Step',
          'Mean cycle, one station (s)',
          'SD (s)',
          'Parallel stations',
          'Effective cycle (s)',
          'Over takt',
        ],
        rows: steps.map((s) => [
          s.name,
          formatTwo(s.meanCycleSeconds),
          formatTwo(s.sdCycleSeconds),
          s.parallelStations,
          formatTwo(effectiveCycle(s)),
          effectiveCycle(s) > taktSeconds ? 'yes' : 'no',
        ]),
      }}
      csv={() => ({
        caption: 'Line balance',
        columns: ['step_id', 'step', 'mean_cycle_s', 'sd_cycle_s', 'parallel_stations', 'effective_cycle_s', 'takt_s'],
        rows: steps.map((s) => [
          s.id,
          s.name,
          s.meanCycleSeconds,
          s.sdCycleSeconds,
          s.parallelStations,
          effectiveCycle(s),
          taktSeconds,
        ]),
      })}
      exportName={props.exportName ?? 'line-balance'}
      defs={<HatchPattern id={hatchId} colour={OVER} background={paper.raised} spacing={6} />}
    >
      <AxisLeft
        ticks={linearTicks(y, plotHeight / 45)}
        height={plotHeight}
        label="Cycle time (s)"
        gridWidth={plotWidth}
        labelOffset={48}
      />
      <AxisBottom
        ticks={bandTicks(x, (id) => stepLabel(steps.find((s) => s.id === id)!))}
        width={plotWidth}
        plotHeight={plotHeight}
        label="Process step (×n: parallel stations)"
        tilt={tilt}
        labelOffset={tilt ? margin.bottom - 20 : 36}
      />
      {steps.map((step) => {
        const effective = effectiveCycle(step);
        const isOver = effective > taktSeconds;
        const left = x(step.id) ?? 0;
        const centre = left + x.bandwidth() / 2;
        const spread = step.sdCycleSeconds / step.parallelStations;
        return (
          <g
            key={step.id}
            data-step={step.id}
            data-over-takt={isOver ? 'true' : 'false'}
            onMouseMove={(event) => show(event, step)}
            onMouseLeave={shell.hideTooltip}
          >
            <rect
              x={left}
              y={y(effective)}
              width={x.bandwidth()}
              height={plotHeight - y(effective)}
              fill={isOver ? `url(#${hatchId})` : BAR}
              stroke={isOver ? ink.DEFAULT : 'none'}
              strokeWidth={isOver ? 2 : 0}
              data-chart-part="bar"
            />
            {spread > 0 && (
              <path
                d={`M${centre},${y(effective - spread)} V${y(effective + spread)} M${centre - 5},${y(effective - spread)} H${centre + 5} M${centre - 5},${y(effective + spread)} H${centre + 5}`}
                stroke={ink.DEFAULT}
                strokeWidth={1.5}
                fill="none"
                data-chart-part="whisker"
              />
            )}
            {step.parallelStations > 1 && (
              <path
                d={`M${centre},${y(step.meanCycleSeconds) - 6} l6,6 l-6,6 l-6,-6 Z`}
                fill="white"
                stroke={ink.DEFAULT}
                strokeWidth={1.5}
                data-chart-part="raw-mean"
              />
            )}
            <rect
              x={left - (x.step() * x.paddingInner()) / 2}
              width={x.step()}
              height={plotHeight}
              fill="transparent"
              data-chart-part="hit-area"
            />
          </g>
        );
      })}
      <g transform={`translate(0,${y(taktSeconds)})`} pointerEvents="none" data-chart-part="takt">
        <line x2={plotWidth} stroke={ink.DEFAULT} strokeWidth={2} strokeDasharray="6 4" />
        <text x={plotWidth + 6} dy="0.35em" fontSize={12} fontWeight={600} fill={ink.DEFAULT}>
          {`takt ${formatTwo(taktSeconds)} s`}
        </text>
      </g>
    </ChartFrame>
  );
}
