// Compact fields for the scenario editor, bound to the form by dotted path. Each shows the schema's
// message (or the server's or engine's) directly under itself, worded with the field's label.
import { useId, type ReactNode } from 'react';
import { useFormContext, useFormState, useWatch, type FieldPath } from 'react-hook-form';
import { useEditor, type ScenarioForm } from '../editor-context';
import { decimalProblem, parseDecimal } from '../utils/decimal-input';
import { fieldMessage } from '../utils/messages';
import { errorAt } from '../utils/paths';

type Name = string;
const asPath = (name: Name) => name as FieldPath<ScenarioForm>;

const control =
  'block w-full rounded border bg-paper-raised px-2 py-1.5 text-sm text-ink tabular-nums ' +
  'focus-visible:outline-2 focus-visible:outline-offset-1 focus-visible:outline-accent disabled:bg-paper-sunk disabled:text-ink-soft';

/** The message for a path: the schema's first, then anything the server or engine said about it. */
export function useFieldIssue(name: Name): string | undefined {
  const { errors } = useFormState<ScenarioForm>({ name: asPath(name) });
  const { externalIssues } = useEditor();
  return errorAt(errors, name) ?? externalIssues[name];
}

interface FrameProps {
  id: string;
  name: Name;
  label: string;
  hint?: string;
  className?: string;
  /** Said instead of the schema's message (what the field made of the typed text). */
  problem?: string | null;
  children: (describedBy: string | undefined, invalid: boolean) => ReactNode;
}

export function FieldFrame({ id, name, label, hint, className = '', problem, children }: FrameProps) {
  const schemaIssue = useFieldIssue(name);
  const issue = schemaIssue && problem ? problem : schemaIssue;
  const errorId = `${id}-error`;
  const hintId = hint ? `${id}-hint` : undefined;
  const describedBy = [hintId, issue ? errorId : undefined].filter(Boolean).join(' ') || undefined;
  return (
    <div className={`flex min-w-0 flex-col gap-1 ${className}`} data-field={name}>
      <label htmlFor={id} className="text-xs font-semibold text-ink">
        {label}
      </label>
      {children(describedBy, Boolean(issue))}
      {hint && (
        <p id={hintId} className="text-xs text-ink-soft">
          {hint}
        </p>
      )}
      {issue && (
        <p id={errorId} className="text-xs font-medium text-danger" data-field-error={name}>
          {issue === problem ? `${label.replace(/\s*\([^)]*\)$/, '')}: ${problem}` : fieldMessage(label, name, issue)}
        </p>
      )}
    </div>
  );
}

const border = (invalid: boolean) => (invalid ? 'border-danger' : 'border-ink-faint');

/**
 * Empty means "not given", so optional numbers can be cleared and required ones say they are
 * required; either decimal separator is accepted, and anything ambiguous is left for the schema to refuse.
 */
export const numberFromInput = parseDecimal;

interface FieldProps {
  name: Name;
  label: string;
  hint?: string;
  className?: string;
}

/**
 * The id, registration and accessibility attributes every boxed control shares, so each field
 * below only adds what makes it different.
 */
function useBoundControl(name: Name, setValueAs?: (value: unknown) => unknown) {
  const id = useId();
  const { register } = useFormContext<ScenarioForm>();
  const { clearExternal, readOnly } = useEditor();
  const registration = register(asPath(name), { setValueAs, onChange: () => clearExternal(name) });
  const bind = (describedBy: string | undefined, invalid: boolean) => ({
    id,
    disabled: readOnly,
    'aria-invalid': invalid || undefined,
    'aria-describedby': describedBy,
    className: `${control} ${border(invalid)}`,
    ...registration,
  });
  return { id, bind };
}

/**
 * A text box, not type="number": a number input in an English-language browser reads "9,5" as 95,
 * and hides what was typed from the page; here the page reads it and says what it made of it.
 */
export function NumberField({ name, label, hint, className }: FieldProps & { step?: string; min?: number }) {
  const { id, bind } = useBoundControl(name, numberFromInput);
  const typed: unknown = useWatch<ScenarioForm>({ name: asPath(name) });
  return (
    <FieldFrame id={id} name={name} label={label} hint={hint} className={className} problem={decimalProblem(typed)}>
      {(describedBy, invalid) => (
        <input type="text" inputMode="decimal" autoComplete="off" {...bind(describedBy, invalid)} />
      )}
    </FieldFrame>
  );
}

export function TextField({ name, label, hint, className, multiline = false }: FieldProps & { multiline?: boolean }) {
  const { id, bind } = useBoundControl(name);
  return (
    <FieldFrame id={id} name={name} label={label} hint={hint} className={className}>
      {(describedBy, invalid) =>
        multiline ? (
          <textarea rows={3} {...bind(describedBy, invalid)} />
        ) : (
          <input type="text" {...bind(describedBy, invalid)} />
        )
      }
    </FieldFrame>
  );
}

const emptyAsNone = (value: unknown) => (value === '' ? undefined : value);

/** `emptyMeansNone`: the empty option stands for an optional reference that is not set. */
export function SelectField({
  name,
  label,
  hint,
  className,
  options,
  emptyMeansNone = false,
}: FieldProps & { options: readonly { value: string; label: string }[]; emptyMeansNone?: boolean }) {
  const { id, bind } = useBoundControl(name, emptyMeansNone ? emptyAsNone : undefined);
  return (
    <FieldFrame id={id} name={name} label={label} hint={hint} className={className}>
      {(describedBy, invalid) => (
        <select {...bind(describedBy, invalid)}>
          {options.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </select>
      )}
    </FieldFrame>
  );
}

export function CheckField({ name, label, hint, className }: FieldProps) {
  const id = useId();
  const { register } = useFormContext<ScenarioForm>();
  const { clearExternal, readOnly } = useEditor();
  const issue = useFieldIssue(name);
  return (
    <div className={`flex flex-col gap-1 ${className ?? ''}`} data-field={name}>
      <label htmlFor={id} className="flex items-center gap-2 text-sm text-ink">
        <input
          id={id}
          type="checkbox"
          disabled={readOnly}
          className="size-4 accent-accent"
          aria-invalid={Boolean(issue) || undefined}
          {...register(asPath(name), { onChange: () => clearExternal(name) })}
        />
        {label}
      </label>
      {hint && <p className="text-xs text-ink-soft">{hint}</p>}
      {issue && (
        <p className="text-xs font-medium text-danger" data-field-error={name}>
          {fieldMessage(label, name, issue)}
        </p>
      )}
    </div>
  );
}

/** A message about a whole list (e.g. "at least one deck is needed"), shown above it. */
export function ListIssue({ name }: { name: Name }) {
  const issue = useFieldIssue(name);
  if (!issue) return null;
  return (
    <p className="text-sm font-medium text-danger" data-field-error={name}>
      {issue}
    </p>
  );
}
