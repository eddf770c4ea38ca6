// Standard module lengths, lane width and the decks lanes run on.
import { useFieldArray, useFormContext } from 'react-hook-form';
import type { ScenarioForm } from '../../editor-context';
import { freeId } from '../../utils/defaults';
import { ListIssue, NumberField, TextField } from '../fields';
import { NumberListField } from '../number-list-field';
import { RemoveCell, SectionHeading, SmallButton } from '../row-actions';

export function TrackSection() {
  const { control, getValues } = useFormContext<ScenarioForm>();
  const decks = useFieldArray({ control, name: 'decks' });
  const addDeck = () => {
    const existing = getValues('decks') ?? [];
    const top = Math.max(0, ...existing.map((d) => (typeof d.elevationMm === 'number' ? d.elevationMm : 0)));
    decks.append({
      id: freeId(
        'deck',
        existing.map((d) => d.id),
      ),
      name: 'New deck',
      elevationMm: Math.min(top + 300, 20_000),
    });
  };
  return (
    <div className="flex flex-col gap-5">
      <SectionHeading
        title="Track"
        description="Lanes are assembled from these standard module lengths; the width is used for the drawing and the footprint."
      />
      <div className="grid grid-cols-2 gap-3">
        <NumberListField
          name="track.moduleLengthsMm"
          label="Standard module lengths (mm)"
          hint="Separate with commas, e.g. 250, 500, 1000."
        />
        <NumberField name="track.widthMm" label="Lane width (mm)" />
      </div>
      <SectionHeading
        title="Decks"
        description="Levels of track above the floor; elevators join lanes on different decks."
      >
        <SmallButton onClick={addDeck}>Add deck</SmallButton>
      </SectionHeading>
      <ListIssue name="decks" />
      <ol className="flex flex-col gap-2">
        {decks.fields.map((field, i) => (
          <li
            key={field.id}
            className="grid grid-cols-[1fr_2fr_1fr_auto] items-start gap-2 rounded-md border border-paper-sunk p-2"
          >
            <TextField name={`decks.${i}.id`} label="Id" />
            <TextField name={`decks.${i}.name`} label="Name" />
            <NumberField name={`decks.${i}.elevationMm`} label="Elevation (mm)" />
            <RemoveCell
              onClick={() => decks.remove(i)}
              label={`Remove deck ${i + 1}`}
              disabled={decks.fields.length <= 1}
            />
          </li>
        ))}
      </ol>
    </div>
  );
}
