// A raised surface that groups one piece of content.
import type { ComponentProps } from 'react';

export function Card({ className = '', ...rest }: ComponentProps<'section'>) {
  return <section className={`rounded-lg border border-paper-sunk bg-paper-raised p-5 shadow-sm sm:p-6 ${className}`} {...rest} />;
}

export function CardTitle({ className = '', ...rest }: ComponentProps<'h2'>) {
  return <h2 className={`text-lg font-semibold text-ink ${className}`} {...rest} />;
}
