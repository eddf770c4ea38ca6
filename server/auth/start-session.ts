// Signs a user in on this browser: a fresh session (never one that existed before, so no session fixation),
// the cookie, the sign-in time, and the "who am I" answer.
import type { Request, Response } from 'express';
import type { Me } from '../../shared/api/auth';
import { membershipsOf } from '../access/membership';
import type { AppContext } from '../app-context';
import { UserEntity } from '../db/entities';
import type { SignedInUser } from '../http/request-context';
import { toMe } from '../mappers/organisations';
import { writeSessionCookie } from './session-cookie';

export async function startSession(
  ctx: AppContext,
  req: Request,
  res: Response,
  user: SignedInUser,
  status: number,
  wrap: (me: Me) => unknown = (me) => me,
): Promise<void> {
  if (req.sessionId) await ctx.auth.invalidateSession(req.sessionId);
  const session = await ctx.auth.createSession(user.id, {});
  await ctx.ds.getRepository(UserEntity).update({ id: user.id }, { lastSignInAt: new Date() });
  writeSessionCookie(req, res, ctx.auth.createSessionCookie(session.id), ctx.publicOrigin);
  res.status(status).json(wrap(toMe(user, await membershipsOf(ctx.ds, user.id))));
}
