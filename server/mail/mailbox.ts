// The development mailbox: what the loopback fake SMTP server caught, newest first, in memory and bounded,
// so a long session of trying things out cannot grow the process without end.
import { randomUUID } from 'node:crypto';

export interface CaughtMail {
  id: string;
  receivedAt: Date;
  from: string;
  to: string[];
  subject: string;
  text: string;
  /** Every http(s) address in the text, in order, so the page can show them as links. */
  links: string[];
}

export const MAILBOX_CAPACITY = 200;
const LINK_PATTERN = /https?:\/\/[^\s<>"')]+/g;

export class CaughtMailbox {
  private readonly mails: CaughtMail[] = [];
  private readonly waiters = new Set<() => void>();

  constructor(readonly capacity = MAILBOX_CAPACITY) {}

  add(mail: Omit<CaughtMail, 'id' | 'links'>): CaughtMail {
    const caught: CaughtMail = { ...mail, id: randomUUID(), links: mail.text.match(LINK_PATTERN) ?? [] };
    this.mails.unshift(caught);
    if (this.mails.length > this.capacity) this.mails.length = this.capacity;
    for (const wake of this.waiters) wake();
    return caught;
  }

  list(): readonly CaughtMail[] {
    return this.mails;
  }

  clear(): void {
    this.mails.length = 0;
  }

  /** Resolves with the newest mail that matches, waiting for it up to `timeoutMs`. */
  waitFor(match: (mail: CaughtMail) => boolean, timeoutMs = 5000): Promise<CaughtMail> {
    const found = this.mails.find(match);
    if (found) return Promise.resolve(found);
    return new Promise((resolve, reject) => {
      const timer = setTimeout(() => {
        this.waiters.delete(check);
        reject(new Error(`no matching mail arrived within ${timeoutMs} ms (${this.mails.length} caught)`));
      }, timeoutMs);
      const check = () => {
        const mail = this.mails.find(match);
        if (!mail) return;
        clearTimeout(timer);
        this.waiters.delete(check);
        resolve(mail);
      };
      this.waiters.add(check);
    });
  }
}
