// A plain data table that scrolls sideways on narrow screens instead of squashing.
import type { ComponentProps } from 'react';

export function Table({ caption, className = '', children, ...rest }: ComponentProps<'table'> & { caption: string }) {
  return (
    // Relative, so screen-reader-only text in cells is positioned inside the scrolling box, not the page.
    <div className="relative overflow-x-auto">
      <table className={`w-full border-collapse text-left text-sm ${className}`} {...rest}>
        <caption className="sr-only">{caption}</caption>
        {children}
      </table>
    </div>
  );
}

export function Th({ className = '', ...rest }: ComponentProps<'th'>) {
  return (
    <th
      scope="col"
      className={`border-b border-ink-faint/40 px-3 py-2 font-semibold text-ink-soft ${className}`}
      {...rest}
    />
  );
}

export function Td({ className = '', ...rest }: ComponentProps<'td'>) {
  return <td className={`border-b border-paper-sunk px-3 py-2 align-top ${className}`} {...rest} />;
}
