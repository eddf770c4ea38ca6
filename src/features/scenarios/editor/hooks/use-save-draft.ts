// Saving the draft as a new revision and what can go wrong: the schema refuses it (errors already
// sit beside their fields), the server refuses it (its field paths go beside the fields too), or
// someone saved first (409: the draft stays, and can be put on top of their revision).
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { Scenario } from '../../../../../shared/scenario/scenario';
import { isApiRequestError } from '../../../../lib/api-client';
import { getScenario } from '../../api/get-scenario';
import { scenarioKeys } from '../../../../lib/query-keys/scenarios';
import { useCreateRevision } from '../api/create-revision';
import type { ScenarioDraft } from './use-scenario-draft';
import { flattenErrors, toFormPath, type PathIssue } from '../utils/paths';

export type SaveOutcome =
  | { kind: 'saved'; number: number }
  | { kind: 'invalid'; issues: PathIssue[] }
  | { kind: 'rejected'; message: string; issues: PathIssue[] }
  | { kind: 'conflict'; message: string }
  | { kind: 'failed'; message: string };

export function useSaveDraft(scenarioId: string, draft: ScenarioDraft, setExternal: (issues: PathIssue[]) => void) {
  const createRevision = useCreateRevision(scenarioId);
  const queryClient = useQueryClient();
  const [outcome, setOutcome] = useState<SaveOutcome | null>(null);
  const [rebasing, setRebasing] = useState(false);

  const send = async (document: Scenario, message: string): Promise<boolean> => {
    setOutcome(null);
    try {
      const revision = await createRevision.mutateAsync({
        document,
        message: message.trim() || undefined,
        baseRevisionNumber: draft.baseNumber,
      });
      draft.resetTo({ number: revision.number, document: revision.document });
      setExternal([]);
      setOutcome({ kind: 'saved', number: revision.number });
      return true;
    } catch (error) {
      if (isApiRequestError(error) && error.status === 409) setOutcome({ kind: 'conflict', message: error.message });
      else if (isApiRequestError(error) && error.fields.length > 0) {
        const issues = error.fields.map((field) => ({ path: toFormPath(field.path), message: field.message }));
        setExternal(issues);
        setOutcome({ kind: 'rejected', message: error.message, issues });
      } else
        setOutcome({
          kind: 'failed',
          message: error instanceof Error ? error.message : 'The revision was not saved. Try again.',
        });
      return false;
    }
  };

  /** Resolves true when a revision was made. */
  const save = (message: string) =>
    new Promise<boolean>((resolve) => {
      void draft.form.handleSubmit(
        async (document) => resolve(await send(document, message)),
        (errors) => {
          setOutcome({ kind: 'invalid', issues: flattenErrors(errors) });
          resolve(false);
        },
      )();
    });

  const keepMineOnTop = async () => {
    setRebasing(true);
    try {
      const latest = await getScenario(scenarioId);
      queryClient.setQueryData(scenarioKeys.detail(scenarioId), latest);
      void queryClient.invalidateQueries({ queryKey: scenarioKeys.revisions(scenarioId) });
      draft.rebase({ number: latest.latestRevision.number, document: latest.document });
      setOutcome(null);
    } catch (error) {
      setOutcome({
        kind: 'failed',
        message: error instanceof Error ? error.message : 'The latest revision could not be loaded.',
      });
    } finally {
      setRebasing(false);
    }
  };

  return {
    save,
    outcome,
    pending: createRevision.isPending,
    keepMineOnTop,
    rebasing,
    clearOutcome: () => setOutcome(null),
  };
}
