// Joins from one lane's end to another lane's start: direct links, and transfers (elevators between
// decks, lateral transfers and curves on one deck) that hold one carrier at a time.
import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { TRANSFER_KINDS, type TransferKind } from '../../../../../../shared/scenario/track';
import { useEditor, type ScenarioForm } from '../../editor-context';
import { freeId, transferOfKind } from '../../utils/defaults';
import { ListIssue, NumberField, SelectField, TextField } from '../fields';
import { RemoveCell, SectionHeading, SmallButton } from '../row-actions';

const KIND_LABELS: Record<TransferKind, string> = { elevator: 'Elevator', lateral: 'Lateral transfer', curve: 'Curve' };

function useLaneOptions() {
  const lanes = useWatch<ScenarioForm, 'lanes'>({ name: 'lanes' }) ?? [];
  return lanes.map((lane) => ({
    value: lane?.id ?? '',
    label: `${lane?.id ?? ''}${lane?.name ? ` — ${lane.name}` : ''}`,
  }));
}

function TransferCard({ index, onRemove }: { index: number; onRemove: () => void }) {
  const { getValues, setValue } = useFormContext<ScenarioForm>();
  const { readOnly } = useEditor();
  const kind = useWatch<ScenarioForm, `transfers.${number}.kind`>({ name: `transfers.${index}.kind` });
  const laneOptions = useLaneOptions();
  const changeKind = (next: TransferKind) => {
    const current = getValues(`transfers.${index}`);
    if (!current) return;
    setValue(`transfers.${index}`, transferOfKind(next, current), { shouldDirty: true, shouldValidate: true });
  };
  return (
    <li className="flex flex-col gap-3 rounded-md border border-paper-sunk p-3" data-transfer={index}>
      <div className="flex flex-wrap items-end justify-between gap-2">
        <label className="flex flex-col gap-1 text-xs font-semibold text-ink">
          Kind
          <select
            value={kind}
            disabled={readOnly}
            onChange={(e) => changeKind(e.target.value as TransferKind)}
            className="rounded border border-ink-faint bg-paper-raised px-2 py-1.5 text-sm font-normal disabled:bg-paper-sunk"
          >
            {TRANSFER_KINDS.map((k) => (
              <option key={k} value={k}>
                {KIND_LABELS[k]}
              </option>
            ))}
          </select>
        </label>
        <SmallButton onClick={onRemove} label={`Remove transfer ${index + 1}`}>
          Remove
        </SmallButton>
      </div>
      <div className="grid grid-cols-2 gap-3">
        <TextField name={`transfers.${index}.id`} label="Id" />
        <TextField name={`transfers.${index}.name`} label="Name" />
        <SelectField name={`transfers.${index}.fromLaneId`} label="From the end of lane" options={laneOptions} />
        <SelectField name={`transfers.${index}.toLaneId`} label="To the start of lane" options={laneOptions} />
      </div>
      <div key={kind} className="grid grid-cols-3 gap-3">
        {kind === 'elevator' && (
          <>
            <NumberField
              name={`transfers.${index}.handlingSeconds`}
              label="Handling (s)"
              hint="On and off the platform together."
            />
            <NumberField
              name={`transfers.${index}.liftSpeedMmPerS`}
              label="Lift speed (mm/s)"
              hint="Travel height comes from the decks."
            />
          </>
        )}
        {kind === 'lateral' && (
          <>
            <NumberField name={`transfers.${index}.handlingSeconds`} label="Handling (s)" />
            <NumberField name={`transfers.${index}.shiftDistanceMm`} label="Shift distance (mm)" />
            <NumberField name={`transfers.${index}.shiftSpeedMmPerS`} label="Shift speed (mm/s)" />
          </>
        )}
        {kind === 'curve' && (
          <>
            <NumberField name={`transfers.${index}.lengthMm`} label="Curve length (mm)" />
            <NumberField name={`transfers.${index}.speedLimitMmPerS`} label="Speed limit (mm/s)" />
          </>
        )}
      </div>
    </li>
  );
}

export function TransfersSection() {
  const { control, getValues } = useFormContext<ScenarioForm>();
  const links = useFieldArray({ control, name: 'links' });
  const transfers = useFieldArray({ control, name: 'transfers' });
  const laneOptions = useLaneOptions();
  const firstLanes = () => {
    const lanes = getValues('lanes') ?? [];
    return { fromLaneId: lanes[0]?.id ?? '', toLaneId: lanes[1]?.id ?? lanes[0]?.id ?? '' };
  };
  const addTransfer = (kind: TransferKind) => {
    const id = freeId(
      kind,
      (getValues('transfers') ?? []).map((t) => t.id),
    );
    transfers.append(transferOfKind(kind, { id, name: `${KIND_LABELS[kind]} ${id}`, ...firstLanes() }));
  };
  return (
    <div className="flex flex-col gap-5">
      <SectionHeading
        title={`Transfers (${transfers.fields.length})`}
        description="Each holds one carrier at a time; carriers wait for it like for a station."
      >
        <SmallButton onClick={() => addTransfer('elevator')}>Add elevator</SmallButton>
        <SmallButton onClick={() => addTransfer('lateral')}>Add lateral</SmallButton>
        <SmallButton onClick={() => addTransfer('curve')}>Add curve</SmallButton>
      </SectionHeading>
      <ListIssue name="transfers" />
      <ol className="flex flex-col gap-3">
        {transfers.fields.map((field, i) => (
          <TransferCard key={field.id} index={i} onRemove={() => transfers.remove(i)} />
        ))}
      </ol>
      <SectionHeading
        title={`Direct links (${links.fields.length})`}
        description="A lane's end meets the next lane's start on the same deck; the carrier rolls straight on."
      >
        <SmallButton onClick={() => links.append(firstLanes())}>Add link</SmallButton>
      </SectionHeading>
      <ListIssue name="links" />
      <ol className="flex flex-col gap-2">
        {links.fields.map((field, i) => (
          <li key={field.id} className="grid grid-cols-[1fr_1fr_auto] items-start gap-2">
            <SelectField name={`links.${i}.fromLaneId`} label="From the end of lane" options={laneOptions} />
            <SelectField name={`links.${i}.toLaneId`} label="To the start of lane" options={laneOptions} />
            <RemoveCell onClick={() => links.remove(i)} label={`Remove link ${i + 1}`} />
          </li>
        ))}
      </ol>
    </div>
  );
}
