// The top of every page: an optional trail back, the title, and the page's main actions.
import type { ReactNode } from 'react';

interface PageHeaderProps {
  title: string;
  trail?: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
}

export function PageHeader({ title, trail, description, actions }: PageHeaderProps) {
  return (
    <div className="flex flex-col gap-3 border-b border-paper-sunk pb-6">
      {trail && (
        <nav aria-label="Breadcrumb" className="text-sm text-ink-soft">
          {trail}
        </nav>
      )}
      <div className="flex flex-col gap-4 sm:flex-row sm:items-start sm:justify-between">
        <div className="flex min-w-0 flex-col gap-2">
          <h1 className="text-2xl font-semibold break-words text-ink sm:text-3xl">{title}</h1>
          {description && <div className="max-w-prose text-ink-soft">{description}</div>}
        </div>
        {actions && <div className="flex shrink-0 flex-wrap gap-2">{actions}</div>}
      </div>
    </div>
  );
}
