// A short label beside a name, such as a member's role.
import type { ReactNode } from 'react';

export type BadgeTone = 'accent' | 'neutral' | 'caution';

const tones: Record<BadgeTone, string> = {
  accent: 'bg-accent-soft text-accent-strong',
  neutral: 'bg-paper-sunk text-ink-soft',
  caution: 'bg-caution-soft text-caution',
};

export function Badge({ tone = 'neutral', children }: { tone?: BadgeTone; children: ReactNode }) {
  return (
    <span
      className={`inline-flex items-center rounded-full px-2.5 py-0.5 text-xs font-semibold uppercase tracking-wide ${tones[tone]}`}
    >
      {children}
    </span>
  );
}
