// Starts the HTTP server for an already migrated data source, with the job queue it submits server
// studies to and the mailer of their finish notices. Importing this file starts nothing.
import { once } from 'node:events';
import type { AddressInfo } from 'node:net';
import type { DataSource } from 'typeorm';
import { createApp } from './app';
import { sweepExpiredSessions } from './auth/session-sweeper';
import { loadConfig } from './config';
import type { CaughtMailbox } from './mail/mailbox';
import { setUpMail } from './mail/mail-setup';
import { databaseUrlOf } from './db/data-source';
import { startQueue, stopQueue } from './queue/queue-client';
import { startFinishNotices } from './studies/finish-notices';

export interface StartServerOptions {
  dataSource: DataSource;
  port: number;
  host: string;
  clientDir?: string;
  publicOrigin?: string;
  /** Overrides LANEWRIGHT_FAKE_SMTP_PORT (tests pass 0 for any free port). */
  fakeSmtpPort?: number;
}

export interface RunningServer {
  url: string;
  /** Present while mail goes to the loopback fake. */
  mailbox?: CaughtMailbox;
  /** One line on where mail goes, for the start-up log. */
  mailNote: string;
  close(): Promise<void>;
}

export async function startServer(opts: StartServerOptions): Promise<RunningServer> {
  if (!opts.dataSource.isInitialized) await opts.dataSource.initialize();
  // Parsing the whole environment here makes a bad setting stop the start with a readable list.
  const config = loadConfig();
  const mail = await setUpMail({
    ...config,
    LANEWRIGHT_FAKE_SMTP_PORT: opts.fakeSmtpPort ?? config.LANEWRIGHT_FAKE_SMTP_PORT,
  });
  const boss = await startQueue(databaseUrlOf(opts.dataSource), {
    checkSeconds: config.LANEWRIGHT_QUEUE_CHECK_SECONDS,
  });
  const app = createApp({
    dataSource: opts.dataSource,
    clientDir: opts.clientDir,
    publicOrigin: opts.publicOrigin ?? config.PUBLIC_ORIGIN,
    trustProxy: config.TRUST_PROXY,
    listenHost: opts.host,
    allowedHosts: config.ALLOWED_HOSTS,
    mailer: mail.mailer,
    mailbox: mail.mailbox,
    queue: { boss, timeLimitSeconds: config.LANEWRIGHT_JOB_TIME_LIMIT_SECONDS },
  });
  const server = app.listen(opts.port, opts.host);
  try {
    await once(server, 'listening');
  } catch (error) {
    await stopQueue(boss);
    await mail.close();
    throw error;
  }
  const stopSweeping = sweepExpiredSessions(opts.dataSource);
  const { port } = server.address() as AddressInfo;
  const host = opts.host.includes(':') ? `[${opts.host}]` : opts.host;
  const url = `http://${host}:${port}`;
  const notices = startFinishNotices({
    ds: opts.dataSource,
    boss,
    mailer: mail.mailer,
    origin: opts.publicOrigin ?? config.PUBLIC_ORIGIN ?? url,
    mailAfterMinutes: config.LANEWRIGHT_STUDY_MAIL_AFTER_MINUTES,
  });
  return {
    url,
    mailbox: mail.mailbox,
    mailNote: mail.describe,
    close: async () => {
      stopSweeping();
      await new Promise<void>((resolve, reject) => {
        server.close((error) => (error ? reject(error) : resolve()));
        server.closeAllConnections();
      });
      await notices.stop();
      await stopQueue(boss);
      await mail.close();
    },
  };
}
