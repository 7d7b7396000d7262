import { describe, expect, it } from 'vitest';
import { watchedPage } from './support/browser';
import { useBrowserStack } from './support/use-browser-stack';

// The demo sign-ins and shop come from the demo seed (packages/db/src/seed/demo.ts).
const e2e = useBrowserStack();
const stack = e2e.stack;

describe('the foundation in a real browser', () => {
  it('signs the lead in, keeps the session across a reload, invites a maker by e-mail and signs out for real', async () => {
    const context = await e2e.browser().newContext({ viewport: { width: 1280, height: 900 } });
    const { page, watch } = await watchedPage(context, stack.baseUrl);
    await page.goto(`${stack.baseUrl}/pieces`);
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel('Email').fill('lead@gelpoint.test');
    await page.getByLabel('Password').fill('not the password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByRole('alert').first().textContent()).toMatch(/do not match/);
    await page.getByLabel('Password').fill('gelpoint-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/pieces$/);
    await expect.poll(() => page.getByText('Kettle Creek Woodworks').first().isVisible()).toBe(true);
    await expect.poll(() => page.getByText('River table, 1.8 m').isVisible()).toBe(true);

    await page.reload();
    await expect.poll(() => page.getByText('River table, 1.8 m').isVisible()).toBe(true);

    await page.goto(`${stack.baseUrl}/team`);
    const email = `newmaker-${Date.now()}@example.test`;
    const invite = page.getByRole('form', { name: 'Invite someone' });
    await invite.getByLabel('Email', { exact: true }).fill(email);
    await invite.getByLabel('Role', { exact: true }).selectOption('maker');
    await invite.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => page.getByText(email).first().isVisible()).toBe(true);

    const mail = await stack.mailTo(email);
    expect(mail.subject).toContain('Kettle Creek Woodworks');
    const link = /(http:\/\/\S+\/invitations\/[A-Za-z0-9_-]+)/.exec(mail.text)?.[1];
    expect(link?.startsWith(stack.baseUrl)).toBe(true);

    const invitee = await e2e.browser().newContext({ viewport: { width: 375, height: 800 } });
    const joined = await watchedPage(invitee, stack.baseUrl);
    await joined.page.goto(link!);
    await joined.page.getByLabel('Your name').fill('Noor Haddad');
    await joined.page.getByLabel('Choose a password').fill('noor-pours-resin');
    await joined.page.getByRole('button', { name: /Join/ }).click();
    await joined.page.waitForURL(/\/today$/);
    await expect.poll(() => joined.page.getByText('Noor Haddad').first().isVisible()).toBe(true);
    expect(joined.watch.problems).toEqual([]);
    await invitee.close();

    await page.goto(`${stack.baseUrl}/shop-settings`);
    await page.getByLabel('Off-ratio tolerance (%)').fill('4');
    await page.getByRole('button', { name: 'Save settings' }).click();
    await expect.poll(() => page.getByText('Settings saved').isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Issue a thermometer token' }).click();
    await expect.poll(async () => (await page.getByLabel('Thermometer token').textContent())?.length ?? 0).toBeGreaterThan(20);

    await page.getByRole('button', { name: 'Sign out' }).first().click();
    await page.waitForURL(/\/sign-in/);
    await page.goto(`${stack.baseUrl}/pieces`);
    await page.waitForURL(/\/sign-in/);
    expect(watch.problems).toEqual([]);
    await context.close();
  });
});
