// What every field of the editor needs besides the form itself: whether editing is allowed, issues
// from outside the schema (the server's answer, the engine's checks) and the current selection.
import { createContext, useContext, type ReactNode } from 'react';
import type { Distribution } from '../../../../shared/scenario/distribution';
import type { ScenarioInput } from '../../../../shared/scenario/scenario';
import type { LayoutSelection } from '../../../components/layout/selection';

/** The form holds the document as typed; the resolver turns it into a parsed Scenario on save. */
export type ScenarioForm = ScenarioInput;

/** What a station form of a saved scenario hands to the slot below its cycle time. */
export interface StationStudiesSlotProps {
  scenarioId: string;
  stationId: string;
  stationName: string;
  canEdit: boolean;
  /** Makes the chosen distribution the station's cycle time. */
  onUse: (distribution: Distribution) => void;
}

/** Filled by the page that composes the editor (the time studies); the editor knows only the slot. */
export type StationStudiesSlot = (props: StationStudiesSlotProps) => ReactNode;

export interface EditorContextValue {
  readOnly: boolean;
  /** The saved scenario the document belongs to; absent for a document that has none yet. */
  scenarioId?: string;
  stationStudies?: StationStudiesSlot;
  /** Messages keyed by dotted form path, shown beside their field until it is edited. */
  externalIssues: Readonly<Record<string, string>>;
  clearExternal: (path: string) => void;
  selection: LayoutSelection;
  select: (selection: LayoutSelection, from?: 'drawing' | 'editor') => void;
}

export const EditorContext = createContext<EditorContextValue>({
  readOnly: true,
  externalIssues: {},
  clearExternal: () => undefined,
  selection: null,
  select: () => undefined,
});

export const useEditor = () => useContext(EditorContext);
