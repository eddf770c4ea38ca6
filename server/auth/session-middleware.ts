// Reads the session cookie on every API request and puts the user on `req`. A session lucia has just
// extended is written back (sliding expiry); an unknown or expired one is cleared from the browser.
import type { RequestHandler } from 'express';
import type { Auth } from './lucia';
import { writeSessionCookie } from './session-cookie';

export function loadSession(auth: Auth, publicOrigin?: string): RequestHandler {
  return async (req, res, next) => {
    const sessionId = auth.readSessionCookie(req.get('cookie') ?? '');
    if (!sessionId) return next();
    const { session, user } = await auth.validateSession(sessionId);
    if (!session) {
      writeSessionCookie(req, res, auth.createBlankSessionCookie(), publicOrigin);
      return next();
    }
    if (session.fresh) writeSessionCookie(req, res, auth.createSessionCookie(session.id), publicOrigin);
    req.user = { id: user.id, email: user.email, name: user.name };
    req.sessionId = session.id;
    next();
  };
}
