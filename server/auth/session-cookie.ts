// Writes and clears the session cookie. HttpOnly and SameSite=Lax always; Secure whenever the request came
// over https or the app's public origin is https.
import type { Request, Response } from 'express';
import type { Cookie } from 'lucia';

export function isSecureRequest(req: Request, publicOrigin?: string): boolean {
  return req.secure || (publicOrigin?.startsWith('https:') ?? false);
}

export function writeSessionCookie(req: Request, res: Response, cookie: Cookie, publicOrigin?: string): void {
  res.cookie(cookie.name, cookie.value, {
    httpOnly: true,
    sameSite: 'lax',
    path: '/',
    secure: isSecureRequest(req, publicOrigin),
    ...(cookie.attributes.maxAge !== undefined ? { maxAge: cookie.attributes.maxAge * 1000 } : {}),
  });
}
