// Lanes as a list to pick from and the chosen lane's details, so a layout with many lanes stays
// usable. Picking a lane here or in the drawing is the same selection.
import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { HEADINGS } from '../../../../../../shared/scenario/track';
import { formatLengthMm } from '../../../../../lib/format';
import { useEditor, type ScenarioForm } from '../../editor-context';
import { useIssueCount } from '../../hooks/use-has-issues';
import { freeId, newLane } from '../../utils/defaults';
import { ListIssue, NumberField, SelectField, TextField } from '../fields';
import { PickRow, RemoveCell, SectionHeading, SmallButton } from '../row-actions';

type DraftLane = NonNullable<ScenarioForm['lanes']>[number];

function draftLength(lane: Partial<DraftLane> | undefined): number | null {
  let total = 0;
  for (const m of lane?.modules ?? []) {
    if (typeof m?.lengthMm !== 'number' || typeof m.count !== 'number' || !Number.isFinite(m.lengthMm * m.count))
      return null;
    total += m.lengthMm * m.count;
  }
  return total;
}

function LaneRow({
  index,
  lane,
  selected,
  onPick,
}: {
  index: number;
  lane: Partial<DraftLane> | undefined;
  selected: boolean;
  onPick: () => void;
}) {
  const issues = useIssueCount(`lanes.${index}`);
  const length = draftLength(lane);
  return (
    <PickRow
      selected={selected}
      onPick={onPick}
      invalid={issues > 0}
      label={`Lane ${lane?.id ?? index + 1}${issues > 0 ? `, ${issues} problem${issues === 1 ? '' : 's'}` : ''}`}
    >
      <span className="w-24 truncate font-mono text-xs">{lane?.id}</span>
      <span className="flex-1 truncate">{lane?.name}</span>
      <span className="w-20 truncate text-xs text-ink-soft">{lane?.deckId}</span>
      <span className="w-16 text-right text-xs tabular-nums">{length === null ? '—' : formatLengthMm(length)}</span>
    </PickRow>
  );
}

function LaneDetails({ index }: { index: number }) {
  const { control } = useFormContext<ScenarioForm>();
  const modules = useFieldArray({ control, name: `lanes.${index}.modules` });
  const decks = useWatch<ScenarioForm, 'decks'>({ name: 'decks' }) ?? [];
  const standard = useWatch<ScenarioForm, 'track.moduleLengthsMm'>({ name: 'track.moduleLengthsMm' }) ?? [];
  return (
    <div className="flex flex-col gap-3 rounded-md border border-accent/40 bg-paper p-3" data-lane-details={index}>
      <div className="grid grid-cols-2 gap-3">
        <TextField name={`lanes.${index}.id`} label="Lane id" />
        <TextField name={`lanes.${index}.name`} label="Lane name" />
        <SelectField
          name={`lanes.${index}.deckId`}
          label="Deck"
          options={decks.map((d) => ({ value: d?.id ?? '', label: `${d?.name ?? ''} (${d?.id ?? ''})` }))}
        />
        <SelectField
          name={`lanes.${index}.heading`}
          label="Heading (direction of travel)"
          options={HEADINGS.map((h) => ({ value: h, label: h }))}
        />
        <NumberField name={`lanes.${index}.start.xMm`} label="Start x (mm, east)" />
        <NumberField name={`lanes.${index}.start.yMm`} label="Start y (mm, north)" />
      </div>
      <SectionHeading
        title="Modules"
        description={`In the order carriers travel over them. Standard lengths: ${standard.join(', ')} mm.`}
      >
        <SmallButton
          onClick={() => modules.append({ lengthMm: typeof standard[0] === 'number' ? standard[0] : 1000, count: 1 })}
        >
          Add modules
        </SmallButton>
      </SectionHeading>
      <ListIssue name={`lanes.${index}.modules`} />
      <ol className="flex flex-col gap-2">
        {modules.fields.map((field, j) => (
          <li key={field.id} className="grid grid-cols-[1fr_1fr_auto] items-start gap-2">
            <NumberField name={`lanes.${index}.modules.${j}.lengthMm`} label="Module length (mm)" />
            <NumberField name={`lanes.${index}.modules.${j}.count`} label="Count" step="1" />
            <RemoveCell
              onClick={() => modules.remove(j)}
              label={`Remove module group ${j + 1}`}
              disabled={modules.fields.length <= 1}
            />
          </li>
        ))}
      </ol>
    </div>
  );
}

export function LanesSection() {
  const { control, getValues } = useFormContext<ScenarioForm>();
  const lanes = useFieldArray({ control, name: 'lanes' });
  const values = useWatch<ScenarioForm, 'lanes'>({ name: 'lanes' }) ?? [];
  const { selection, select } = useEditor();
  const selected = selection?.kind === 'lane' && selection.index < lanes.fields.length ? selection.index : null;

  const add = (copyOf?: number) => {
    const all = getValues('lanes') ?? [];
    const id = freeId(
      'lane',
      all.map((l) => l.id),
    );
    const deckId = getValues('decks')?.[0]?.id ?? '';
    const module = getValues('track.moduleLengthsMm')?.[0] ?? 1000;
    const yMax = Math.max(0, ...all.map((l) => (typeof l.start?.yMm === 'number' ? l.start.yMm : 0)));
    const start = { xMm: 0, yMm: yMax + 600 };
    const source = copyOf === undefined ? undefined : all[copyOf];
    lanes.append(
      source
        ? { ...structuredClone(source), id, name: `${source.name} copy`, start }
        : newLane(id, deckId, typeof module === 'number' ? module : 1000, start),
    );
    select({ kind: 'lane', index: all.length });
  };
  const remove = (index: number) => {
    lanes.remove(index);
    select(null);
  };

  return (
    <div className="flex flex-col gap-4">
      <SectionHeading
        title={`Lanes (${lanes.fields.length})`}
        description="Straight runs on a deck, built from standard modules, starting at a plan point and running one compass direction."
      >
        <SmallButton onClick={() => add()}>Add lane</SmallButton>
        {selected !== null && <SmallButton onClick={() => add(selected)}>Duplicate</SmallButton>}
        {selected !== null && (
          <SmallButton onClick={() => remove(selected)} disabled={lanes.fields.length <= 1}>
            Remove lane
          </SmallButton>
        )}
      </SectionHeading>
      <ListIssue name="lanes" />
      <div className="max-h-72 overflow-y-auto rounded-md border border-paper-sunk" role="list" aria-label="Lanes">
        {lanes.fields.map((field, i) => (
          <div role="listitem" key={field.id}>
            <LaneRow
              index={i}
              lane={values[i]}
              selected={selected === i}
              onPick={() => select({ kind: 'lane', index: i })}
            />
          </div>
        ))}
      </div>
      {selected === null ? (
        <p className="text-sm text-ink-soft">Pick a lane here or in the drawing to edit it.</p>
      ) : (
        <LaneDetails key={lanes.fields[selected]?.id} index={selected} />
      )}
    </div>
  );
}
