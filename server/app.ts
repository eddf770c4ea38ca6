// Builds the Express application without listening, so tests drive it with supertest and `index.ts`
// starts it. Order matters: headers and origin check, body parsing, session, routers, the JSON 404 for
// unknown API routes, the client (optional), and one error handler last.
import express from 'express';
import type { DataSource } from 'typeorm';
import type { AppContext } from './app-context';
import { createAuth } from './auth/lucia';
import type { TrustProxy } from './config';
import { prepareDecoy } from './auth/password';
import { createSignInLimiter } from './auth/rate-limit';
import { loadSession } from './auth/session-middleware';
import { errorHandler, sendError, unknownApiRoute } from './http/error-handler';
import { allowedHostNames, refuseUnknownHosts } from './http/host-check';
import { HttpError } from './http/http-error';
import { requireJsonBody } from './http/json-only';
import { BODY_LIMITS, bodyKindOf } from './http/limits';
import { refuseCrossOriginMutations } from './http/origin-check';
import { securityHeaders } from './http/security-headers';
import { noteSuspectText, refuseUnstorableText } from './http/text-check';
import { clientRouter } from './http/static-client';
import type { CaughtMailbox } from './mail/mailbox';
import type { Mailer } from './mail/mailer';
import type { StudyQueueHandle } from './studies/server-studies';
import { accountRouter } from './routes/account';
import { auditRouter } from './routes/audit';
import { invitationsRouter } from './routes/invitations';
import { mailboxRouter } from './routes/mailbox';
import { authRouter } from './routes/auth';
import { membersRouter } from './routes/members';
import { priceListsRouter } from './routes/price-lists';
import { projectsRouter } from './routes/projects';
import { revisionsRouter } from './routes/revisions';
import { runsRouter } from './routes/runs';
import { scenariosRouter } from './routes/scenarios';
import { studiesRouter } from './routes/studies';
import { sharesRouter } from './routes/shares';
import { comparisonsRouter } from './routes/comparisons';
import { timeStudiesRouter } from './routes/time-studies';
import { exceptTimeStudyUploads } from './time-studies/upload-route';

export interface CreateAppOptions {
  dataSource: DataSource;
  /** The built client (vite's output); served with index.html as the fallback for the client's routes. */
  clientDir?: string;
  /** The origin users reach the app at, e.g. https://lanewright.example.test. */
  publicOrigin?: string;
  /** Express's `trust proxy`: which proxies may tell the client's address (sign-in limits count per address). */
  trustProxy?: TrustProxy;
  /** The address the server listens on and extra host names it answers to (besides loopback names). */
  listenHost?: string;
  allowedHosts?: readonly string[];
  /** How mail leaves; without it every send fails with a logged line (apps that never mail, like some tests). */
  mailer?: Mailer;
  /** The fake SMTP server's catch; mounts the development mailbox routes when given. */
  mailbox?: CaughtMailbox;
  /** The started job queue: server studies are refused without it. */
  queue?: StudyQueueHandle;
}

const noMailer: Mailer = {
  send: () => Promise.reject(new Error('this app was started without a mailer')),
};

export function createApp(opts: CreateAppOptions): express.Express {
  const publicOrigin = opts.publicOrigin ? new URL(opts.publicOrigin).origin : undefined;
  const ctx: AppContext = {
    ds: opts.dataSource,
    auth: createAuth(opts.dataSource),
    publicOrigin,
    signInLimiter: createSignInLimiter(opts.dataSource),
    mailer: opts.mailer ?? noMailer,
    mailbox: opts.mailbox,
    queue: opts.queue,
  };
  void prepareDecoy();
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', opts.trustProxy ?? false);
  app.use(
    refuseUnknownHosts(
      allowedHostNames({ publicOrigin, listenHost: opts.listenHost, allowedHosts: opts.allowedHosts }),
    ),
  );
  app.set('etag', false);
  app.use(securityHeaders(publicOrigin?.startsWith('https:') ?? false));

  const api = express.Router();
  api.use(refuseCrossOriginMutations(publicOrigin));
  api.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });
  api.use(exceptTimeStudyUploads(requireJsonBody));
  const parsers = Object.fromEntries(
    Object.entries(BODY_LIMITS).map(([kind, limit]) => [
      kind,
      express.json({ limit, strict: true, verify: noteSuspectText }),
    ]),
  );
  api.use((req, res, next) => parsers[bodyKindOf(req)](req, res, next));
  api.use(refuseUnstorableText);
  api.use(loadSession(ctx.auth, publicOrigin));
  for (const router of [
    authRouter,
    projectsRouter,
    scenariosRouter,
    revisionsRouter,
    runsRouter,
    studiesRouter,
    membersRouter,
    invitationsRouter,
    accountRouter,
    sharesRouter,
    comparisonsRouter,
    priceListsRouter,
    auditRouter,
    timeStudiesRouter,
  ])
    api.use(router(ctx));
  if (ctx.mailbox) api.use(mailboxRouter(ctx.mailbox));
  api.use(unknownApiRoute);
  app.use('/api', api);

  if (opts.clientDir) app.use(clientRouter(opts.clientDir));
  app.use((req, res) => sendError(res, new HttpError(404, 'not_found', `Nothing is served at ${req.path}.`)));
  app.use(errorHandler);
  return app;
}
