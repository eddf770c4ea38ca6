// Words for study kinds and states, in one place so lists, pages and tests agree.
import type { StudyKind, StudyStatus } from '../../../../shared/api/studies';

export const KIND_LABELS: Record<StudyKind, string> = {
  carrierSizing: 'Carrier sizing',
  sweep: 'Parameter sweep',
  whatIf: 'Speed-up ranking',
};

export const KIND_HINTS: Record<StudyKind, string> = {
  carrierSizing: 'Run the line at a range of carrier counts and find the smallest fleet that makes (nearly) the most.',
  sweep: 'Vary one or two numbers of the scenario over a list or a range and see throughput change.',
  whatIf: 'Shorten each station’s cycle time in turn by a share and rank the stations by the throughput gained.',
};

export const STATUS_LABELS: Record<StudyStatus, string> = {
  running: 'Running',
  done: 'Done',
  cancelled: 'Cancelled',
  failedPoints: 'Done, some points failed',
};
