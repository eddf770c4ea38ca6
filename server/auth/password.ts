// Password hashing with argon2id (the library's default algorithm) at the parameters OWASP's Password
// Storage Cheat Sheet lists for argon2id (m=19 MiB, t=2, p=1).
import { hash, verify } from '@node-rs/argon2';

const options = { memoryCost: 19456, timeCost: 2, parallelism: 1, outputLen: 32 };

export function hashPassword(password: string): Promise<string> {
  return hash(password, options);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

let decoyHash: Promise<string> | undefined;

/** Computes the decoy ahead of the first sign-in, so even that one takes no longer for unknown e-mails. */
export function prepareDecoy(): Promise<string> {
  decoyHash ??= hashPassword('lanewright-decoy-password');
  return decoyHash;
}

/**
 * Spends the same work as a real check when the e-mail is unknown, so response time does not tell
 * whether an account exists.
 */
export async function verifyAgainstDecoy(password: string): Promise<false> {
  await verifyPassword(await prepareDecoy(), password);
  return false;
}
