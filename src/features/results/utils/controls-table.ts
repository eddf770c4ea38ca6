// The station list a controls engineer programs from: every station in process order with its
// lane, deck and stop position, taken from the exact revision the run was computed from.
import type { Scenario } from '../../../../shared/scenario/scenario';
import type { CsvColumn } from '../../../lib/export';

export interface ControlsRow {
  stepOrder: number;
  stepId: string;
  stepName: string;
  stationId: string;
  stationName: string;
  laneId: string;
  laneName: string;
  deckId: string;
  deckName: string;
  positionMm: number;
}

export function controlsRows(document: Scenario): ControlsRow[] {
  return document.steps.flatMap((step, index) =>
    step.stations.map((station) => {
      const lane = document.lanes.find((l) => l.id === station.laneId);
      const deck = document.decks.find((d) => d.id === lane?.deckId);
      return {
        stepOrder: index + 1,
        stepId: step.id,
        stepName: step.name,
        stationId: station.id,
        stationName: station.name,
        laneId: station.laneId,
        laneName: lane?.name ?? '',
        deckId: lane?.deckId ?? '',
        deckName: deck?.name ?? '',
        positionMm: station.positionMm,
      };
    }),
  );
}

export const CONTROLS_COLUMNS: CsvColumn<ControlsRow>[] = [
  { header: 'step_order', key: 'stepOrder' },
  { header: 'step_id', key: 'stepId' },
  { header: 'step_name', key: 'stepName' },
  { header: 'station_id', key: 'stationId' },
  { header: 'station_name', key: 'stationName' },
  { header: 'lane_id', key: 'laneId' },
  { header: 'lane_name', key: 'laneName' },
  { header: 'deck_id', key: 'deckId' },
  { header: 'deck_name', key: 'deckName' },
  { header: 'position_mm', key: 'positionMm' },
];
