// The runs of one scenario, for the scenario page.
import { Card, CardTitle } from '../../../components/ui/card';
import { RunListSection } from './run-list-section';

export function ScenarioRuns({
  scenarioId,
  organisationId,
}: {
  scenarioId: string;
  organisationId: string | undefined;
}) {
  return (
    <Card aria-labelledby="scenario-runs-title" className="flex flex-col gap-4">
      <CardTitle id="scenario-runs-title">Runs</CardTitle>
      <RunListSection scope={{ scenarioId }} organisationId={organisationId} caption="Runs of this scenario" />
    </Card>
  );
}
