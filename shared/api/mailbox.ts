// The development mailbox: mails the loopback fake SMTP server caught (only while it is in use).
import { z } from 'zod';
import { isoDateSchema, uuidSchema } from './common';

export const caughtMailSchema = z.object({
  id: uuidSchema,
  receivedAt: isoDateSchema,
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  links: z.array(z.string()),
});

export const mailboxSchema = z.object({ mails: z.array(caughtMailSchema), capacity: z.number().int() });

export type CaughtMailView = z.infer<typeof caughtMailSchema>;
export type Mailbox = z.infer<typeof mailboxSchema>;
