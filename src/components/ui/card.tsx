// A raised surface that groups one piece of content.
import { useId, type ComponentProps, type ReactNode } from 'react';

export function Card({ className = '', ...rest }: ComponentProps<'section'>) {
  return (
    <section
      className={`rounded-lg border border-paper-sunk bg-paper-raised p-5 shadow-sm sm:p-6 ${className}`}
      {...rest}
    />
  );
}

export function CardTitle({ className = '', ...rest }: ComponentProps<'h2'>) {
  return <h2 className={`text-lg font-semibold text-ink ${className}`} {...rest} />;
}

/** A card headed by its own title, which also names the region for screen readers. */
export function TitledCard({
  title,
  children,
  className = '',
}: {
  title: string;
  children: ReactNode;
  className?: string;
}) {
  const id = useId();
  return (
    <Card aria-labelledby={id} className={className}>
      <CardTitle id={id} className="mb-4">
        {title}
      </CardTitle>
      {children}
    </Card>
  );
}
