// The secret part of an e-mailed or shared link: 32 random bytes in base64url (43 characters).
import { z } from 'zod';

export const linkTokenSchema = z
  .string({ message: 'must be text' })
  .regex(/^[A-Za-z0-9_-]{43}$/, { message: 'is not a valid link; copy the whole address from the e-mail or message' });

export const tokenParamsSchema = z.object({ token: linkTokenSchema });
