// Choosing what to compare: two to four stored runs, or two to four scenarios run now with one seed
// (common random numbers), so their differences are paired.
import { useState, type FormEvent } from 'react';
import type { RunListItem } from '../../../../shared/api/runs';
import { runSettingsSchema, type RunSettings } from '../../../../shared/scenario/run-settings';
import { formatIssuePath } from '../../../../shared/scenario/issue-path';
import { Button } from '../../../components/ui/button';
import { Card, CardTitle } from '../../../components/ui/card';
import { TextField } from '../../../components/ui/field';
import { formatDateTime } from '../../../lib/format';
import { COMPARE_LIMITS } from '../utils/comparison';

export interface ScenarioChoice {
  id: string;
  name: string;
  latestRevisionNumber: number;
}

export interface ScenarioRunProgress {
  /** "Running Stacked loop (1 of 2)". */
  label: string;
  fraction: number;
}

interface CompareSetupProps {
  runs: readonly RunListItem[];
  scenarios: readonly ScenarioChoice[];
  selectedRunIds: readonly string[];
  mayRun: boolean;
  progress: ScenarioRunProgress | null;
  problem: string | null;
  onCompareRuns: (ids: string[]) => void;
  onRunScenarios: (ids: string[], settings: RunSettings) => void;
  onCancel: () => void;
}

function toggle(list: readonly string[], id: string): string[] {
  return list.includes(id) ? list.filter((x) => x !== id) : [...list, id];
}

const countProblem = (n: number) =>
  n < COMPARE_LIMITS.min || n > COMPARE_LIMITS.max
    ? `Choose ${COMPARE_LIMITS.min} to ${COMPARE_LIMITS.max}; ${n} chosen.`
    : null;

function ScenarioPicker({
  scenarios,
  mayRun,
  progress,
  problem,
  onRunScenarios,
  onCancel,
}: Pick<CompareSetupProps, 'scenarios' | 'mayRun' | 'progress' | 'problem' | 'onRunScenarios' | 'onCancel'>) {
  const [chosen, setChosen] = useState<string[]>(() => scenarios.slice(0, COMPARE_LIMITS.max).map((s) => s.id));
  const [values, setValues] = useState({ replications: '10', hours: '8', warmupMinutes: '30', seed: '1' });
  const [issues, setIssues] = useState<Record<string, string>>({});
  const [countIssue, setCountIssue] = useState<string | null>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const seed = /^\d+$/.test(values.seed.trim()) ? Number(values.seed) : values.seed;
    const parsed = runSettingsSchema.safeParse({
      replications: Number(values.replications),
      hours: Number(values.hours),
      warmupMinutes: Number(values.warmupMinutes),
      seed,
    });
    const count = countProblem(chosen.length);
    setCountIssue(count);
    setIssues(
      parsed.success ? {} : Object.fromEntries(parsed.error.issues.map((i) => [formatIssuePath(i.path), i.message])),
    );
    if (parsed.success && !count) onRunScenarios(chosen, parsed.data);
  };
  const field = (name: keyof typeof values, label: string) => (
    <TextField
      label={label}
      value={values[name]}
      error={issues[name]}
      onChange={(e) => setValues((v) => ({ ...v, [name]: e.target.value }))}
      inputMode="decimal"
    />
  );

  if (!mayRun)
    return (
      <p className="text-sm text-ink-soft">
        Engineers and owners can run scenarios for a comparison; you can compare runs already stored.
      </p>
    );
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3" aria-label="Run scenarios with one seed">
      <fieldset className="flex flex-col gap-1">
        <legend className="mb-1 text-sm font-semibold">Scenarios (their latest revision)</legend>
        {scenarios.map((s) => (
          <label key={s.id} className="flex items-center gap-2 text-sm">
            <input
              type="checkbox"
              checked={chosen.includes(s.id)}
              onChange={() => setChosen((c) => toggle(c, s.id))}
              disabled={progress !== null}
            />
            {s.name} <span className="text-ink-soft">revision {s.latestRevisionNumber}</span>
          </label>
        ))}
        {countIssue && <p className="text-sm font-medium text-danger">{countIssue}</p>}
      </fieldset>
      <div className="grid gap-x-4 sm:grid-cols-4">
        {field('replications', 'Replications')}
        {field('hours', 'Hours each')}
        {field('warmupMinutes', 'Warm-up (min)')}
        {field('seed', 'Seed')}
      </div>
      <p className="-mt-2 text-sm text-ink-soft">
        Every scenario runs with this one seed (common random numbers), so their differences are paired.
      </p>
      {progress ? (
        <div className="flex flex-col gap-2" role="status">
          <p className="text-sm">{progress.label}</p>
          <progress className="w-full" value={progress.fraction} max={1} />
          <div>
            <Button variant="secondary" onClick={onCancel}>
              Cancel
            </Button>
          </div>
        </div>
      ) : (
        <div>
          <Button type="submit">Run and compare</Button>
        </div>
      )}
      {problem && <p className="text-sm font-medium text-danger">{problem}</p>}
    </form>
  );
}

function RunPicker({
  runs,
  selectedRunIds,
  onCompareRuns,
}: Pick<CompareSetupProps, 'runs' | 'selectedRunIds' | 'onCompareRuns'>) {
  const [chosen, setChosen] = useState<string[]>([...selectedRunIds]);
  const [issue, setIssue] = useState<string | null>(null);
  if (runs.length < COMPARE_LIMITS.min)
    return <p className="text-sm text-ink-soft">The project has fewer than two stored runs.</p>;
  return (
    <form
      className="flex flex-col gap-2"
      aria-label="Compare stored runs"
      onSubmit={(event) => {
        event.preventDefault();
        const problem = countProblem(chosen.length);
        setIssue(problem);
        if (!problem) onCompareRuns(chosen);
      }}
    >
      <div className="max-h-64 overflow-y-auto rounded-md border border-paper-sunk p-2">
        {runs.map((run) => (
          <label key={run.id} className="flex items-baseline gap-2 py-0.5 text-sm">
            <input
              type="checkbox"
              checked={chosen.includes(run.id)}
              onChange={() => setChosen((c) => toggle(c, run.id))}
            />
            <span>
              <strong>{run.scenarioName}</strong> · {run.name}{' '}
              <span className="text-ink-soft">({formatDateTime(run.createdAt)})</span>
            </span>
          </label>
        ))}
      </div>
      {issue && <p className="text-sm font-medium text-danger">{issue}</p>}
      <div>
        <Button type="submit" variant="secondary">
          Compare chosen runs
        </Button>
      </div>
    </form>
  );
}

export function CompareSetup(props: CompareSetupProps) {
  return (
    <div className="grid gap-6 lg:grid-cols-2" data-print="hide">
      <Card aria-labelledby="run-scenarios-title" className="flex flex-col gap-3">
        <CardTitle id="run-scenarios-title">Run scenarios side by side</CardTitle>
        <ScenarioPicker {...props} />
      </Card>
      <Card aria-labelledby="pick-runs-title" className="flex flex-col gap-3">
        <CardTitle id="pick-runs-title">Or compare stored runs</CardTitle>
        <p className="text-sm text-ink-soft">
          Runs with one seed and replication count are paired; others are compared as independent samples.
        </p>
        <RunPicker
          key={props.selectedRunIds.join()}
          runs={props.runs}
          selectedRunIds={props.selectedRunIds}
          onCompareRuns={props.onCompareRuns}
        />
      </Card>
    </div>
  );
}
