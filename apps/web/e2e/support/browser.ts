import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

const FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: '/usr/bin/chromium', args: FLAGS });
}

/** What every flow must not see: console errors, requests to any other host, server errors. */
export interface PageWatch {
  problems: string[];
}

export async function watchedPage(context: BrowserContext, baseUrl: string): Promise<{ page: Page; watch: PageWatch }> {
  const page = await context.newPage();
  const watch: PageWatch = { problems: [] };
  const origin = new URL(baseUrl).origin;
  page.on('console', (m) => {
    // The browser reports expected 4xx answers (a wrong password, signed-out checks) as console errors.
    if (m.type() === 'error' && !/status of 4\d\d/.test(m.text())) watch.problems.push(`console: ${m.text()}`);
  });
  page.on('pageerror', (e) => watch.problems.push(`page error: ${e.message}`));
  page.on('request', (r) => {
    const u = new URL(r.url());
    if (u.protocol !== 'data:' && u.protocol !== 'blob:' && u.origin !== origin) watch.problems.push(`request to another host: ${r.url()}`);
  });
  page.on('response', (r) => {
    if (r.status() >= 500) watch.problems.push(`${r.status()} from ${r.url()}`);
  });
  return { page, watch };
}
