// Labelled form fields. The label is tied to the control, the hint and the
// error are tied through aria-describedby, and the error is announced politely.
import { useId, type ComponentProps, type ReactNode } from 'react';
import { sentenceFor } from '../../lib/form-errors';

const controlBase =
  'block w-full rounded-md border bg-paper-raised px-3 py-2 text-base text-ink placeholder:text-ink-faint ' +
  'focus-visible:outline-3 focus-visible:outline-offset-1 focus-visible:outline-accent disabled:bg-paper-sunk';

interface FieldFrameProps {
  id: string;
  label: string;
  hint?: string;
  error?: string;
  children: (describedBy: string | undefined, invalid: boolean) => ReactNode;
}

function FieldFrame({ id, label, hint, error, children }: FieldFrameProps) {
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = `${id}-error`;
  const describedBy = [hintId, error ? errorId : undefined].filter(Boolean).join(' ') || undefined;
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="text-sm font-semibold text-ink">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-sm text-ink-soft">
          {hint}
        </p>
      )}
      {children(describedBy, Boolean(error))}
      <p id={errorId} aria-live="polite" className="min-h-5 text-sm font-medium text-danger">
        {error && sentenceFor(label, error)}
      </p>
    </div>
  );
}

const controlClasses = (invalid: boolean) => `${controlBase} ${invalid ? 'border-danger' : 'border-ink-faint'}`;

interface TextFieldProps extends Omit<ComponentProps<'input'>, 'id'> {
  label: string;
  hint?: string;
  error?: string;
}

export function TextField({ label, hint, error, ...input }: TextFieldProps) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error}>
      {(describedBy, invalid) => (
        <input
          id={id}
          aria-invalid={invalid || undefined}
          aria-describedby={describedBy}
          className={controlClasses(invalid)}
          {...input}
        />
      )}
    </FieldFrame>
  );
}

interface TextAreaFieldProps extends Omit<ComponentProps<'textarea'>, 'id'> {
  label: string;
  hint?: string;
  error?: string;
}

export function TextAreaField({ label, hint, error, rows = 3, ...textarea }: TextAreaFieldProps) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error}>
      {(describedBy, invalid) => (
        <textarea
          id={id}
          rows={rows}
          aria-invalid={invalid || undefined}
          aria-describedby={describedBy}
          className={controlClasses(invalid)}
          {...textarea}
        />
      )}
    </FieldFrame>
  );
}

interface SelectFieldProps extends Omit<ComponentProps<'select'>, 'id'> {
  label: string;
  hint?: string;
  error?: string;
}

export function SelectField({ label, hint, error, children, ...select }: SelectFieldProps) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error}>
      {(describedBy, invalid) => (
        <select
          id={id}
          aria-invalid={invalid || undefined}
          aria-describedby={describedBy}
          className={controlClasses(invalid)}
          {...select}
        >
          {children}
        </select>
      )}
    </FieldFrame>
  );
}
