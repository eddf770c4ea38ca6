// Issuing and spending single-use e-mailed links (password resets, sign-up links). Spending locks the row,
// so two clicks at once cannot both succeed; unknown, used and expired links get one and the same answer.
import { MoreThan, type DataSource, type EntityManager } from 'typeorm';
import { OneTimeTokenEntity, type TokenPurpose } from '../db/entities/one-time-token.entity';
import { badRequest } from '../http/http-error';
import { hashLinkToken, newLinkToken } from './link-tokens';

/** At most this many links of one purpose are mailed to one address per hour, so nobody can flood a mailbox. */
export const LINKS_PER_ADDRESS_PER_HOUR = 5;

export const invalidLink = () =>
  badRequest(
    'This link is no longer valid: it was already used, replaced by a newer one, or has expired. Ask for a new one.',
    [{ path: 'token', message: 'is no longer valid' }],
  );

interface IssueInput {
  purpose: TokenPurpose;
  email: string;
  userId?: string | null;
  payload?: Record<string, string>;
  lifetimeMs: number;
  /** Recorded as already spent: a notice that carries no usable link but counts towards the hourly bound. */
  spent?: boolean;
}

export async function issueToken(manager: EntityManager, input: IssueInput): Promise<string> {
  const { token, hash } = newLinkToken();
  const now = Date.now();
  await manager.getRepository(OneTimeTokenEntity).insert({
    purpose: input.purpose,
    tokenHash: hash,
    email: input.email,
    userId: input.userId ?? null,
    payload: input.payload ?? {},
    expiresAt: new Date(now + input.lifetimeMs),
    usedAt: input.spent ? new Date(now) : null,
  });
  return token;
}

export async function mayMailAnotherLink(ds: DataSource, purpose: TokenPurpose, email: string): Promise<boolean> {
  const recent = await ds
    .getRepository(OneTimeTokenEntity)
    .countBy({ purpose, email, createdAt: MoreThan(new Date(Date.now() - 3_600_000)) });
  return recent < LINKS_PER_ADDRESS_PER_HOUR;
}

function isUsable(row: OneTimeTokenEntity | null): row is OneTimeTokenEntity {
  return row !== null && !row.usedAt && row.expiresAt.getTime() > Date.now();
}

/**
 * The token's row without spending it (to check a new password against its address before the slow
 * hashing), or the one "no longer valid" answer. `spendToken` checks again under the row lock.
 */
export async function peekToken(ds: DataSource, purpose: TokenPurpose, token: string): Promise<OneTimeTokenEntity> {
  const row = await ds.getRepository(OneTimeTokenEntity).findOneBy({ tokenHash: hashLinkToken(token), purpose });
  if (!isUsable(row)) throw invalidLink();
  return row;
}

/** Marks the token spent and returns its row, or throws the one "no longer valid" answer. */
export async function spendToken(
  manager: EntityManager,
  purpose: TokenPurpose,
  token: string,
): Promise<OneTimeTokenEntity> {
  const repo = manager.getRepository(OneTimeTokenEntity);
  const row = await repo.findOne({
    where: { tokenHash: hashLinkToken(token), purpose },
    lock: { mode: 'pessimistic_write' },
  });
  if (!isUsable(row)) throw invalidLink();
  await repo.update({ id: row.id }, { usedAt: new Date() });
  return row;
}
