// The editor's draft: the document in react-hook-form, checked against the shared schema after every
// change (cross-field checks included), kept in sessionStorage while it differs from its base
// revision, and rebased or reset when a save, a conflict or a discard says so.
import { zodResolver } from '@hookform/resolvers/zod';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { useForm } from 'react-hook-form';
import { scenarioSchema, type Scenario, type ScenarioInput } from '../../../../../shared/scenario/scenario';
import { clearDraft, readDraft, writeDraft } from '../utils/draft-storage';

const SETTLE_MS = 250;

export interface DraftBase {
  number: number;
  document: Scenario;
}

export function useScenarioDraft(scenarioId: string, latest: DraftBase, editable: boolean) {
  const [stored] = useState(() => (editable ? readDraft(scenarioId) : null));
  const [baseNumber, setBaseNumber] = useState(stored?.baseRevisionNumber ?? latest.number);
  const [hasDraft, setHasDraft] = useState(stored !== null);
  const [restored, setRestored] = useState(stored !== null);
  const baseJson = useRef(JSON.stringify(latest.document));
  const baseNumberRef = useRef(baseNumber);
  baseNumberRef.current = baseNumber;

  const form = useForm<ScenarioInput, unknown, Scenario>({
    resolver: zodResolver(scenarioSchema),
    defaultValues: stored?.document ?? latest.document,
    mode: 'onSubmit',
    reValidateMode: 'onChange',
  });

  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const settle = useCallback(() => {
    clearTimeout(timer.current);
    timer.current = setTimeout(() => {
      const values = form.getValues();
      const dirty = JSON.stringify(values) !== baseJson.current;
      setHasDraft(dirty);
      if (editable && dirty) writeDraft(scenarioId, { baseRevisionNumber: baseNumberRef.current, document: values });
      else clearDraft(scenarioId);
      void form.trigger();
    }, SETTLE_MS);
  }, [editable, form, scenarioId]);

  useEffect(() => {
    const subscription = form.watch(() => settle());
    settle();
    return () => {
      subscription.unsubscribe();
      clearTimeout(timer.current);
    };
  }, [form, settle]);

  /** A new base revision (after a save or a restore): the form shows exactly its document. */
  const resetTo = useCallback(
    (base: DraftBase) => {
      baseJson.current = JSON.stringify(base.document);
      baseNumberRef.current = base.number;
      setBaseNumber(base.number);
      clearDraft(scenarioId);
      setHasDraft(false);
      setRestored(false);
      form.reset(base.document);
      settle();
    },
    [form, scenarioId, settle],
  );

  /** Someone saved meanwhile: keep every typed value and make their revision the new base. */
  const rebase = useCallback(
    (base: DraftBase) => {
      baseJson.current = JSON.stringify(base.document);
      baseNumberRef.current = base.number;
      setBaseNumber(base.number);
      settle();
    },
    [settle],
  );

  /** An imported file or a template replaces the draft; nothing is saved until the user saves. */
  const replaceDraft = useCallback(
    (document: ScenarioInput) => {
      form.reset(document, { keepDefaultValues: true });
      settle();
    },
    [form, settle],
  );

  return useMemo(
    () => ({ form, baseNumber, hasDraft, restored, storedAt: stored?.storedAt, resetTo, rebase, replaceDraft }),
    [form, baseNumber, hasDraft, restored, stored, resetTo, rebase, replaceDraft],
  );
}

export type ScenarioDraft = ReturnType<typeof useScenarioDraft>;
