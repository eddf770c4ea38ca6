// The station table for the controls engineer, from the revision the run was computed from.
import type { Scenario } from '../../../../shared/scenario/scenario';
import { Spinner } from '../../../components/ui/spinner';
import { CONTROLS_COLUMNS, controlsRows } from '../utils/controls-table';
import { CsvButton } from './csv-button';

interface ControlsExportProps {
  document: Scenario | undefined;
  loading: boolean;
  failed: boolean;
  fileBase: string;
}

export function ControlsExport({ document, loading, failed, fileBase }: ControlsExportProps) {
  if (loading) return <Spinner label="Loading the revision's station list…" />;
  if (failed || !document)
    return (
      <p className="text-sm text-danger">
        The revision's station list could not be loaded, so the station table cannot be saved.
      </p>
    );
  return (
    <div className="flex flex-wrap items-center gap-3">
      <CsvButton
        what="the station table for controls"
        label="Station table for controls (CSV)"
        fileBase={`${fileBase}-station-table`}
        rows={controlsRows(document)}
        columns={CONTROLS_COLUMNS}
      />
      <span className="text-sm text-ink-soft">
        Step, station, lane, deck and position in mm for every station of this revision.
      </span>
    </div>
  );
}
