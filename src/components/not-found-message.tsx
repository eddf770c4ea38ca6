// What a page shows when the thing it was asked for does not exist or is not shared with this user.
import { ButtonLink } from './ui/button';
import { EmptyState } from './ui/empty-state';

export function NotFoundMessage({ what }: { what: string }) {
  return (
    <EmptyState title={`This ${what} was not found`} action={<ButtonLink to="/">Go to your projects</ButtonLink>}>
      It may have been deleted, the link may be mistyped, or it belongs to an organisation you are not a member of.
    </EmptyState>
  );
}
