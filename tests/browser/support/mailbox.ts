// Reading mail the way a person would: open the app's development mailbox page and follow the link in
// the newest mail to someone.
import type { Page } from 'playwright-core';

export async function followMailedLink(page: Page, appUrl: string, to: string, subject: RegExp): Promise<void> {
  await page.goto(`${appUrl}/dev/mailbox`);
  await page.getByRole('heading', { level: 1, name: 'Development mailbox' }).waitFor();
  const mail = page
    .getByRole('listitem')
    .filter({ hasText: to })
    .filter({ has: page.getByRole('heading', { name: subject }) })
    .first();
  await mail.waitFor();
  await mail.getByRole('link').first().click();
}
