import { readFileSync } from 'node:fs';
import { parse } from 'csv-parse/sync';
import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { watchedPage } from './support/browser';
import { demoIds, settle, signIn } from './support/main-pages';
import { useBrowserStack } from './support/use-browser-stack';

// A demo database of this file's own: its river table was poured from the demo lots, and its lead has a history.
const e2e = useBrowserStack({ freshDemoFor: 'records' });
const stack = e2e.stack;

describe('the shop’s records in the browser', () => {
  it('traces a lot to the batches and pieces that used it, and reads the audit in words, filtered and exported', { timeout: 120_000 }, async () => {
    const context = await e2e.browser().newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true });
    const { page, watch } = await watchedPage(context, stack.baseUrl);
    page.setDefaultTimeout(20_000);
    await signIn(page, stack.baseUrl, 'lead');
    const ids = await demoIds(page, stack.baseUrl);

    // The river table's part A lot: every batch that drew on it is listed, each linked to its pour and piece.
    const pour = (await (await page.request.get(`${stack.baseUrl}/api/pours/${ids.pourId}`)).json()) as { batches: { lotA: string }[] };
    const lotNumber = pour.batches.at(-1)!.lotA;
    const lots = (await (await page.request.get(`${stack.baseUrl}/api/shelf/lots?q=${encodeURIComponent(lotNumber)}`)).json()) as {
      items: { id: string; lotNumber: string }[];
    };
    const lot = lots.items.find((l) => l.lotNumber === lotNumber)!;
    const uses = (await (await page.request.get(`${stack.baseUrl}/api/shelf/lots/${lot.id}/uses`)).json()) as { total: number };
    expect(uses.total).toBeGreaterThan(0);
    await page.goto(`${stack.baseUrl}/shelf/lots/${lot.id}`);
    await settle(page);
    const table = page.getByRole('table', { name: `Batches mixed from lot ${lotNumber}` });
    await expect.poll(() => table.getByRole('row').count()).toBe(uses.total + 1);
    await table.getByRole('link', { name: 'River table, 1.8 m' }).first().click();
    await page.waitForURL(new RegExp(`/pieces/${ids.pieceId}$`));

    // A change of the lead's own, then the audit says it in words, with the lot linked while it exists.
    await page.goto(`${stack.baseUrl}/shelf/lots/${lot.id}`);
    await settle(page);
    await page.getByLabel('Notes').fill('counted after the river table');
    await page.getByRole('button', { name: 'Save corrections' }).click();
    await expect.poll(() => page.getByText('counted after the river table').count()).toBeGreaterThan(0);

    await page.goto(`${stack.baseUrl}/audit`);
    await settle(page);
    const events = page.getByRole('table', { name: 'Events in this shop, newest first' });
    await expect.poll(() => events.getByText(`Lot ${lotNumber} corrected by Rosa Lindqvist`).count()).toBe(1);
    expect(await events.getByRole('link', { name: lotNumber }).first().getAttribute('href')).toBe(`/shelf/lots/${lot.id}`);
    expect(await events.getByText(/lot\.update|[0-9a-f]{8}-[0-9a-f]{4}/).count()).toBe(0);

    // The filters are a labelled form; what they pick is in the address, and the export takes the same filters.
    const filters = page.getByRole('search', { name: 'Filter the audit' });
    await filters.getByLabel('Person').selectOption({ label: 'Rosa Lindqvist' });
    await filters.getByLabel('Kind of event').selectOption({ label: 'Lots' });
    // The filter's days are the shop's (the demo shop is in Vancouver), not the test machine's: from 00:00 to 08:00 UTC
    // the two are a day apart.
    const { timeZone } = (await (await page.request.get(`${stack.baseUrl}/api/shop`)).json()) as { timeZone: string };
    const day = DateTime.now().setZone(timeZone).toFormat('yyyy-MM-dd');
    await filters.getByLabel('From (day)').fill(day);
    await filters.getByLabel('To (day)').fill(day);
    await filters.getByRole('button', { name: 'Show' }).click();
    await page.waitForURL(/kind=lot/);
    expect(page.url()).toMatch(/who=[0-9a-f-]{36}/);
    await settle(page);
    await expect.poll(() => events.getByRole('row').count()).toBe(2);
    const rows = await events.getByRole('row').allInnerTexts();
    expect(rows[1]).toContain(`Lot ${lotNumber} corrected by Rosa Lindqvist`);

    const download = page.waitForEvent('download');
    await page.getByRole('link', { name: 'Download these events as CSV' }).click();
    const file = await download;
    expect(file.suggestedFilename()).toMatch(/^gelpoint-audit-\d{4}-\d{2}-\d{2}\.csv$/);
    const csv = parse(readFileSync(await file.path(), 'utf8'), { columns: true }) as Record<string, string>[];
    expect(csv).toHaveLength(1);
    expect(csv[0]).toMatchObject({
      actor: 'Rosa Lindqvist',
      action: 'lot.update',
      objectName: lotNumber,
      event: `Lot ${lotNumber} corrected by Rosa Lindqvist`,
    });

    expect(watch.problems).toEqual([]);
    await context.close();
  });
});
