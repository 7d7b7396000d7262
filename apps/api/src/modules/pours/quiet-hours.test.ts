import { describe, expect, it } from 'vitest';
import { resinInput } from '../../test-support/fixtures';
import { bearer, createShop, useHarness } from '../../test-support/harness';

const h = useHarness();
const hour = 3_600_000;

type ReminderOut = { kind: string; dueAt: string; eventAt: string; leadMin: number; viaDigest: boolean };

describe("reminders and the shop's quiet hours", () => {
  it('holds a window opening in the night for the digest, and announces one closing in the night as quiet hours start', async () => {
    const shop = await createShop(h);
    // A UTC shop whose working day is this hour and the next: quiet from two whole hours on until this hour tomorrow.
    const hourStart = Math.floor(Date.now() / hour) * hour;
    const thisHour = new Date(hourStart).getUTCHours();
    await h
      .http()
      .patch('/api/shop')
      .set(bearer(shop.lead))
      .send({ timeZone: 'UTC', dayStartHour: thisHour, quietFromHour: (thisHour + 2) % 24 })
      .expect(200);
    const product = (
      await h
        .http()
        .post('/api/shelf/resin-systems')
        .set(bearer(shop.lead))
        .send(resinInput({ referenceTempC: 20, minWorkTempC: 5, maxLayerMm: 25 }))
        .expect(201)
    ).body;
    const piece = (await h.http().post('/api/pieces').set(bearer(shop.lead)).send({ name: 'Night tray' }).expect(201)).body;
    const plan = (
      await h
        .http()
        .post('/api/pour-plans')
        .set(bearer(shop.lead))
        .send({
          pieceId: piece.id,
          name: 'Two layers',
          cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 200, widthMm: 100, depthMm: 40 } },
          fillLevelMm: 40,
          deepPour: { resinSystemId: product.id },
          overPourPct: 0,
          cupWaste: { massG: 0 },
          shopTempC: 20,
        })
        .expect(201)
    ).body;
    const pour = (await h.http().post('/api/pours').set(bearer(shop.lead)).send({ pourPlanId: plan.id }).expect(201)).body;
    const mixedAt = new Date(Date.now() - hour).toISOString();
    for (const c of plan.result.layers[0].batches as { index: number; partA: { grams: number }; partB: { grams: number } }[]) {
      await h
        .http()
        .post(`/api/pours/${pour.id}/batches`)
        .set(bearer(shop.lead))
        .send({ planBatchIndex: c.index, mixedAt, weighedAG: c.partA.grams, weighedBG: c.partB.grams })
        .expect(201);
    }
    const reminders = (await h.http().get(`/api/pours/${pour.id}`).set(bearer(shop.lead)).expect(200)).body.reminders as ReminderOut[];
    // At the reference temperature the window opens 12 h and closes 36 h after the pour (the fixture's data sheet).
    const opens = reminders.find((r) => r.kind === 'next_layer_window_opens')!;
    expect(Date.parse(opens.eventAt)).toBeCloseTo(Date.parse(mixedAt) + 12 * hour, -4);
    expect(opens.viaDigest).toBe(true);
    expect(opens.dueAt).toBe(opens.eventAt);
    const closes = reminders.find((r) => r.kind === 'next_layer_window_closes')!;
    expect(Date.parse(closes.eventAt)).toBeCloseTo(Date.parse(mixedAt) + 36 * hour, -4);
    // It closes in tomorrow's quiet hours, so it goes out as they start: two hours after this hour tomorrow.
    expect(closes.viaDigest).toBe(false);
    expect(Date.parse(closes.dueAt)).toBe(hourStart + 26 * hour);
    expect(closes.leadMin).toBe(Math.round((Date.parse(closes.eventAt) - Date.parse(closes.dueAt)) / 60_000));
  });
});
