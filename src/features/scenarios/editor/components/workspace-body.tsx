// The editor beside the live drawing, and the line balance under them. Shared by the editable
// workspace and the read-only view of an old revision; the form comes from the surrounding provider.
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { useWatch } from 'react-hook-form';
import { LineBalanceChart } from '../../../../components/charts';
import { Card, CardTitle } from '../../../../components/ui/card';
import { LayoutDrawing } from '../../../../components/layout/layout-drawing';
import type { LayoutDraft } from '../../../../components/layout/layout-model';
import type { LayoutSelection } from '../../../../components/layout/selection';
import { EditorContext, useEditor, type ScenarioForm, type StationStudiesSlot } from '../editor-context';
import { balanceSteps } from '../utils/line-balance';
import { sectionOf, type SectionId } from '../utils/paths';
import { ScenarioEditor } from './scenario-editor';

function DraftDrawing() {
  const document = useWatch<ScenarioForm>();
  const { selection, select } = useEditor();
  return (
    <LayoutDrawing
      document={document as LayoutDraft}
      selection={selection}
      onSelect={(next) => select(next, 'drawing')}
    />
  );
}

function DraftBalance() {
  const steps = useWatch<ScenarioForm, 'steps'>({ name: 'steps' });
  const takt = useWatch<ScenarioForm, 'targetTaktSeconds'>({ name: 'targetTaktSeconds' });
  const balance = useMemo(() => balanceSteps(steps), [steps]);
  if (typeof takt !== 'number' || !Number.isFinite(takt) || takt <= 0) {
    return <p className="text-sm text-ink-soft">Set a target takt under General to compare each step with it.</p>;
  }
  return (
    <LineBalanceChart
      steps={balance}
      taktSeconds={takt}
      title="Line balance against the target takt (before simulation)"
      exportName="line-balance"
    />
  );
}

/** A field to open and focus, e.g. from the list of save problems; `seq` repeats a request. */
export interface FocusRequest {
  path: string;
  seq: number;
}

interface WorkspaceBodyProps {
  readOnly: boolean;
  focus?: FocusRequest | null;
  /** Lets station forms show the time studies stored with this scenario. */
  scenarioId?: string;
  /** What station forms show below the cycle time (the app mounts the time studies). */
  stationStudies?: StationStudiesSlot;
  externalIssues?: Readonly<Record<string, string>>;
  clearExternal?: (path: string) => void;
}

const NO_ISSUES: Readonly<Record<string, string>> = {};

export function WorkspaceBody({
  readOnly,
  focus,
  scenarioId,
  stationStudies,
  externalIssues = NO_ISSUES,
  clearExternal,
}: WorkspaceBodyProps) {
  const [selection, setSelection] = useState<LayoutSelection>(null);
  const [section, setSection] = useState<SectionId>('general');
  const editorRef = useRef<HTMLElement>(null);
  useEffect(() => {
    if (!focus) return;
    setSection(sectionOf(focus.path));
    const station = /^steps\.(\d+)\.stations\.(\d+)(\.|$)/.exec(focus.path);
    if (station) setSelection({ kind: 'station', stepIndex: Number(station[1]), stationIndex: Number(station[2]) });
    // The field mounts once its section and station are open, after this render.
    const timer = setTimeout(() => {
      const field = document.querySelector<HTMLElement>(`[name="${CSS.escape(focus.path)}"]`);
      field?.scrollIntoView?.({ block: 'center' });
      field?.focus();
    }, 0);
    return () => clearTimeout(timer);
  }, [focus]);
  const select = useCallback((next: LayoutSelection, from: 'drawing' | 'editor' = 'editor') => {
    setSelection(next);
    if (next?.kind === 'lane') setSection('lanes');
    if (next?.kind === 'station') setSection('process');
    // The editor sits under the drawing: bring the picked item's form into view.
    if (from === 'drawing') editorRef.current?.scrollIntoView?.({ behavior: 'smooth', block: 'start' });
  }, []);
  const context = useMemo(
    () => ({
      readOnly,
      scenarioId,
      stationStudies,
      externalIssues,
      clearExternal: clearExternal ?? (() => undefined),
      selection,
      select,
    }),
    [readOnly, scenarioId, stationStudies, externalIssues, clearExternal, selection, select],
  );
  return (
    <EditorContext.Provider value={context}>
      <div className="flex flex-col gap-6">
        <Card aria-labelledby="drawing-title" className="min-w-0">
          <CardTitle id="drawing-title" className="mb-4">
            Layout drawing
          </CardTitle>
          <DraftDrawing />
        </Card>
        <Card aria-labelledby="editor-title" className="min-w-0" ref={editorRef}>
          <CardTitle id="editor-title" className="mb-4">
            {readOnly ? 'Scenario (read-only)' : 'Edit the scenario'}
          </CardTitle>
          <ScenarioEditor section={section} onSection={setSection} />
        </Card>
      </div>
      <Card aria-labelledby="balance-title" className="mt-6">
        <CardTitle id="balance-title" className="mb-2">
          Line balance
        </CardTitle>
        <p className="mb-4 max-w-prose text-sm text-ink-soft">
          Each step's mean cycle time per station (mean ÷ parallel stations) from the distributions in the draft,
          against the target takt. Variability, blocking and failures need the simulation.
        </p>
        <DraftBalance />
      </Card>
    </EditorContext.Provider>
  );
}
