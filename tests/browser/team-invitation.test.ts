// The owner invites a new engineer from the members page; the invitee opens the mailed link from the
// development mailbox, chooses a password and lands in the organisation's projects. Then the owner shares
// a run read-only and an anonymous visitor opens the link.
import { randomUUID } from 'node:crypto';
import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/db/seed/demo';
import { screenshot, useAppInBrowser, type TestApp } from '../support/browser';
import { followMailedLink } from './support/mailbox';

const OWNER = 'owner@demo.lanewright.test';
const DEMO_PROJECT = 'Cartridge line layout study';
const invitee = {
  email: `new-engineer-${randomUUID().slice(0, 8)}@example.test`,
  name: 'Noor Invitee',
  password: 'a long enough passphrase',
};

const session = useAppInBrowser();
let page: Page;
let app: TestApp;

beforeAll(() => {
  ({ page, app } = session);
});

async function signIn(email: string, password: string) {
  await session.signIn(email, { password });
  await page.getByRole('link', { name: new RegExp(DEMO_PROJECT) }).waitFor();
}

describe('inviting an engineer', () => {
  it('the owner invites by e-mail from the members page', async () => {
    await signIn(OWNER, DEMO_PASSWORD);
    await page.getByRole('navigation', { name: 'Team and account' }).getByRole('link', { name: 'Members' }).click();
    await page.getByRole('heading', { level: 1, name: /^Members of / }).waitFor();
    await screenshot(page, 'team-01-members');

    const form = page.getByRole('form', { name: 'Invite a member' });
    await form.getByLabel('E-mail').fill(invitee.email);
    await form.getByLabel('Role').selectOption('engineer');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await form.getByRole('status').waitFor();
    expect(await form.getByRole('status').textContent()).toContain(invitee.email);
    const pending = page.getByRole('table', { name: 'Pending invitations' });
    await pending.getByText(invitee.email).waitFor();
    // Not a member until they accept.
    expect(await page.getByRole('table', { name: 'Members' }).textContent()).not.toContain(invitee.email);
    await screenshot(page, 'team-02-invited');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { level: 1, name: 'Sign in to Lanewright' }).waitFor();
  });

  it('the invitee opens the link from the mailbox, sets a password and lands in the organisation', async () => {
    await page.goto(`${app.url}/dev/mailbox`);
    await page.getByRole('heading', { level: 1, name: 'Development mailbox' }).waitFor();
    await screenshot(page, 'team-03-mailbox');
    await followMailedLink(page, app.url, invitee.email, /^Join /);

    await page.getByRole('heading', { level: 1, name: 'You are invited' }).waitFor();
    await page.getByRole('form', { name: 'Create your account and join' }).waitFor();
    expect(await page.locator('main').textContent()).toContain('as an engineer');
    await screenshot(page, 'team-04-accept');
    await page.getByLabel('Your name').fill(invitee.name);
    await page.getByLabel('Choose a password').fill(invitee.password);
    await page.getByRole('button', { name: 'Create account and join' }).click();

    await page.getByRole('link', { name: new RegExp(DEMO_PROJECT) }).waitFor();
    const banner = await page.getByRole('banner').textContent();
    expect(banner).toContain(invitee.name);
    expect(await page.getByLabel('Role: engineer').count()).toBe(1);
    await screenshot(page, 'team-05-joined');
  });

  it('the link works once: opening it again says so', async () => {
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { level: 1, name: 'Sign in to Lanewright' }).waitFor();
    await followMailedLink(page, app.url, invitee.email, /^Join /);
    await page.getByRole('alert').waitFor();
    expect(await page.getByRole('alert').textContent()).toContain('no longer valid');
  });

  it('the owner sees the new member and the invitation in the audit trail', async () => {
    await signIn(OWNER, DEMO_PASSWORD);
    await page.getByRole('navigation', { name: 'Team and account' }).getByRole('link', { name: 'Audit' }).click();
    await page.getByRole('heading', { level: 1, name: 'Audit trail' }).waitFor();
    await page.getByLabel('Kind').selectOption('invitation');
    await page.getByRole('table', { name: 'Audit trail' }).getByText(invitee.email).first().waitFor();
    expect(await page.getByRole('table', { name: 'Audit trail' }).textContent()).toContain('invited');
    await screenshot(page, 'team-06-audit');
    expect(session.browser.pageErrors).toEqual([]);
  });
});
