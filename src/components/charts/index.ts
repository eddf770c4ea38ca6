// Lanewright's chart components: plain typed props in, SVG out. They fetch nothing.
export { SpaceTimeHeatmap, type SpaceTimeHeatmapProps, type SpaceTimeLane } from './SpaceTimeHeatmap';
export { StationStateTimeline, stateRuns, type StationStateTimelineProps } from './StationStateTimeline';
export {
  StationStateBars,
  sortStations,
  type StationStateBarsProps,
  type StationStateBarsStation,
  type StationSortKey,
  type StateShares,
} from './StationStateBars';
export { LineBalanceChart, effectiveCycle, type LineBalanceChartProps, type BalanceStep } from './LineBalanceChart';
export { Histogram, type HistogramProps, type FittedDensity } from './Histogram';
export { TimeSeriesChart, type TimeSeriesChartProps, type TimeSeries } from './TimeSeriesChart';
export { CurveWithBand, type CurveWithBandProps, type SweepPoint } from './CurveWithBand';
export { CurvesWithBands, type CurvesWithBandsProps, type CurveSeries } from './CurvesWithBands';
export type { StopMark } from './StopMarks';
export { ShareBars, type ShareBarsProps, type CarrierShareItem } from './ShareBars';
export { DistributionPreview, type DistributionPreviewProps } from './DistributionPreview';
export { ChartExportMenu } from './ChartExportMenu';
export { STATION_STATES, stateColour, stateLabel, type StationState } from './palette';
export type { StationRef } from './station-states';
export type { ChartTable, ChartCell } from './chart-table';
