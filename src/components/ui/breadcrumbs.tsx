// The trail from the project list to the current page; the last item is where the user is.
import { Link } from 'react-router-dom';

export interface Crumb {
  label: string;
  /** Absent on the current page. */
  to?: string;
}

export function Breadcrumbs({ items }: { items: Crumb[] }) {
  return (
    <ol className="flex flex-wrap gap-x-2">
      {items.map((item, index) => (
        <li key={`${index}-${item.label}`} aria-current={item.to ? undefined : 'page'}>
          {item.to ? (
            <>
              <Link className="underline underline-offset-4 hover:text-ink" to={item.to}>
                {item.label}
              </Link>
              <span aria-hidden="true"> /</span>
            </>
          ) : (
            item.label
          )}
        </li>
      ))}
    </ol>
  );
}
