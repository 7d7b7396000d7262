import type { Browser, BrowserContext, Page } from 'playwright-core';

export type StorageState = Awaited<ReturnType<BrowserContext['storageState']>>;

/** Signs in through the sign-in page and keeps the session cookie, so later loads start signed in without another sign-in. */
export async function signedInState(browser: Browser, baseUrl: string, email: string, password: string): Promise<StorageState> {
  const context = await browser.newContext();
  try {
    const page = await context.newPage();
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByLabel('Email').fill(email);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/today$/);
    return await context.storageState();
  } finally {
    await context.close();
  }
}

/**
 * Uploads the STL through the API from inside the signed-in page (its cookie and the CSRF header
 * the app sends) and waits until the worker has analysed it; returns the mould's id.
 */
export async function uploadAnalysedMould(page: Page, stl: Buffer, name: string, timeoutMs = 30_000): Promise<string> {
  const id = await page.evaluate(
    async ({ bytes, name }) => {
      const body = new FormData();
      body.append('units', 'mm');
      body.append('up', 'z');
      body.append('name', name);
      body.append('file', new Blob([new Uint8Array(bytes)], { type: 'model/stl' }), 'pocket-block.stl');
      const r = await fetch('/api/molds', { method: 'POST', body, headers: { Accept: 'application/json', 'X-Gelpoint-Csrf': '1' } });
      if (r.status !== 202) throw new Error(`the mould upload answered ${r.status}: ${await r.text()}`);
      return ((await r.json()) as { id: string }).id;
    },
    { bytes: [...stl], name },
  );
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const status = await page.evaluate(async (moldId) => ((await (await fetch(`/api/molds/${moldId}`)).json()) as { status: string }).status, id);
    if (status === 'ready') return id;
    if (status === 'failed') throw new Error('the mould analysis failed');
    if (Date.now() > deadline) throw new Error(`the mould was still ${status} after ${timeoutMs} ms: is the worker running?`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

export async function deleteMould(page: Page, id: string): Promise<void> {
  await page.evaluate(async (moldId) => {
    const r = await fetch(`/api/molds/${moldId}`, { method: 'DELETE', headers: { 'X-Gelpoint-Csrf': '1' } });
    if (!r.ok) throw new Error(`deleting the mould answered ${r.status}`);
  }, id);
}
