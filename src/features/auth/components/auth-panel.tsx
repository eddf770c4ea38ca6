// The narrow, centred panel the sign-in and sign-up pages share.
import type { ReactNode } from 'react';
import { Card } from '../../../components/ui/card';

export function AuthPanel({
  title,
  intro,
  children,
  footer,
}: {
  title: string;
  intro: string;
  children: ReactNode;
  footer: ReactNode;
}) {
  return (
    <div className="mx-auto flex w-full max-w-md flex-col gap-6 py-6 sm:py-10">
      <div className="flex flex-col gap-2">
        <h1 className="text-2xl font-semibold text-ink sm:text-3xl">{title}</h1>
        <p className="text-ink-soft">{intro}</p>
      </div>
      <Card>{children}</Card>
      <p className="text-sm text-ink-soft">{footer}</p>
    </div>
  );
}
