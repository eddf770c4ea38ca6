// The readable summary `npm run simulate` prints without --json.
import { transferShares, type RunResult } from '../../shared/results/run-result';

const pct = (x: number) => `${(x * 100).toFixed(1)}%`.padStart(7);
const num = (x: number, digits = 1) => x.toFixed(digits);
const interval = (i: { mean: number; ciLow: number; ciHigh: number }, digits = 1) =>
  `${num(i.mean, digits)}  (95% CI ${num(i.ciLow, digits)} to ${num(i.ciHigh, digits)})`;

export function formatTable(r: RunResult): string {
  const lines = [
    `${r.scenarioName} — ${r.settings.replications} replication(s) of ${r.observedHours} h after ${r.settings.warmupMinutes} min warm-up, seed ${r.seed}, engine ${r.engineVersion}`,
    '',
    `throughput     ${interval(r.throughputPerHour)} parts/h`,
    `takt           ${interval(r.taktSeconds, 2)} s${r.targetTaktSeconds !== null ? `   (target ${r.targetTaktSeconds} s)` : ''}`,
    `annual output  ${interval(r.annualOutput, 0)} parts over ${num(r.hoursPerYear, 0)} h/year`,
    `lead time      mean ${num(r.leadTimeSeconds.mean)} s, p50 ${num(r.leadTimeSeconds.p50)} s, p95 ${num(r.leadTimeSeconds.p95)} s`,
    `time in line   mean ${num(r.timeInLineSeconds.mean)} s over ${num(r.departuresPerHour.mean)} departures/h (output and scrap)`,
    `WIP            ${num(r.wip.mean, 2)} parts on ${r.carriers.count} carriers`,
    `bottleneck     ${r.bottleneckTransferId ? `transfer ${r.bottleneckTransferId} (busy and rarely blocked; best station ${r.bottleneckStationId ?? 'none'})` : (r.bottleneckStationId ?? 'none')}`,
    `breaks         ${r.breakMinutesPerShift === 0 ? 'none' : r.breakMode === 'wholeLine' ? 'stop the whole line' : 'stop manual stations only'}`,
    '',
    `${'station'.padEnd(12)} ${'process'.padStart(7)} ${'starved'.padStart(7)} ${'blocked'.padStart(7)} ${'down'.padStart(7)} ${'break'.padStart(7)} ${'bottlnk'.padStart(7)}  cycle s`,
    ...r.stations.map(
      (s) =>
        `${s.id.padEnd(12)} ${pct(s.processing)} ${pct(s.starved)} ${pct(s.blocked)} ${pct(s.down)} ${pct(s.onBreak)} ${pct(s.bottleneckShare)}  ${num(s.meanCycleSeconds, 2)}`,
    ),
  ];
  if (r.transfers.length > 0) {
    const share = (x: number | null) => (x === null ? '      –' : pct(x));
    lines.push(
      '',
      `${'transfer'.padEnd(12)} ${'carry'.padStart(7)} ${'return'.padStart(7)} ${'blocked'.padStart(7)} ${'idle'.padStart(7)} ${'busy'.padStart(7)}  queue`,
    );
    for (const t of r.transfers) {
      const s = transferShares(t);
      lines.push(
        `${t.id.padEnd(12)} ${share(s.carrying)} ${share(s.returning)} ${pct(s.blocked)} ${pct(s.idle)} ${pct(s.busy)}  ${num(t.meanQueue, 2)}`,
      );
    }
  }
  lines.push(
    '',
    `events ${r.events}`,
    'Throughput planning only: not a safety sign-off. Guarding, risk assessment and electrical work follow local codes and the machine safety standards.',
  );
  return lines.join('\n');
}
