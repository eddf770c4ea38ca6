// The answer of a study in one box, above its charts.
import type { ReactNode } from 'react';

export function Recommendation({
  title,
  tone,
  children,
}: {
  title: string;
  tone: 'accent' | 'caution';
  children: ReactNode;
}) {
  const border = tone === 'accent' ? 'border-accent bg-accent-soft/50' : 'border-caution bg-caution-soft';
  return (
    <section
      aria-label="Recommendation"
      className={`rounded-md border-l-4 px-4 py-3 ${border}`}
      data-testid="study-recommendation"
    >
      <h3 className="font-semibold text-ink">{title}</h3>
      <p className="mt-1 text-ink">{children}</p>
    </section>
  );
}
