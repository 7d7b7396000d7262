// Renders the app icon (public/icons/gelpoint-icon.svg, our own drawing) to the PNG sizes the web app manifest
// lists, with the same Chromium the browser tests use. Run it after changing the drawing and commit the PNGs:
//   npx tsx apps/web/scripts/draw-icons.ts
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { chromium } from 'playwright-core';

const iconsDir = join(import.meta.dirname, '../public/icons');
const svg = readFileSync(join(iconsDir, 'gelpoint-icon.svg'), 'utf8');
const sizesPx = [192, 512] as const;

const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--headless', '--no-sandbox', '--disable-gpu'] });
try {
  for (const sizePx of sizesPx) {
    const page = await browser.newPage({ viewport: { width: sizePx, height: sizePx }, deviceScaleFactor: 1 });
    const src = `data:image/svg+xml;base64,${Buffer.from(svg).toString('base64')}`;
    await page.setContent(`<!doctype html><body style="margin:0"><img src="${src}" width="${sizePx}" height="${sizePx}" style="display:block"></body>`);
    await page.locator('img').evaluate((img) => (img as HTMLImageElement).decode());
    writeFileSync(join(iconsDir, `gelpoint-${sizePx}.png`), await page.screenshot({ clip: { x: 0, y: 0, width: sizePx, height: sizePx } }));
    await page.close();
  }
} finally {
  await browser.close();
}
