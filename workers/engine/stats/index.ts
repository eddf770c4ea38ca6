// Statistics that observe a run: everything here updates incrementally in constant memory.
export { Welford } from './welford';
export { TimeWeightedMean } from './time-weighted-mean';
export { StreamingHistogram, type HistogramSnapshot } from './histogram';
export { studentT95, tQuantile, type ConfidenceInterval } from './student-t';
