// A plain sentence on whether the line reaches its target takt, read from the achieved takt's mean
// and its 95 % interval: the mean decides the verdict, the interval says how sure it is.
import type { Interval } from '../../../../shared/results/run-result';
import { formatTakt } from '../../../lib/format-run';

export type TaktVerdict = { tone: 'meets' | 'misses' | 'none'; text: string };

export function taktVerdict(takt: Interval, targetSeconds: number | null): TaktVerdict {
  if (targetSeconds === null) return { tone: 'none', text: 'No target takt is set in this scenario.' };
  const target = formatTakt(targetSeconds);
  if (takt.mean <= targetSeconds) {
    const sure = takt.ciHigh <= targetSeconds;
    return {
      tone: 'meets',
      text: sure
        ? `Meets the target takt of ${target} s, with ${formatTakt(targetSeconds - takt.mean)} s to spare; the whole 95 % interval is within target.`
        : `Meets the target takt of ${target} s on average, but the 95 % interval reaches ${formatTakt(takt.ciHigh)} s: more replications or margin would make it certain.`,
    };
  }
  const by = formatTakt(takt.mean - targetSeconds);
  return {
    tone: 'misses',
    text:
      takt.ciLow > targetSeconds
        ? `Misses the target takt of ${target} s by ${by} s; the whole 95 % interval is above target.`
        : `Misses the target takt of ${target} s by ${by} s on average; the 95 % interval reaches down to ${formatTakt(takt.ciLow)} s.`,
  };
}
