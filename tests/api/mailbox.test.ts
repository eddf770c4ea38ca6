// Mail over real SMTP to the loopback fake: nodemailer delivers, the fake keeps a bounded catch, oversized
// messages are refused, and the development mailbox route exists only while the fake is in use.
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { FAKE_SMTP_MAX_BYTES, startFakeSmtp } from '../../server/mail/fake-smtp';
import { CaughtMailbox } from '../../server/mail/mailbox';
import { createSmtpMailer } from '../../server/mail/mailer';
import { apiRoutes } from '../../shared/api/routes';
import { useCleanDatabase } from './fixtures/database';

const db = useCleanDatabase();
const smtp = startFakeSmtp({ port: 0, mailbox: new CaughtMailbox(3) });
const mailerFor = async () => {
  const { host, port } = await smtp;
  return createSmtpMailer({
    host,
    port,
    secure: false,
    ignoreTls: true,
    from: 'Lanewright <no-reply@lanewright.localhost>',
  });
};

afterAll(async () => (await smtp).close());

describe('fake SMTP server', () => {
  it('catches a mail sent through nodemailer, with its links', async () => {
    const mailer = await mailerFor();
    await mailer.send({
      to: 'reader@example.test',
      subject: 'Übung macht den Meister',
      text: 'Open http://127.0.0.1:3000/reset-password#abc to go on.\nAnd https://example.test/x.',
    });
    const [mail] = (await smtp).mailbox.list();
    expect(mail).toMatchObject({
      to: ['reader@example.test'],
      from: 'no-reply@lanewright.localhost',
      subject: 'Übung macht den Meister',
    });
    expect(mail.links).toEqual(['http://127.0.0.1:3000/reset-password#abc', 'https://example.test/x.']);
  });

  it('keeps only the newest mails up to its capacity', async () => {
    const mailer = await mailerFor();
    for (let i = 1; i <= 5; i += 1) await mailer.send({ to: 'many@example.test', subject: `Number ${i}`, text: 'x' });
    expect((await smtp).mailbox.list().map((m) => m.subject)).toEqual(['Number 5', 'Number 4', 'Number 3']);
  });

  it('refuses a message larger than it accepts, and keeps nothing of it', async () => {
    const mailer = await mailerFor();
    const before = (await smtp).mailbox.list()[0];
    await expect(
      mailer.send({ to: 'big@example.test', subject: 'Too big', text: 'x'.repeat(FAKE_SMTP_MAX_BYTES + 1024) }),
    ).rejects.toThrow();
    expect((await smtp).mailbox.list()[0]).toBe(before);
  });
});

describe('development mailbox route', () => {
  it('lists the catch, newest first, without sign-in', async () => {
    const { mailbox } = await smtp;
    const app = createApp({ dataSource: db(), mailer: await mailerFor(), mailbox });
    const res = await request(app).get(apiRoutes.mailbox);
    expect(res.status).toBe(200);
    expect(res.body.capacity).toBe(3);
    expect(res.body.mails.map((m: { subject: string }) => m.subject)).toEqual(mailbox.list().map((m) => m.subject));
  });

  it('does not exist when mail goes to a real relay', async () => {
    const res = await request(createApp({ dataSource: db(), mailer: await mailerFor() })).get(apiRoutes.mailbox);
    expect(res.status).toBe(404);
  });
});
