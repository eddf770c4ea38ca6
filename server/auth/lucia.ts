// Session handling: lucia issues and validates sessions; cookies are written by `session-cookie.ts` so the
// Secure flag can follow each request's scheme.
import { Lucia, TimeSpan } from 'lucia';
import type { DataSource } from 'typeorm';
import { createSessionAdapter } from './session-adapter';

export const SESSION_COOKIE_NAME = 'lanewright_session';

export function createAuth(ds: DataSource) {
  return new Lucia(createSessionAdapter(ds), {
    // lucia extends a session when less than half of this remains, which makes the expiry slide.
    sessionExpiresIn: new TimeSpan(30, 'd'),
    sessionCookie: { name: SESSION_COOKIE_NAME, attributes: { sameSite: 'lax', path: '/' } },
    getUserAttributes: (attributes) => ({ email: attributes.email, name: attributes.name }),
  });
}

export type Auth = ReturnType<typeof createAuth>;

declare module 'lucia' {
  interface Register {
    Lucia: Auth;
    DatabaseUserAttributes: { email: string; name: string };
  }
}
