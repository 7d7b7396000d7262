import type { APIRequestContext, Browser, Page } from 'playwright-core';
import { watchedPage } from './browser';
import type { E2eStack } from './stack';
import { pocketBlockStl } from './test-mould';

export type DemoRole = 'lead' | 'maker' | 'apprentice';

export const demoPassword = 'gelpoint-demo';
export const demoEmail = (role: DemoRole) => `${role}@gelpoint.test`;

export async function signIn(page: Page, baseUrl: string, role: DemoRole): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('Email').fill(demoEmail(role));
  await page.getByLabel('Password').fill(demoPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/today$/);
}

/** The ids of the demo seed's objects (packages/db/src/seed), read through the API with the page's session. */
export interface DemoIds {
  pieceId: string;
  planId: string;
  pourId: string;
  resinSystemId: string;
  pigmentId: string;
  lotId: string;
}

async function firstItem(request: APIRequestContext, url: string, match: (item: Record<string, unknown>) => boolean = () => true): Promise<string> {
  const answer = await request.get(url);
  if (!answer.ok()) throw new Error(`${url} answered ${answer.status()}`);
  const { items } = (await answer.json()) as { items: Record<string, unknown>[] };
  const found = items.find(match);
  if (!found) throw new Error(`${url} holds nothing the test can use: is the demo seed loaded?`);
  return String(found.id);
}

export async function demoIds(page: Page, baseUrl: string): Promise<DemoIds> {
  const api = `${baseUrl}/api`;
  const r = page.request;
  // The seeded river table has a plan and an open pour with logged batches and readings.
  const pieceId = await firstItem(r, `${api}/pieces?limit=100`, (p) => p.name === 'River table, 1.8 m');
  const planId = await firstItem(r, `${api}/pour-plans?pieceId=${pieceId}`, (p) => p.name === 'Channel pour, smoky teal');
  const pourId = await firstItem(r, `${api}/pours?status=all&pieceId=${pieceId}`);
  const resinSystemId = await firstItem(r, `${api}/shelf/resin-systems`);
  const pigmentId = await firstItem(r, `${api}/shelf/pigments`);
  const lotId = await firstItem(r, `${api}/shelf/lots`);
  return { pieceId, planId, pourId, resinSystemId, pigmentId, lotId };
}

/** Uploads a 100 × 60 × 30 mm block with an 80 × 40 × 20 mm pocket and waits until the worker has measured it. */
export async function uploadMeasuredMould(page: Page, baseUrl: string, name: string): Promise<string> {
  const answer = await page.request.post(`${baseUrl}/api/molds`, {
    headers: { 'X-Gelpoint-Csrf': '1' },
    multipart: {
      units: 'mm',
      up: 'z',
      name,
      file: { name: 'pocket-block.stl', mimeType: 'model/stl', buffer: pocketBlockStl({ block: [100, 60, 30], pocket: [80, 40, 20] }).bytes },
    },
  });
  if (answer.status() !== 202) throw new Error(`the mould upload answered ${answer.status()}: ${await answer.text()}`);
  const { id } = (await answer.json()) as { id: string };
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    const mould = (await (await page.request.get(`${baseUrl}/api/molds/${id}`)).json()) as { status: string };
    if (mould.status === 'ready') return id;
    if (mould.status === 'failed') throw new Error('the worker could not measure the test mould');
    await page.waitForTimeout(300);
  }
  throw new Error('the worker did not measure the test mould within 30 s');
}

/** A real invitation link, as the invitee gets it by mail. */
export async function invitationPath(page: Page, stack: E2eStack, email: string): Promise<string> {
  const answer = await page.request.post(`${stack.baseUrl}/api/shop/invitations`, {
    headers: { 'X-Gelpoint-Csrf': '1' },
    data: { email, role: 'apprentice' },
  });
  if (!answer.ok()) throw new Error(`the invitation answered ${answer.status()}: ${await answer.text()}`);
  const mail = await stack.mailTo(email);
  const link = /https?:\/\/\S+(\/invitations\/[A-Za-z0-9_-]+)/.exec(mail.text)?.[1];
  if (!link) throw new Error('the invitation mail holds no link');
  return link;
}

/**
 * What the page sweeps visit, made as the lead: the demo's ids, a measured mould and a real invitation link. The
 * label names the mould and the invitee, so two sweeps on one database do not meet.
 */
