// Which new passwords to refuse: those zxcvbn (with its common-password and common-word dictionaries)
// guesses in under 10^6 attempts (score 0 or 1), and any built on the user's own e-mail or name. Length
// rules stay in the shared schema; this check needs the dictionaries, so it lives on the server only.
import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import { adjacencyGraphs, dictionary } from '@zxcvbn-ts/language-common';
import type { FieldIssue } from '../../shared/api/errors';
import { badRequest } from '../http/http-error';

/** zxcvbn's matching grows faster than linearly with length; the first 64 characters decide. */
const ANALYSED_LENGTH = 64;
const MIN_SCORE = 2;

const zxcvbn = new ZxcvbnFactory({ dictionary, graphs: adjacencyGraphs, maxLength: ANALYSED_LENGTH });

export interface PasswordOwner {
  email: string;
  name?: string;
  organisationName?: string;
}

/** The problem with a new password, or null when it may be used. */
export function passwordProblem(password: string, owner: PasswordOwner, path = 'password'): FieldIssue | null {
  const lower = password.toLowerCase();
  const email = owner.email.toLowerCase();
  const localPart = email.split('@')[0];
  if (lower.includes(email) || (localPart.length >= 4 && lower.includes(localPart))) {
    return {
      path,
      message: 'must not contain your e-mail address; choose something unrelated to your account',
    };
  }
  const result = zxcvbn.check(
    password.slice(0, ANALYSED_LENGTH),
    [email, localPart, owner.name ?? '', owner.organisationName ?? ''].filter((s) => s !== ''),
  );
  if (result.score >= MIN_SCORE) return null;
  const why =
    result.feedback.warning === 'userInputs'
      ? 'is built from your name or e-mail'
      : 'is one of the most commonly used passwords or too close to one';
  return {
    path,
    message: `${why}; a few unrelated words or a longer phrase is both easier to remember and safer`,
  };
}

/**
 * Throws the one 400 for a refused new password. Every place a password is chosen calls it (sign-up, reset,
 * change, accepting an invitation with a new account), before the slow hashing.
 */
export function refuseWeakPassword(password: string, owner: PasswordOwner, path = 'password'): void {
  const weak = passwordProblem(password, owner, path);
  if (weak) throw badRequest(`Choose another password: it ${weak.message}.`, [weak]);
}
