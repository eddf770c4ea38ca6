// What an empty list shows: what is missing and what to do next.
import type { ReactNode } from 'react';

interface EmptyStateProps {
  title: string;
  children: ReactNode;
  action?: ReactNode;
}

export function EmptyState({ title, children, action }: EmptyStateProps) {
  return (
    <div className="flex flex-col items-start gap-3 rounded-lg border-2 border-dashed border-ink-faint/50 bg-paper p-6 sm:p-8">
      <h3 className="text-lg font-semibold text-ink">{title}</h3>
      <div className="max-w-prose text-ink-soft">{children}</div>
      {action}
    </div>
  );
}
