// Sends Lanewright's notices (invitations, password resets, sign-up links) through nodemailer over SMTP:
// the loopback fake in development and tests, the configured relay in production.
import nodemailer from 'nodemailer';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
}

export interface SmtpSettings {
  host: string;
  port: number;
  /** True for implicit TLS (port 465); otherwise STARTTLS is used when the server offers it. */
  secure: boolean;
  user?: string;
  password?: string;
  from: string;
  /** The loopback fake offers no TLS; a real relay must not be talked to in the clear when it offers it. */
  ignoreTls?: boolean;
}

export function createSmtpMailer(settings: SmtpSettings): Mailer {
  const transport = nodemailer.createTransport({
    host: settings.host,
    port: settings.port,
    secure: settings.secure,
    ignoreTLS: settings.ignoreTls ?? false,
    auth: settings.user ? { user: settings.user, pass: settings.password ?? '' } : undefined,
    // Bounded waits, so a dead relay cannot hold sends open for minutes.
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: settings.from, to: mail.to, subject: mail.subject, text: mail.text });
    },
  };
}

/**
 * Sends without making the request wait for the relay: the answer (and its timing) must not depend on
 * whether a mail went out, and a slow relay must not slow sign-in pages. Failures are logged in one line.
 */
export function sendInBackground(mailer: Mailer, mail: OutgoingMail): void {
  mailer.send(mail).catch((error: unknown) => {
    console.error(
      `Mail "${mail.subject}" could not be sent: ${error instanceof Error ? error.message : String(error)}`,
    );
  });
}
