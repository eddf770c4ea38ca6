// A list of numbers typed as text ("250, 500, 1000" or one measured time per line). The text is kept
// as typed while it is edited, and the numbers it holds go to the form; words become NaN, which the
// schema names.
import { useId, useState } from 'react';
import { useController, useFormContext, type FieldPath } from 'react-hook-form';
import { useEditor, type ScenarioForm } from '../editor-context';
import { FieldFrame } from './fields';

export function parseNumberList(text: string): number[] {
  return text
    .split(/[\s,;]+/)
    .filter((part) => part !== '')
    .map(Number);
}

const show = (value: unknown) => (Array.isArray(value) ? value.join(', ') : '');

export function NumberListField({
  name,
  label,
  hint,
  rows = 1,
}: {
  name: string;
  label: string;
  hint?: string;
  rows?: number;
}) {
  const id = useId();
  const { control } = useFormContext<ScenarioForm>();
  const { clearExternal, readOnly } = useEditor();
  const { field } = useController({ control, name: name as FieldPath<ScenarioForm> });
  const [text, setText] = useState(() => show(field.value));
  // A reset from outside (import, discard) replaces the numbers; show them unless the text already says so.
  const current = show(field.value);
  const shown = show(parseNumberList(text)) === current ? text : current;
  const classes =
    'block w-full rounded border border-ink-faint bg-paper-raised px-2 py-1.5 text-sm text-ink tabular-nums disabled:bg-paper-sunk';
  const onChange = (value: string) => {
    setText(value);
    clearExternal(name);
    field.onChange(parseNumberList(value));
  };
  return (
    <FieldFrame id={id} name={name} label={label} hint={hint}>
      {(describedBy, invalid) =>
        rows > 1 ? (
          <textarea
            id={id}
            rows={rows}
            disabled={readOnly}
            aria-invalid={invalid || undefined}
            aria-describedby={describedBy}
            className={`${classes} ${invalid ? 'border-danger' : ''}`}
            value={shown}
            onChange={(e) => onChange(e.target.value)}
            onBlur={field.onBlur}
          />
        ) : (
          <input
            id={id}
            type="text"
            disabled={readOnly}
            aria-invalid={invalid || undefined}
            aria-describedby={describedBy}
            className={`${classes} ${invalid ? 'border-danger' : ''}`}
            value={shown}
            onChange={(e) => onChange(e.target.value)}
            onBlur={field.onBlur}
          />
        )
      }
    </FieldFrame>
  );
}