export async function prepareMainPages(browser: Browser, stack: E2eStack, label: string): Promise<{ fixtures: PageFixtures; invitation: string }> {
  const context = await browser.newContext();
  try {
    const { page } = await watchedPage(context, stack.baseUrl);
    await signIn(page, stack.baseUrl, 'lead');
    const fixtures = { ...(await demoIds(page, stack.baseUrl)), moldId: await uploadMeasuredMould(page, stack.baseUrl, `${label} pocket block`) };
    return { fixtures, invitation: await invitationPath(page, stack, `${label}-${Date.now()}@example.test`) };
  } finally {
    await context.close();
  }
}

export interface MainPage {
  name: string;
  path: string;
  /** Roles that can open the page; the server and the menu refuse it to the others. */
  roles: readonly DemoRole[];
}

export interface PageFixtures extends DemoIds {
  moldId: string;
}

const everyone: readonly DemoRole[] = ['lead', 'maker', 'apprentice'];

/** Every main page of the signed-in app, with the demo objects it shows. */
export function signedInPages(ids: PageFixtures): MainPage[] {
  return [
    { name: 'today', path: '/today', roles: everyone },
    { name: 'pieces', path: '/pieces', roles: everyone },
    { name: 'new piece', path: '/pieces/new', roles: ['lead', 'maker'] },
    { name: 'piece', path: `/pieces/${ids.pieceId}`, roles: everyone },
    { name: 'cure record', path: `/pieces/${ids.pieceId}/record`, roles: everyone },
    { name: 'moulds', path: '/moulds', roles: everyone },
    { name: 'new mould', path: '/moulds/new', roles: ['lead', 'maker'] },
    { name: 'mould', path: `/moulds/${ids.moldId}`, roles: everyone },
    { name: 'pour plans', path: '/pour-plans', roles: everyone },
    { name: 'planner', path: `/pieces/${ids.pieceId}/pour-plans/new`, roles: ['lead', 'maker'] },
    { name: 'plan', path: `/pour-plans/${ids.planId}`, roles: everyone },
    { name: 'run sheet', path: `/pour-plans/${ids.planId}/run-sheet`, roles: everyone },
    { name: 'cure board', path: '/cure-board', roles: everyone },
    { name: 'pour', path: `/pours/${ids.pourId}`, roles: everyone },
    { name: 'new pour', path: `/pours/new?planId=${ids.planId}`, roles: ['lead', 'maker', 'apprentice'] },
    { name: 'shelf', path: '/shelf', roles: everyone },
    { name: 'shelf pigments', path: '/shelf?tab=pigments', roles: everyone },
    { name: 'shelf lots', path: '/shelf?tab=lots', roles: everyone },
    { name: 'resin system', path: `/shelf/resin-systems/${ids.resinSystemId}`, roles: everyone },
    { name: 'pigment', path: `/shelf/pigments/${ids.pigmentId}`, roles: everyone },
    { name: 'lot', path: `/shelf/lots/${ids.lotId}`, roles: everyone },
    { name: 'new resin system', path: '/shelf/resin-systems/new', roles: ['lead'] },
    { name: 'new pigment', path: '/shelf/pigments/new', roles: ['lead'] },
    { name: 'new lot', path: '/shelf/lots/new', roles: ['lead'] },
    { name: 'team', path: '/team', roles: ['lead'] },
    { name: 'your account', path: '/account', roles: everyone },
    { name: 'shop settings', path: '/shop-settings', roles: ['lead'] },
    { name: 'audit', path: '/audit', roles: ['lead'] },
  ];
}

/** The pages before sign-in; the reset page only checks its token's shape until the form is sent. */
export function publicPages(invitation: string): MainPage[] {
  return [
    { name: 'sign in', path: '/sign-in', roles: everyone },
    { name: 'create shop', path: '/create-shop', roles: everyone },
    { name: 'forgot password', path: '/forgot-password', roles: everyone },
    { name: 'reset password', path: `/reset-password?token=${'a'.repeat(43)}`, roles: everyone },
    { name: 'invitation', path: invitation, roles: everyone },
  ];
}

/** Waits until the page has drawn its data: its heading is up, and no spinner or busy region is left. */
export async function settle(page: Page): Promise<void> {
  await page.locator('h1').first().waitFor({ state: 'visible' });
  await page.waitForFunction(() => !document.querySelector('[aria-busy="true"]') && !document.querySelector('.animate-spin'), null, { timeout: 15_000 });
}
