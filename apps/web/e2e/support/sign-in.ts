import type { Page } from 'playwright-core';

/** The demo seed's shared password (packages/db/src/seed/demo.ts). */
export const demoPassword = 'gelpoint-demo';

/** Signs in through the page, as a person does, and waits for the landing page. */
export async function signInThroughPage(page: Page, baseUrl: string, email: string, landing: RegExp = /\/today$/): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('Password').fill(demoPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(landing);
}
