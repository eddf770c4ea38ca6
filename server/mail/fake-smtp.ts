// A local SMTP server on loopback that accepts every message and keeps it in a CaughtMailbox, so
// development and tests send real mail over a real SMTP connection without it ever leaving the machine.
import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { CaughtMailbox } from './mailbox';

/** Mails are short notices with a link; anything bigger is refused rather than buffered. */
export const FAKE_SMTP_MAX_BYTES = 256 * 1024;

export interface FakeSmtp {
  host: string;
  port: number;
  mailbox: CaughtMailbox;
  close(): Promise<void>;
}

function addressesOf(field: AddressObject | AddressObject[] | undefined): string[] {
  const groups = field === undefined ? [] : Array.isArray(field) ? field : [field];
  return groups.flatMap((group) => group.value.map((entry) => entry.address ?? '')).filter((address) => address !== '');
}

export async function startFakeSmtp(options: {
  port: number;
  host?: string;
  mailbox?: CaughtMailbox;
}): Promise<FakeSmtp> {
  const host = options.host ?? '127.0.0.1';
  const mailbox = options.mailbox ?? new CaughtMailbox();
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['AUTH', 'STARTTLS'],
    size: FAKE_SMTP_MAX_BYTES,
    logger: false,
    // Loopback only: a reverse DNS lookup per connection would only add a delay.
    disableReverseLookup: true,
    banner: 'Lanewright development mailbox (nothing is delivered)',
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          // smtp-server sets this flag once the stream passed `size`; the message is then refused whole.
          if ((stream as unknown as { sizeExceeded?: boolean }).sizeExceeded)
            return callback(new Error('Message is larger than the mailbox accepts'));
          mailbox.add({
            receivedAt: new Date(),
            from: addressesOf(parsed.from).join(', '),
            to: addressesOf(parsed.to),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
          });
          callback();
        })
        .catch((error: unknown) => callback(error instanceof Error ? error : new Error(String(error))));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  // smtp-server keeps the net.Server it listens with on `server`.
  const address = (server as unknown as { server: { address(): AddressInfo } }).server.address();
  return {
    host,
    port: address.port,
    mailbox,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
