// A problem that belongs to no single field. role="alert" makes screen
// readers announce it the moment it appears.
import type { ReactNode } from 'react';

interface ErrorBannerProps {
  title: string;
  children?: ReactNode;
  action?: ReactNode;
}

export function ErrorBanner({ title, children, action }: ErrorBannerProps) {
  return (
    <div
      role="alert"
      className="flex flex-col gap-2 rounded-md border-l-4 border-danger bg-danger-soft px-4 py-3 text-ink"
    >
      <p className="font-semibold">{title}</p>
      {children && <div className="text-sm">{children}</div>}
      {action}
    </div>
  );
}
