// Where the runs feature gets the scenario revision a run was computed from (to run it again). The
// revision belongs to the scenarios feature; the app provides the reader, so the features stay apart.
import { createContext, useContext } from 'react';
import type { Revision } from '../../../../shared/api/scenarios';

export type LoadRevision = (scenarioId: string, revisionNumber: number) => Promise<Revision>;

export const RevisionSourceContext = createContext<LoadRevision | null>(null);

export function useLoadRevision(): LoadRevision {
  const load = useContext(RevisionSourceContext);
  if (!load) throw new Error('Rerunning needs RevisionSourceContext (provided by AppProvider).');
  return load;
}
