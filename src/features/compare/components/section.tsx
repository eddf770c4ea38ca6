// One titled part of the comparison; kept whole on a printed page where it fits.
import type { ReactNode } from 'react';
import { Card, CardTitle } from '../../../components/ui/card';

export function Section({ title, id, children }: { title: string; id: string; children: ReactNode }) {
  return (
    <Card aria-labelledby={`${id}-title`} className="flex flex-col gap-3 print-section">
      <CardTitle id={`${id}-title`}>{title}</CardTitle>
      {children}
    </Card>
  );
}
