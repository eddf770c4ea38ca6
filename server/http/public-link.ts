// Absolute addresses for links in mails and share answers: the configured public origin, or else the
// origin this request came in on (the Host header is checked before any route runs).
import type { Request } from 'express';

export function publicLink(req: Request, publicOrigin: string | undefined, path: string): string {
  const origin = publicOrigin ?? `${req.protocol}://${req.get('host') ?? '127.0.0.1'}`;
  return new URL(path, origin).toString();
}
