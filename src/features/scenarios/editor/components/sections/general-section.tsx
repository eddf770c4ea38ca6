// Name, description and the takt the line must reach.
import { NumberField, TextField } from '../fields';
import { SectionHeading } from '../row-actions';

export function GeneralSection() {
  return (
    <div className="flex flex-col gap-4">
      <SectionHeading title="General" description="What this layout is, and the takt the sales plan needs from it." />
      <TextField name="name" label="Scenario name" />
      <TextField name="description" label="Description" multiline />
      <NumberField
        name="targetTaktSeconds"
        label="Target takt (s)"
        hint="Seconds per part the line must reach; leave empty if not yet known. The line-balance chart compares each step with it."
      />
    </div>
  );
}
