// Time studies of one station, for the station form: upload a CSV of measured cycle times, pick a study,
// read its statistics and fitted candidates, and hand the samples or a fit to the form as the cycle time.
// Viewers see the same analysis without the controls that change anything.
import { useId, useState } from 'react';
import type { TimeStudyDetail } from '../../../../shared/api/time-studies';
import type { Distribution } from '../../../../shared/scenario/distribution';
import { idSchema } from '../../../../shared/scenario/units';
import { LoadError } from '../../../components/load-error';
import { Spinner } from '../../../components/ui/spinner';
import { useTimeStudies } from '../api/get-time-studies';
import { useTimeStudy } from '../api/get-time-study';
import { describeDistribution } from '../utils/fit-presentation';
import { TimeStudyAnalysis } from './time-study-analysis';
import { TimeStudyList } from './time-study-list';
import { TimeStudyUpload } from './time-study-upload';

export interface TimeStudyPanelProps {
  scenarioId: string;
  stationId: string;
  stationName: string;
  canEdit: boolean;
  /** Called with a distribution that passes `distributionSchema`: empirical samples or a fitted family. */
  onUse: (distribution: Distribution) => void;
}

function SelectedStudy({
  id,
  stationName,
  canEdit,
  onUse,
}: {
  id: string;
  stationName: string;
  canEdit: boolean;
  onUse: (d: Distribution) => void;
}) {
  const study = useTimeStudy(id);
  if (study.isPending) return <Spinner label="Loading the analysis…" />;
  if (study.isError)
    return <LoadError what="the time study" error={study.error} onRetry={() => void study.refetch()} />;
  return <TimeStudyAnalysis study={study.data} stationName={stationName} canEdit={canEdit} onUse={onUse} />;
}

/** While a station's id is being typed it may be invalid; studies are keyed by it, so wait for a valid one. */
export function TimeStudyPanel(props: TimeStudyPanelProps) {
  const parsed = idSchema.safeParse(props.stationId);
  if (!parsed.success) {
    return (
      <p className="text-sm text-ink-soft">
        Time studies: give the station a valid id first ({parsed.error.issues[0]?.message}).
      </p>
    );
  }
  return <StationTimeStudies {...props} />;
}

function StationTimeStudies({ scenarioId, stationId, stationName, canEdit, onUse }: TimeStudyPanelProps) {
  const headingId = useId();
  const studies = useTimeStudies({ scenarioId, stationId });
  const [chosenId, setChosenId] = useState<string | null>(null);
  const [used, setUsed] = useState<string | null>(null);

  const list = studies.data ?? [];
  const selectedId = list.some((s) => s.id === chosenId) ? chosenId : (list[0]?.id ?? null);

  const use = (distribution: Distribution) => {
    onUse(distribution);
    setUsed(`The cycle time of ${stationName} is now ${describeDistribution(distribution)}.`);
  };
  const onUploaded = (study: TimeStudyDetail) => {
    setChosenId(study.id);
    setUsed(null);
  };

  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-4">
      <h3 id={headingId} className="text-base font-semibold text-ink">
        Time studies of {stationName}
      </h3>
      {canEdit && <TimeStudyUpload scenarioId={scenarioId} stationId={stationId} onUploaded={onUploaded} />}
      {studies.isPending && <Spinner label="Loading time studies…" />}
      {studies.isError && (
        <LoadError what="the time studies" error={studies.error} onRetry={() => void studies.refetch()} />
      )}
      {studies.isSuccess && list.length === 0 && (
        <p className="text-sm text-ink-soft">
          {canEdit
            ? 'No time study yet: upload the measured cycle times of this station.'
            : 'No time study has been uploaded for this station.'}
        </p>
      )}
      {list.length > 0 && (
        <TimeStudyList studies={list} selectedId={selectedId} onSelect={setChosenId} canEdit={canEdit} />
      )}
      {used && (
        <p role="status" className="rounded-md bg-accent-soft px-3 py-2 text-sm text-ink">
          {used}
        </p>
      )}
      {selectedId && <SelectedStudy id={selectedId} stationName={stationName} canEdit={canEdit} onUse={use} />}
    </section>
  );
}
