// The process in order: load first, unload last. Steps can be added, removed and moved; the chosen
// step shows its stations, and a station picked in the drawing opens here.
import { useState } from 'react';
import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { DEFAULT_DISPATCH } from '../../../../../../shared/scenario/process';
import { useEditor, type ScenarioForm } from '../../editor-context';
import { useIssueCount } from '../../hooks/use-has-issues';
import { freeId } from '../../utils/defaults';
import { ListIssue } from '../fields';
import { PickRow, SectionHeading, SmallButton } from '../row-actions';
import { StepDetails } from './step-details';

function StepRow({ index, selected, onPick }: { index: number; selected: boolean; onPick: () => void }) {
  const step = useWatch<ScenarioForm, `steps.${number}`>({ name: `steps.${index}` });
  const issues = useIssueCount(`steps.${index}`);
  return (
    <PickRow
      selected={selected}
      onPick={onPick}
      invalid={issues > 0}
      label={`Step ${index + 1}: ${step?.name ?? ''}${issues > 0 ? `, ${issues} problem${issues === 1 ? '' : 's'}` : ''}`}
    >
      <span className="w-6 text-right text-xs text-ink-soft tabular-nums">{index + 1}.</span>
      <span className="flex-1 truncate">{step?.name}</span>
      <span className="text-xs text-ink-soft">{step?.kind}</span>
      <span className="w-16 text-right text-xs text-ink-soft">×{step?.stations?.length ?? 0}</span>
    </PickRow>
  );
}

export function ProcessSection() {
  const { control, getValues } = useFormContext<ScenarioForm>();
  const steps = useFieldArray({ control, name: 'steps' });
  const { selection, select } = useEditor();
  const [openStep, setOpenStep] = useState(0);
  const count = steps.fields.length;
  const current =
    selection?.kind === 'station' && selection.stepIndex < count ? selection.stepIndex : Math.min(openStep, count - 1);

  const open = (index: number) => {
    setOpenStep(index);
    select(null);
  };
  const move = (from: number, to: number) => {
    steps.move(from, to);
    open(to);
  };
  const add = () => {
    const id = freeId(
      'step',
      (getValues('steps') ?? []).map((s) => s.id),
    );
    // New work goes before unload, which must stay last.
    const at = Math.max(count - 1, 0);
    steps.insert(at, { id, name: 'New step', kind: 'process', dispatch: DEFAULT_DISPATCH, stations: [] });
    open(at);
  };
  const remove = (index: number) => {
    steps.remove(index);
    open(Math.max(0, Math.min(index, count - 2)));
  };

  return (
    <div className="flex flex-col gap-4">
      <SectionHeading
        title={`Process steps (${count})`}
        description="In order: the first step loads, the last unloads."
      >
        <SmallButton onClick={add}>Add step</SmallButton>
        {current >= 0 && (
          <>
            <SmallButton onClick={() => move(current, current - 1)} disabled={current <= 0} label="Move step up">
              ↑ Up
            </SmallButton>
            <SmallButton
              onClick={() => move(current, current + 1)}
              disabled={current >= count - 1}
              label="Move step down"
            >
              ↓ Down
            </SmallButton>
            <SmallButton onClick={() => remove(current)} disabled={count <= 2}>
              Remove step
            </SmallButton>
          </>
        )}
      </SectionHeading>
      <ListIssue name="steps" />
      <div
        className="max-h-60 overflow-y-auto rounded-md border border-paper-sunk"
        role="list"
        aria-label="Process steps"
      >
        {steps.fields.map((field, i) => (
          <div role="listitem" key={field.id}>
            <StepRow index={i} selected={current === i} onPick={() => open(i)} />
          </div>
        ))}
      </div>
      {current >= 0 && <StepDetails key={steps.fields[current]?.id} stepIndex={current} />}
    </div>
  );
}
