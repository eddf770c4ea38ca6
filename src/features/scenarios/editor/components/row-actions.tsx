// Small buttons for list rows and section headings; hidden when the scenario is read-only.
import type { ReactNode } from 'react';
import { useEditor } from '../editor-context';

const small =
  'inline-flex min-h-8 items-center rounded border border-ink-faint bg-paper-raised px-2 text-xs font-semibold text-ink hover:border-ink ' +
  'focus-visible:outline-2 focus-visible:outline-accent disabled:cursor-not-allowed disabled:opacity-40';

export function SmallButton({
  onClick,
  children,
  label,
  disabled,
}: {
  onClick: () => void;
  children: ReactNode;
  label?: string;
  disabled?: boolean;
}) {
  const { readOnly } = useEditor();
  if (readOnly) return null;
  return (
    <button type="button" className={small} onClick={onClick} aria-label={label} title={label} disabled={disabled}>
      {children}
    </button>
  );
}

export function SectionHeading({
  title,
  children,
  description,
}: {
  title: string;
  children?: ReactNode;
  description?: string;
}) {
  return (
    <div className="flex flex-col gap-1">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="text-base font-semibold text-ink">{title}</h3>
        <div className="flex flex-wrap gap-2">{children}</div>
      </div>
      {description && <p className="text-sm text-ink-soft">{description}</p>}
    </div>
  );
}

/** A row of a master list that opens its item's details when chosen. */
export function PickRow({
  selected,
  onPick,
  invalid,
  children,
  label,
}: {
  selected: boolean;
  onPick: () => void;
  invalid: boolean;
  children: ReactNode;
  label: string;
}) {
  return (
    <button
      type="button"
      onClick={onPick}
      aria-pressed={selected}
      aria-label={label}
      className={`flex w-full min-w-0 items-center gap-2 rounded px-2 py-1.5 text-left text-sm ${selected ? 'bg-accent-soft font-semibold text-accent-strong' : 'hover:bg-paper-sunk'} ${invalid ? 'border-l-4 border-danger' : 'border-l-4 border-transparent'}`}
    >
      {children}
    </button>
  );
}

/** The Remove button at the end of a list row, level with the row's inputs. */
export function RemoveCell({ onClick, label, disabled }: { onClick: () => void; label: string; disabled?: boolean }) {
  return (
    <div className="pt-5">
      <SmallButton onClick={onClick} label={label} disabled={disabled}>
        Remove
      </SmallButton>
    </div>
  );
}
