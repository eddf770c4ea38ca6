// /runs/:runId : the results page with the sharing panel below it. Composed here because results and
// sharing are separate features.
import { useCanEdit } from '../../lib/session/use-can-edit';
import { RunRoute } from './run-route';
import { SharePanel } from '../../features/sharing/components/share-panel';

function RunSharing({ runId, organisationId }: { runId: string; organisationId: string | undefined }) {
  const mayShare = useCanEdit(organisationId);
  return <SharePanel kind="run" subjectId={runId} mayShare={mayShare} />;
}

export function RunPageRoute() {
  return (
    <RunRoute renderAside={(run, organisationId) => <RunSharing runId={run.id} organisationId={organisationId} />} />
  );
}
