// Any address the app does not know.
import { NotFoundMessage } from '../../components/not-found-message';

export function NotFoundRoute() {
  return <NotFoundMessage what="page" />;
}
