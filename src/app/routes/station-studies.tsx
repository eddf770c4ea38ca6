// The time studies of a station, mounted in the scenario editor's station form through its slot: the
// editor and the time studies are separate features, composed here.
import type { StationStudiesSlot } from '../../features/scenarios/editor/editor-context';
import { TimeStudyPanel } from '../../features/time-studies';

export const stationStudies: StationStudiesSlot = (props) => <TimeStudyPanel {...props} />;
