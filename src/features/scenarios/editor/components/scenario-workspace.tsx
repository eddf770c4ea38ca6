// The scenario workspace: the draft with its save bar (revision note, save, discard, import, export,
// templates), the editor, the live drawing and the line balance. Viewers get the same picture
// read-only, with export only.
import { useCallback, useEffect, useId, useState } from 'react';
import { FormProvider } from 'react-hook-form';
import type { FieldIssue } from '../../../../../shared/api/errors';
import { REVISION_MESSAGE_MAX, type ScenarioDetail } from '../../../../../shared/api/scenarios';
import { scenarioSchema } from '../../../../../shared/scenario/scenario';
import { Badge } from '../../../../components/ui/badge';
import { Button } from '../../../../components/ui/button';
import { Card } from '../../../../components/ui/card';
import { formatDateTime } from '../../../../lib/format';
import { useSaveDraft } from '../hooks/use-save-draft';
import { useScenarioDraft } from '../hooks/use-scenario-draft';
import { toFormPath, type PathIssue } from '../utils/paths';
import { ImportExport } from './import-export';
import { describeFormPath } from '../utils/describe-issue';
import { SaveOutcomeMessage } from './save-outcome';
import { TemplatePicker } from './template-picker';
import type { StationStudiesSlot } from '../editor-context';
import { WorkspaceBody, type FocusRequest } from './workspace-body';
import { WorkspaceHistory } from './workspace-history';

export interface ScenarioWorkspaceProps {
  scenario: ScenarioDetail;
  mayEdit: boolean;
  /** The engine's issues with the saved revision (paths into the document), placed beside their fields. */
  engineIssues?: readonly FieldIssue[];
  /** What station forms show below the cycle time (the app mounts the time studies). */
  stationStudies?: StationStudiesSlot;
}

const toMap = (issues: readonly PathIssue[]) => Object.fromEntries(issues.map((issue) => [issue.path, issue.message]));

export function ScenarioWorkspace({ scenario, mayEdit, engineIssues, stationStudies }: ScenarioWorkspaceProps) {
  const latest = { number: scenario.latestRevision.number, document: scenario.document };
  const draft = useScenarioDraft(scenario.id, latest, mayEdit);
  const [external, setExternal] = useState<Record<string, string>>({});
  const replaceExternal = useCallback((issues: PathIssue[]) => setExternal(toMap(issues)), []);
  const clearExternal = useCallback(
    (path: string) =>
      setExternal((all) => {
        if (!(path in all)) return all;
        const rest = { ...all };
        delete rest[path];
        return rest;
      }),
    [],
  );
  useEffect(() => {
    if (engineIssues)
      replaceExternal(engineIssues.map((issue) => ({ path: toFormPath(issue.path), message: issue.message })));
  }, [engineIssues, replaceExternal]);
  const saving = useSaveDraft(scenario.id, draft, replaceExternal);
  const [message, setMessage] = useState('');
  const [focus, setFocus] = useState<FocusRequest | null>(null);
  const messageId = useId();

  const exportDocument = () => {
    const parsed = scenarioSchema.safeParse(draft.form.getValues());
    return parsed.success
      ? { document: parsed.data }
      : { document: scenario.document, revisionNumber: scenario.latestRevision.number };
  };
  const onSave = async () => {
    if (await saving.save(message)) setMessage('');
  };
  const discard = () => {
    draft.resetTo(latest);
    replaceExternal([]);
    saving.clearOutcome();
  };
  const messageIssue = external.message;

  return (
    <FormProvider {...draft.form}>
      <Card aria-label="Draft and saving" className="mb-6 flex flex-col gap-4 print:hidden">
        <div className="flex flex-wrap items-center gap-3 text-sm text-ink-soft">
          <span>
            Based on revision <strong className="text-ink">{draft.baseNumber}</strong>
          </span>
          {draft.hasDraft ? <Badge tone="caution">Unsaved changes</Badge> : <Badge>No unsaved changes</Badge>}
          {draft.restored && draft.hasDraft && (
            <span role="status">
              Your unsaved draft{draft.storedAt ? ` from ${formatDateTime(draft.storedAt)}` : ''} was restored from this
              browser tab.
            </span>
          )}
          {mayEdit && draft.hasDraft && (
            <Button variant="quiet" onClick={discard}>
              Discard draft
            </Button>
          )}
        </div>
        {mayEdit && (
          <div className="flex flex-wrap items-end gap-3">
            <div className="flex min-w-64 flex-1 flex-col gap-1">
              <label htmlFor={messageId} className="text-xs font-semibold text-ink">
                What changed (optional)
              </label>
              <input
                id={messageId}
                type="text"
                maxLength={REVISION_MESSAGE_MAX}
                value={message}
                onChange={(e) => {
                  setMessage(e.target.value);
                  clearExternal('message');
                }}
                aria-invalid={Boolean(messageIssue) || undefined}
                className="rounded border border-ink-faint bg-paper-raised px-2 py-1.5 text-sm"
                placeholder="e.g. second fitting position on the work lane"
              />
              {messageIssue && <p className="text-xs font-medium text-danger">Note {messageIssue}</p>}
            </div>
            <Button
              onClick={() => void onSave()}
              pending={saving.pending}
              pendingLabel="Saving…"
              disabled={!draft.hasDraft}
            >
              Save as revision {draft.baseNumber + 1}
            </Button>
          </div>
        )}
        <SaveOutcomeMessage
          outcome={saving.outcome}
          scenarioId={scenario.id}
          onKeepMine={() => void saving.keepMineOnTop()}
          rebasing={saving.rebasing}
          describe={(path) => describeFormPath(path, draft.form.getValues())}
          onShow={(path) => setFocus((last) => ({ path, seq: (last?.seq ?? 0) + 1 }))}
        />
        <div className="flex flex-wrap items-start justify-between gap-4 border-t border-paper-sunk pt-4">
          <ImportExport exportDocument={exportDocument} onImported={mayEdit ? draft.replaceDraft : undefined} />
          {mayEdit && (
            <div className="w-full max-w-md">
              <TemplatePicker
                onPick={(document) =>
                  draft.replaceDraft({
                    ...document,
                    name: draft.form.getValues('name'),
                    description: draft.form.getValues('description'),
                  })
                }
              />
            </div>
          )}
        </div>
      </Card>
      <WorkspaceBody
        readOnly={!mayEdit}
        focus={focus}
        scenarioId={scenario.id}
        stationStudies={stationStudies}
        externalIssues={external}
        clearExternal={clearExternal}
      />
      <WorkspaceHistory scenarioId={scenario.id} draft={draft} mayEdit={mayEdit} />
    </FormProvider>
  );
}
