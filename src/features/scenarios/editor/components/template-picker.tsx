// Starting over from one of Lanewright's example layouts. The chosen example replaces the draft
// (keeping this scenario's name); nothing is saved until the user saves.
import { useId, useState } from 'react';
import { Button } from '../../../../components/ui/button';
import { exampleScenarios } from '../../../../lib/examples/examples';
import { TEMPLATE_NOTES } from '../../../../lib/examples/template-notes';

export function TemplatePicker({
  onPick,
}: {
  onPick: (document: (typeof exampleScenarios)[number]['document']) => void;
}) {
  const id = useId();
  const [chosen, setChosen] = useState(exampleScenarios[0]?.id ?? '');
  const example = exampleScenarios.find((e) => e.id === chosen);
  return (
    <div className="flex flex-col gap-2">
      <label htmlFor={id} className="text-xs font-semibold text-ink">
        Start over from a template
      </label>
      <div className="flex flex-wrap gap-2">
        <select
          id={id}
          value={chosen}
          onChange={(e) => setChosen(e.target.value)}
          className="min-w-0 flex-1 rounded border border-ink-faint bg-paper-raised px-2 py-1.5 text-sm"
        >
          {exampleScenarios.map((e) => (
            <option key={e.id} value={e.id}>
              {TEMPLATE_NOTES[e.id]?.title ?? e.document.name}
            </option>
          ))}
        </select>
        <Button variant="secondary" disabled={!example} onClick={() => example && onPick(example.document)}>
          Use as draft
        </Button>
      </div>
      {example && (
        <p className="text-xs text-ink-soft">{TEMPLATE_NOTES[example.id]?.summary ?? example.document.description}</p>
      )}
    </div>
  );
}
