// What every router needs: the data source, the session service, the app's public origin and the mailer.
import type { DataSource } from 'typeorm';
import type { Auth } from './auth/lucia';
import type { SignInLimiter } from './auth/rate-limit';
import type { CaughtMailbox } from './mail/mailbox';
import type { Mailer } from './mail/mailer';
import type { StudyQueueHandle } from './studies/server-studies';

export interface AppContext {
  ds: DataSource;
  auth: Auth;
  publicOrigin?: string;
  signInLimiter: SignInLimiter;
  mailer: Mailer;
  /** Only while mail goes to the loopback fake: what it caught, for the development mailbox page. */
  mailbox?: CaughtMailbox;
  /** The job queue for server studies; without it, studies can run in the browser only. */
  queue?: StudyQueueHandle;
}
