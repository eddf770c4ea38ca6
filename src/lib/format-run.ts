// How run figures are written everywhere in the client: the same decimals as `npm run simulate`
// prints, so a stored run and the command line read alike for the same revision and seed.
import type { Interval } from '../../shared/results/run-result';

const fixed = (digits: number) =>
  new Intl.NumberFormat('en-GB', { minimumFractionDigits: digits, maximumFractionDigits: digits });
const oneDecimal = fixed(1);
const twoDecimals = fixed(2);
const whole = fixed(0);

export const formatPerHour = (value: number) => oneDecimal.format(value);
export const formatSeconds = (value: number) => oneDecimal.format(value);
export const formatTakt = (value: number) => twoDecimals.format(value);
export const formatParts = (value: number) => whole.format(value);
export const formatMean1 = (value: number) => oneDecimal.format(value);
export const formatMean2 = (value: number) => twoDecimals.format(value);
export const formatPercent = (share: number) => `${oneDecimal.format(share * 100)} %`;

export function formatInterval(interval: Interval, format: (value: number) => string): string {
  return `${format(interval.ciLow)} to ${format(interval.ciHigh)}`;
}
