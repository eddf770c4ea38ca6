// The development mailbox: what the loopback fake SMTP server caught. Mounted only while the fake is in
// use, so a deployment with a real relay has no such route. Open without sign-in: the person reading a
// reset mail is by definition not signed in, and the fake only ever runs on the developer's machine.
import express from 'express';
import type { CaughtMailbox } from '../mail/mailbox';

export function mailboxRouter(mailbox: CaughtMailbox) {
  const router = express.Router();
  router.get('/dev/mailbox', (_req, res) => {
    res.json({
      capacity: mailbox.capacity,
      mails: mailbox.list().map((mail) => ({ ...mail, receivedAt: mail.receivedAt.toISOString() })),
    });
  });
  return router;
}
