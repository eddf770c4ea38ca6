// Chooses how mail leaves the server: the relay named by SMTP_HOST, or else a fake SMTP server on loopback
// whose catch the development mailbox page shows. Either way mail goes through nodemailer over SMTP.
import type { ServerConfig } from '../config';
import { startFakeSmtp } from './fake-smtp';
import type { CaughtMailbox } from './mailbox';
import { createSmtpMailer, type Mailer } from './mailer';

export interface MailSetup {
  mailer: Mailer;
  /** Present only while the fake is in use; the mailbox page exists only then. */
  mailbox?: CaughtMailbox;
  describe: string;
  close(): Promise<void>;
}

type MailConfig = Pick<
  ServerConfig,
  'SMTP_HOST' | 'SMTP_PORT' | 'SMTP_SECURE' | 'SMTP_USER' | 'SMTP_PASSWORD' | 'MAIL_FROM' | 'LANEWRIGHT_FAKE_SMTP_PORT'
>;

export async function setUpMail(config: MailConfig): Promise<MailSetup> {
  if (config.SMTP_HOST) {
    const mailer = createSmtpMailer({
      host: config.SMTP_HOST,
      port: config.SMTP_PORT,
      secure: config.SMTP_SECURE === 'on',
      user: config.SMTP_USER,
      password: config.SMTP_PASSWORD,
      from: config.MAIL_FROM,
    });
    return { mailer, describe: `mail goes out through ${config.SMTP_HOST}:${config.SMTP_PORT}`, close: async () => {} };
  }
  const fake = await startFakeSmtp({ port: config.LANEWRIGHT_FAKE_SMTP_PORT }).catch((error: unknown) => {
    if ((error as NodeJS.ErrnoException).code !== 'EADDRINUSE') throw error;
    // Worded so the HTTP port's "in use" advice does not claim this error for itself.
    throw new Error(
      `the mail catcher cannot listen on 127.0.0.1:${config.LANEWRIGHT_FAKE_SMTP_PORT}, another program holds it; choose another with LANEWRIGHT_FAKE_SMTP_PORT (0 picks any free port) or set SMTP_HOST`,
    );
  });
  const mailer = createSmtpMailer({
    host: fake.host,
    port: fake.port,
    secure: false,
    ignoreTls: true,
    from: config.MAIL_FROM,
  });
  return {
    mailer,
    mailbox: fake.mailbox,
    describe: `mail is caught by a fake SMTP server on ${fake.host}:${fake.port} (see /dev/mailbox; set SMTP_HOST to send real mail)`,
    close: fake.close,
  };
}
