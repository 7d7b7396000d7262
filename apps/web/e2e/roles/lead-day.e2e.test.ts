import { describe, expect, it } from 'vitest';
import { watchedPage } from '../support/browser';
import { saveScreenshot } from '../support/screenshots';
import { signInThroughPage } from '../support/sign-in';
import { useBrowserStack } from '../support/use-browser-stack';

// A fresh demo shop (packages/db/src/seed/demo.ts): Kettle Creek Woodworks, its shelf, the river table still curing and
// the coaster set cured long enough (240 h at about 22 °C against a 168 h full cure) to be released.
const e2e = useBrowserStack({ freshDemoFor: 'lead' });
const stack = e2e.stack;

describe("a shop lead's day in the browser", () => {
  it(
    'invites an apprentice who joins from the mail, edits a resin system, reads the cure board and releases the coaster set',
    { timeout: 180_000 },
    async () => {
      const context = await e2e.browser().newContext({ viewport: { width: 1280, height: 900 } });
      const { page, watch } = await watchedPage(context, stack.baseUrl);
      page.setDefaultTimeout(10_000);
      await signInThroughPage(page, stack.baseUrl, 'lead@gelpoint.test');
      const nav = page.getByRole('navigation', { name: 'Main' });

      // The team: an invitation by e-mail, accepted from the link in the mail.
      await nav.getByRole('link', { name: 'Team' }).click();
      await page.waitForURL(/\/team$/);
      const email = 'noor.haddad@example.test';
      const invite = page.getByRole('form', { name: 'Invite someone' });
      await invite.getByLabel('Email', { exact: true }).fill(email);
      await invite.getByLabel('Role', { exact: true }).selectOption('apprentice');
      await invite.getByRole('button', { name: 'Send invitation' }).click();
      const invitations = page.getByRole('table', { name: 'Invitations sent from this shop' });
      await expect.poll(() => invitations.getByRole('row').filter({ hasText: email }).count()).toBe(1);

      const mail = await stack.mailTo(email);
      expect(mail.subject).toContain('Kettle Creek Woodworks');
      const link = /(http:\/\/\S+\/invitations\/[A-Za-z0-9_-]+)/.exec(mail.text)?.[1];
      expect(link?.startsWith(`${stack.baseUrl}/invitations/`)).toBe(true);

      const invitee = await e2e.browser().newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
      const joined = await watchedPage(invitee, stack.baseUrl);
      await joined.page.goto(link!);
      await expect.poll(() => joined.page.getByText('Kettle Creek Woodworks').first().isVisible()).toBe(true);
      await joined.page.getByLabel('Your name').fill('Noor Haddad');
      await joined.page.getByLabel('Choose a password').fill('noor-pours-resin');
      await joined.page.getByRole('button', { name: 'Join Kettle Creek Woodworks' }).click();
      await joined.page.waitForURL(/\/today$/);
      await expect.poll(() => joined.page.getByText('Good to see you, Noor Haddad.').isVisible()).toBe(true);
      expect(joined.watch.problems).toEqual([]);
      await invitee.close();

      // Noor joined in another browser, so nothing told the lead's page. A reload restores its offline copy of the
      // members, which counts as fresh for 30 s after it was fetched (staleTime in apps/web/src/lib/query-client.ts), so
      // the list may lag the join by that long: reload until it shows her, for longer than that.
      const members = page.getByRole('table', { name: 'Members of this shop' });
      const noor = members.getByRole('row').filter({ hasText: 'Noor Haddad' });
      await expect
        .poll(
          async () => {
            await page.reload();
            await members.waitFor();
            return noor.count();
          },
          { timeout: 45_000, interval: 2_000 },
        )
        .toBe(1);
      expect(await noor.getByText(email).isVisible()).toBe(true);

      // The shelf: a data sheet value changed, and the shelf's list shows it.
      await nav.getByRole('link', { name: 'Shelf' }).click();
      await page.waitForURL(/\/shelf$/);
      const resinSystems = page.getByRole('table', { name: 'Resin systems on the shelf' });
      const brightcast = resinSystems.getByRole('row').filter({ has: page.getByRole('link', { name: 'Brightcast 100:45' }) });
      await expect.poll(() => brightcast.getByText('35 min at 23 °C').isVisible()).toBe(true);
      await saveScreenshot(page, 'shelf');
      await brightcast.getByRole('link', { name: 'Brightcast 100:45' }).click();
      await page.waitForURL(/\/shelf\/resin-systems\/[0-9a-f-]{36}$/);
      const sheet = page.getByRole('form', { name: 'Edit Brightcast 100:45' });
      const potLife = sheet.getByLabel('Pot life (min)', { exact: true });
      expect(await potLife.inputValue()).toBe('35');
      await potLife.fill('30');
      await sheet.getByRole('button', { name: 'Save data sheet' }).click();
      await expect.poll(() => page.getByText(/^Saved\. Pour plans made from now on use these values/).isVisible()).toBe(true);
      // The server keeps the new value: a reload shows it. The page's offline copy is written a moment after an answer
      // and a restored answer counts as fresh for 30 s (apps/web/src/lib/query-client.ts), so a reload at once can still
      // show the old value for that long: reload until the saved one shows, for longer than that.
      await expect
        .poll(
          async () => {
            await page.reload();
            return page.getByRole('form', { name: 'Edit Brightcast 100:45' }).getByLabel('Pot life (min)', { exact: true }).inputValue();
          },
          { timeout: 45_000, interval: 2_000 },
        )
        .toBe('30');
      await page.getByRole('link', { name: 'Back to the shelf' }).click();
      await page.waitForURL(/\/shelf$/);
      // The shelf's list came back from the same offline copy as the sheet did: the same lag, the same wait.
      await expect
        .poll(
          async () => {
            if (await brightcast.getByText('30 min at 23 °C').isVisible()) return true;
            await page.reload();
            await resinSystems.waitFor();
            return brightcast.getByText('30 min at 23 °C').isVisible();
          },
          { timeout: 45_000, interval: 2_000 },
        )
        .toBe(true);

      // The cure board: the river table still curing, the coaster set ready for its release.
      await nav.getByRole('link', { name: 'Cure board' }).click();
      await page.waitForURL(/\/cure-board$/);
      const board = page.getByRole('list', { name: 'Pours' });
      const entryOf = (pieceName: string) => board.getByRole('listitem').filter({ has: page.getByRole('link', { name: pieceName, exact: true }) });
      const river = entryOf('River table, 1.8 m');
      const coasters = entryOf('Coaster set of six');
      await expect.poll(() => coasters.isVisible()).toBe(true);
      expect(
        await page
          .getByRole('status')
          .filter({ hasText: /^2 pours/ })
          .isVisible(),
      ).toBe(true);
      // The seed logged every planned cup of both pours: three for the river table's channel, one for the coasters.
      expect(await river.getByText('4 of 4 cups logged', { exact: false }).isVisible()).toBe(true);
      expect(await coasters.getByText('1 of 1 cups logged', { exact: false }).isVisible()).toBe(true);
      expect(await coasters.getByText('Ready to machine', { exact: true }).isVisible()).toBe(true);
      expect(await river.getByRole('button', { name: 'Release for machining' }).count()).toBe(0);
      await saveScreenshot(page, 'cure-board');

      await coasters.getByRole('button', { name: 'Release for machining' }).click();
      const dialog = page.getByRole('dialog', { name: 'Release “Coaster set of six” for machining?' });
      await dialog.getByRole('button', { name: 'Release it' }).click();
      await expect.poll(() => coasters.count()).toBe(0);
      expect(await river.isVisible()).toBe(true);

      const filter = page.getByRole('search', { name: 'Filter the cure board' });
      await filter.getByLabel('Pours', { exact: true }).selectOption('released');
      await filter.getByRole('button', { name: 'Show' }).click();
      await page.waitForURL(/\/cure-board\?status=released$/);
      await expect.poll(() => coasters.getByText('Released for machining', { exact: true }).isVisible()).toBe(true);
      await coasters.getByRole('link', { name: 'Coaster set of six', exact: true }).click();
      await page.waitForURL(/\/pours\/[0-9a-f-]{36}$/);
      await expect.poll(() => page.getByText('Rosa Lindqvist released it', { exact: false }).isVisible()).toBe(true);

      expect(watch.problems).toEqual([]);
      await context.close();
    },
  );
});
