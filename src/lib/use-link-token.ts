// The secret of an e-mailed or shared link travels after the `#`, so it never reaches server logs or
// other sites' Referer headers; pages read it here.
import { useLocation } from 'react-router-dom';
import { linkTokenSchema } from '../../shared/api/tokens';

/** The token in the address's fragment, or null when it is missing or cut short. */
export function useLinkToken(): string | null {
  const { hash } = useLocation();
  const parsed = linkTokenSchema.safeParse(hash.replace(/^#/, ''));
  return parsed.success ? parsed.data : null;
}
