// Forgot password through the mailbox: ask on the sign-in page, open the mailed link from the
// development mailbox, choose a new password, and sign in with it.
import { randomUUID } from 'node:crypto';
import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { hashPassword } from '../../server/auth/password';
import { MembershipEntity, OrganisationEntity, UserEntity } from '../../server/db/entities';
import { screenshot, useAppInBrowser, type TestApp } from '../support/browser';
import { followMailedLink } from './support/mailbox';

const person = {
  email: `forgetful-${randomUUID().slice(0, 8)}@example.test`,
  name: 'Fen Forgetful',
  old: 'the password I forgot',
  fresh: 'a brand new passphrase',
};

const session = useAppInBrowser({
  prepare: async ({ dataSource }) => {
    const user = await dataSource
      .getRepository(UserEntity)
      .save({ email: person.email, name: person.name, passwordHash: await hashPassword(person.old) });
    const organisation = await dataSource.getRepository(OrganisationEntity).save({ name: 'Forgetful fixtures' });
    await dataSource
      .getRepository(MembershipEntity)
      .insert({ organisationId: organisation.id, userId: user.id, role: 'owner' });
  },
});
let page: Page;
let app: TestApp;

beforeAll(() => {
  ({ page, app } = session);
});

describe('forgot password', () => {
  it('asks for a link from the sign-in page and hears the same whatever the address', async () => {
    await page.goto(`${app.url}/sign-in`);
    await page.getByRole('link', { name: 'Forgot password?' }).click();
    await page.getByRole('heading', { level: 1, name: 'Forgot your password?' }).waitFor();
    await page.getByLabel('E-mail').fill(person.email);
    await page.getByRole('button', { name: 'Send me a link' }).click();
    const status = page.getByRole('status');
    await status.waitFor();
    const answer = await status.textContent();
    expect(answer).toContain('If an account uses this address');
    await screenshot(page, 'reset-01-asked');

    await page.reload();
    await page.getByLabel('E-mail').fill(`nobody-${randomUUID().slice(0, 8)}@example.test`);
    await page.getByRole('button', { name: 'Send me a link' }).click();
    await page.getByRole('status').waitFor();
    expect(await page.getByRole('status').textContent()).toBe(answer);
  });

  it('opens the mailed link, chooses a new password and signs in with it', async () => {
    await followMailedLink(page, app.url, person.email, /new Lanewright password/);
    await page.getByRole('heading', { level: 1, name: 'Choose a new password' }).waitFor();
    await page.getByLabel('New password', { exact: true }).fill(person.fresh);
    await screenshot(page, 'reset-02-new-password');
    await page.getByRole('button', { name: 'Save the new password' }).click();
    await page.getByRole('status').waitFor();
    await screenshot(page, 'reset-03-done');
    await page.getByRole('link', { name: 'Sign in' }).first().click();

    await page.getByLabel('E-mail').fill(person.email);
    await page.getByLabel('Password').fill(person.old);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('alert').waitFor();
    await page.getByLabel('Password').fill(person.fresh);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { level: 1, name: /projects/i }).waitFor();
    expect(await page.getByRole('banner').textContent()).toContain(person.name);
    await screenshot(page, 'reset-04-signed-in');
    expect(session.browser.pageErrors).toEqual([]);
  });
});
