// What the comparison assumes and what it does not cover, stated on the page and in the report.
import type { Comparison } from '../utils/comparison';

export function ModelAssumptions({ comparison }: { comparison: Comparison }) {
  const settings = comparison.figures.map((f) => f.run.result.settings);
  const first = settings[0];
  return (
    <ul className="list-disc space-y-1 pl-5 text-sm">
      <li>
        Each run simulates {first.replications} independent replication{first.replications === 1 ? '' : 's'} of{' '}
        {first.hours} h after a {first.warmupMinutes} min warm-up
        {settings.some((s) => s.hours !== first.hours || s.replications !== first.replications)
          ? ' (the runs differ in length or replications; see each run)'
          : ''}
        . Figures are means across replications with two-sided 95 % Student t intervals.
      </li>
      <li>
        {comparison.pairing === 'paired'
          ? 'All runs used the same seed, so replication r of each drew the same random numbers where stations match (common random numbers); differences use the paired-t interval.'
          : 'The runs used different seeds or replication counts, so differences use Welch’s interval for independent samples.'}{' '}
        A difference is called significant when its 95 % interval excludes zero (Law, Simulation Modeling and Analysis,
        5th ed., 2015, §10.2).
      </li>
      <li>
        Cycle times, failures and repairs follow the distributions entered in each scenario; carriers move with the
        scenario’s motion limits. The model knows nothing the scenario does not say.
      </li>
      <li>
        Annual output multiplies throughput by the calendar’s scheduled working hours per year. Capital cost counts only
        the priced equipment: no installation, controls, guarding, building or labour.
      </li>
    </ul>
  );
}

export function ReportSafetyCaution() {
  return (
    <aside aria-label="Safety caution" className="rounded-md border-2 border-ink px-4 py-3 text-sm text-ink">
      <strong className="font-semibold">
        Lanewright plans throughput only; this comparison is not a safety assessment.
      </strong>{' '}
      Moving carriers, elevators, lateral transfers, magnets and motor power can injure. Guarding, risk assessment and
      electrical work follow local codes, the machine’s safety standards and licensed practice.
    </aside>
  );
}
