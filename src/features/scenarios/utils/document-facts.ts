// Counts and totals read off a scenario document for the overview.
import type { Scenario } from '../../../../shared/scenario/scenario';
import { laneLengthMm } from '../../../../shared/scenario/track';

export interface DocumentFacts {
  decks: number;
  lanes: number;
  trackLengthMm: number;
  transfers: number;
  steps: number;
  stations: number;
  carriers: number;
}

export function documentFacts(document: Scenario): DocumentFacts {
  return {
    decks: document.decks.length,
    lanes: document.lanes.length,
    trackLengthMm: document.lanes.reduce((sum, lane) => sum + laneLengthMm(lane), 0),
    transfers: document.transfers.length,
    steps: document.steps.length,
    stations: document.steps.reduce((sum, step) => sum + step.stations.length, 0),
    carriers: document.carriers.count,
  };
}
