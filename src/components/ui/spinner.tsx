// A small rotating ring. The label is read by screen readers; pass `inline`
// inside buttons where the button's own text already says what is happening.
interface SpinnerProps {
  label?: string;
  className?: string;
}

export function Spinner({ label, className = '' }: SpinnerProps) {
  return (
    <span className={`inline-flex items-center gap-2 ${className}`} role={label ? 'status' : undefined}>
      <span
        aria-hidden="true"
        className="size-4 animate-spin rounded-full border-2 border-current border-r-transparent"
      />
      {label && <span className="text-ink-soft">{label}</span>}
    </span>
  );
}

export function PageSpinner({ label }: { label: string }) {
  return (
    <div className="flex min-h-40 items-center justify-center">
      <Spinner label={label} />
    </div>
  );
}
