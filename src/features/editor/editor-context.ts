// What every field of the editor needs besides the form itself: whether editing is allowed, issues
// from outside the schema (the server's answer, the engine's checks) and the current selection.
import { createContext, useContext } from 'react';
import type { ScenarioInput } from '../../../shared/scenario/scenario';
import type { LayoutSelection } from '../layout/selection';

/** The form holds the document as typed; the resolver turns it into a parsed Scenario on save. */
export type ScenarioForm = ScenarioInput;

export interface EditorContextValue {
  readOnly: boolean;
  /** The saved scenario the document belongs to; absent for a document that has none yet. */
  scenarioId?: string;
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
