// Where to go after signing in. Only paths inside this site are accepted, so a
// crafted link cannot send a freshly signed-in user to another origin.
const RETURN_PARAM = 'returnTo';

export function safeReturnTo(search: string): string {
  const value = new URLSearchParams(search).get(RETURN_PARAM);
  if (!value || !value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) return '/';
  return value;
}

export function signInPath(returnTo?: string): string {
  if (!returnTo || returnTo === '/' || returnTo.startsWith('/sign-')) return '/sign-in';
  return `/sign-in?${new URLSearchParams({ [RETURN_PARAM]: returnTo })}`;
}

/** Keeps the return address when the user switches between sign-in and sign-up. */
export function withSameReturn(path: string, search: string): string {
  const value = new URLSearchParams(search).get(RETURN_PARAM);
  return value ? `${path}?${new URLSearchParams({ [RETURN_PARAM]: value })}` : path;
}

/**
 * Navigation state marking a deliberate sign-out. The sign-in page then forgets
 * the session itself: forgetting it earlier, while a guarded page is still on
 * screen, would make the guard send the user back with a "return to" address.
 */
export const SIGNED_OUT_STATE = { signedOut: true } as const;

export function isSignedOutState(state: unknown): boolean {
  return typeof state === 'object' && state !== null && (state as { signedOut?: unknown }).signedOut === true;
}
