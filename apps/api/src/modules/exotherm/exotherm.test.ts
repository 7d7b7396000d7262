import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { bearer, createShop, useHarness } from '../../test-support/harness';

const h = useHarness();
const repoRoot = fileURLToPath(new URL('../../../../../', import.meta.url));

/** The gelpoint command as a shop runs it (the build vitest's set-up keeps fresh). */
function cliJson(args: string[]): unknown {
  const result = spawnSync('node', ['apps/cli/bin/gelpoint.mjs', 'exotherm', ...args], { cwd: repoRoot, encoding: 'utf8' });
  if (result.status !== 0) throw new Error(result.stderr);
  return JSON.parse(result.stdout);
}

// An invented slow system: 160 J/g, 53 kJ/mol (inside Barral et al. 1995's 44–57), 10 h film gel at 22 °C.
const body = { depthMm: 40, ambientC: 24, reactionHeatJG: 160, activationKJMol: 53, refTempC: 22, gelMin: 600, heatCapacityJGK: 1.6, base: 'wood', limitC: 40 };
const argv = [
  '--depth-mm',
  '40',
  '--ambient-c',
  '24',
  '--reaction-heat-j-g',
  '160',
  '--activation-kj-mol',
  '53',
  '--ref-temp-c',
  '22',
  '--gel-min',
  '600',
  '--heat-capacity-j-gk',
  '1.6',
  '--base',
  'wood',
  '--limit-c',
  '40',
  '--json',
];

describe('POST /api/exotherm', () => {
  it('answers the same numbers as gelpoint exotherm --json for the same inputs', async () => {
    const shop = await createShop(h);
    const apprentice = await shop.member('apprentice');
    const res = await h.http().post('/api/exotherm').set(bearer(apprentice)).send(body).expect(200);
    const cli = cliJson(argv);
    expect(res.body).toEqual(cli);
    expect(res.body.maxLayerMm).toBeGreaterThan(0);
    // Energy balance: the peak stays under the adiabatic ceiling 24 + 160/1.6 = 124 °C (Incropera, first law).
    expect(res.body.adiabaticRiseK).toBeCloseTo(160 / 1.6, 9);
    expect(res.body.peakC).toBeLessThan(124);
  });

  it('refuses a negative depth, text for a number and an unknown base with a sentence', async () => {
    const shop = await createShop(h);
    const negative = await h
      .http()
      .post('/api/exotherm')
      .set(bearer(shop.lead))
      .send({ ...body, depthMm: -3 })
      .expect(400);
    expect(negative.body.error.message).toMatch(/layer depth must be a number of mm above 0/);
    const text = await h
      .http()
      .post('/api/exotherm')
      .set(bearer(shop.lead))
      .send({ ...body, reactionHeatJG: 'lots' })
      .expect(400);
    expect(text.body.error.fields.reactionHeatJG).toMatch(/must be a number/);
    const base = await h
      .http()
      .post('/api/exotherm')
      .set(bearer(shop.lead))
      .send({ ...body, base: 'stone' })
      .expect(400);
    expect(base.body.error.fields.base).toMatch(/wood or insulated/);
    const heat = await h
      .http()
      .post('/api/exotherm')
      .set(bearer(shop.lead))
      .send({ ...body, reactionHeatJG: -10 })
      .expect(400);
    expect(heat.body.error.message).toMatch(/heat of reaction must be a number from 0/i);
  });

  it('is in the OpenAPI document', async () => {
    const doc = (await h.http().get('/api/openapi.json').expect(200)).body;
    const post = doc.paths['/api/exotherm'].post;
    expect(Object.keys(post.requestBody.content['application/json'].schema.properties)).toEqual(
      expect.arrayContaining(['depthMm', 'ambientC', 'reactionHeatJG', 'activationKJMol', 'refTempC', 'gelMin', 'limitC']),
    );
  });
});
