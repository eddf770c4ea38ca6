// Runs one scenario revision: settings, progress with Cancel, the engine's issues, and the saved
// run. Placed on the scenario page; shows nothing to people who may only read.
import { useCallback, useMemo } from 'react';
import { useNavigate } from 'react-router-dom';
import type { RunListItem } from '../../../../shared/api/runs';
import type { Scenario } from '../../../../shared/scenario/scenario';
import type { RunSettings } from '../../../../shared/scenario/run-settings';
import type { ValidationIssue } from '../../../../workers/engine';
import { Card, CardTitle } from '../../../components/ui/card';
import { useCanEdit } from '../../../lib/session/use-can-edit';
import { SimulationProblem } from '../simulation/components/simulation-problem';
import { SimulationProgress } from '../simulation/components/simulation-progress';
import { useLeaveWarning } from '../simulation/hooks/use-leave-warning';
import { useRunAndSave } from '../hooks/use-run-and-save';
import { splitSettingsIssues } from '../utils/settings-form';
import { RunSettingsForm } from './run-settings-form';
import { SaveStatus } from './save-status';

export interface RunPanelProps {
  scenarioId: string;
  organisationId: string | undefined;
  revision: { id: string; number: number; document: Scenario };
  /** Receives the engine's issues with the scenario (field paths into the document), or [] on a new run. */
  onScenarioIssues?: (issues: ValidationIssue[]) => void;
  /** Go to the result page once the run is saved (default); otherwise show a link. */
  openResultWhenSaved?: boolean;
}

export function RunPanel({
  scenarioId,
  organisationId,
  revision,
  onScenarioIssues,
  openResultWhenSaved = true,
}: RunPanelProps) {
  const mayRun = useCanEdit(organisationId);
  const navigate = useNavigate();
  const onSaved = useCallback(
    (run: RunListItem) => openResultWhenSaved && navigate(`/runs/${run.id}`),
    [navigate, openResultWhenSaved],
  );
  const { simulation, save, run, retrySave } = useRunAndSave(onSaved);
  const outcome = simulation.outcome;
  const issues = useMemo(() => splitSettingsIssues(outcome?.status === 'invalid' ? outcome.issues : []), [outcome]);

  useLeaveWarning(simulation.status === 'running');
  if (!mayRun) return null;

  const onRun = async (settings: RunSettings) => {
    onScenarioIssues?.([]);
    const result = await run(scenarioId, revision, settings);
    if (result.status === 'invalid') onScenarioIssues?.(splitSettingsIssues(result.issues).scenario);
  };
  const running = simulation.status === 'running';
  const problem =
    outcome?.status === 'invalid'
      ? issues.scenario.length > 0
        ? { ...outcome, issues: issues.scenario }
        : null
      : outcome;

  return (
    <Card aria-labelledby="run-panel-title" className="flex flex-col gap-4">
      <div className="flex flex-col gap-1">
        <CardTitle id="run-panel-title">Run revision {revision.number}</CardTitle>
        <p className="max-w-prose text-sm text-ink-soft">
          The simulation runs in this browser tab; the result is saved with this revision, the seed and the engine
          version, so it can be repeated exactly.
        </p>
      </div>
      <RunSettingsForm
        scenarioCarriers={revision.document.carriers.count}
        running={running}
        engineIssues={issues.settings}
        onRun={(s) => void onRun(s)}
      />
      {running && <SimulationProgress progress={simulation.progress} onCancel={simulation.cancel} />}
      <SimulationProblem outcome={problem} />
      <SaveStatus save={save} onRetry={retrySave} />
    </Card>
  );
}
