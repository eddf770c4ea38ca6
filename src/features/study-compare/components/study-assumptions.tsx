// What a comparison of studies assumes, stated on the page and in the report.
export function StudyAssumptions() {
  return (
    <ul className="list-disc space-y-1 pl-5 text-sm">
      <li>
        Each point of a study runs its scenario revision with the point’s changes (a carrier count, a swept value, a
        faster station) for the study’s replications; figures are means across replications with two-sided 95 % Student
        t intervals.
      </li>
      <li>
        Points of different studies are matched when they change the same fields to the same values. When both drew
        replication r from the same random numbers (one seed, run length and warm-up, common random numbers), the
        difference uses the paired-t interval; otherwise Welch’s interval for independent samples. A difference is
        called significant when its 95 % interval excludes zero (Law, Simulation Modeling and Analysis, 5th ed., 2015,
        §10.2).
      </li>
      <li>
        A point that stopped (for example in a gridlock, when the track is too full to move) or was not valid has no
        result and is never read as zero throughput.
      </li>
      <li>
        Cycle times, failures and repairs follow the distributions entered in each scenario; the model knows nothing the
        scenario does not say.
      </li>
    </ul>
  );
}
