import ICAL from 'ical.js';
import { describe, expect, it } from 'vitest';
import { resinInput } from '../../test-support/fixtures';
import { bearer, createShop, useHarness } from '../../test-support/harness';

const h = useHarness();
const hour = 3_600_000;
const iso = (msAgo: number) => new Date(Date.now() - msAgo).toISOString();

/** A shop with a two-layer pour whose first layer went in two hours ago, so its window events lie ahead. */
async function pourUnderWay(pieceName = 'Walnut tray') {
  const shop = await createShop(h);
  const maker = await shop.member('maker');
  const product = (
    await h
      .http()
      .post('/api/shelf/resin-systems')
      .set(bearer(shop.lead))
      .send(resinInput({ mixRatio: { a: 2, b: 1, basis: 'weight' }, referenceTempC: 20, minWorkTempC: 5, maxLayerMm: 25 }))
      .expect(201)
  ).body;
  const piece = (await h.http().post('/api/pieces').set(bearer(maker)).send({ name: pieceName }).expect(201)).body;
  const plan = (
    await h
      .http()
      .post('/api/pour-plans')
      .set(bearer(maker))
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
  const cups = plan.result.layers[0].batches as { index: number; partA: { grams: number }; partB: { grams: number } }[];
  const pour = (await h.http().post('/api/pours').set(bearer(maker)).send({ pourPlanId: plan.id }).expect(201)).body;
  for (const c of cups)
    await h
      .http()
      .post(`/api/pours/${pour.id}/batches`)
      .set(bearer(maker))
      .send({ planBatchIndex: c.index, mixedAt: iso(2 * hour), weighedAG: c.partA.grams, weighedBG: c.partB.grams })
      .expect(201);
  return { shop, maker, pour, piece };
}

const feedPath = (url: string) => new URL(url).pathname;

async function feedOf(url: string) {
  const res = await h
    .http()
    .get(feedPath(url))
    .buffer(true)
    .parse((r, done) => {
      let text = '';
      r.setEncoding('utf8');
      r.on('data', (c: string) => (text += c));
      r.on('end', () => done(null, text));
    });
  return { status: res.status, type: res.headers['content-type'] as string | undefined, text: res.body as string };
}

/** The feed read back by ical.js, a parser of its own (not the library that wrote it). */
function events(text: string) {
  const calendar = new ICAL.Component(ICAL.parse(text));
  return calendar.getAllSubcomponents('vevent').map((v) => {
    const e = new ICAL.Event(v);
    return {
      uid: e.uid,
      summary: e.summary,
      start: e.startDate.toJSDate().getTime(),
      description: e.description,
      url: v.getFirstPropertyValue('url'),
      alarms: v.getAllSubcomponents('valarm').length,
    };
  });
}

describe('calendar feeds', () => {
  it('gives each member a private, unguessable feed URL, kept hashed', async () => {
    const w = await pourUnderWay();
    const me = (await h.http().get('/api/me').set(bearer(w.maker)).expect(200)).body;
    expect(me.calendarUrl).toMatch(/^http:\/\/127\.0\.0\.1:8080\/api\/calendar\/[A-Za-z0-9_-]{40,}\.ics$/);
    const token = /calendar\/([^.]+)\.ics$/.exec(me.calendarUrl)![1]!;
    const lead = (await h.http().get('/api/me').set(bearer(w.shop.lead)).expect(200)).body;
    expect(lead.calendarUrl).not.toBe(me.calendarUrl);
    // The same URL on every visit, and the token itself nowhere in the database.
    expect((await h.http().get('/api/me').set(bearer(w.maker)).expect(200)).body.calendarUrl).toBe(me.calendarUrl);
    const stored: unknown[] = await h.ds.query(`SELECT 1 FROM memberships WHERE calendar_token_hash = $1 OR calendar_token_salt = $1`, [token]);
    expect(stored).toHaveLength(0);
  });

  it('answers RFC 5545 text without sign-in, one event per coming step, read back by an independent parser', async () => {
    const w = await pourUnderWay('Oak, maple; and walnut board with a very long name that goes well past the seventy-five octet line limit');
    const me = (await h.http().get('/api/me').set(bearer(w.maker)).expect(200)).body;
    const feed = await feedOf(me.calendarUrl);
    expect(feed.status).toBe(200);
    expect(feed.type).toMatch(/^text\/calendar/);
    // RFC 5545 §3.1: lines end in CRLF and are folded at 75 octets; §3.3.11: commas and semicolons in text are escaped.
    expect(feed.text.startsWith('BEGIN:VCALENDAR\r\n')).toBe(true);
    expect(feed.text.replace(/\r\n/g, '')).not.toMatch(/\n/);
    for (const line of feed.text.split('\r\n')) expect(Buffer.byteLength(line, 'utf8')).toBeLessThanOrEqual(75);
    expect(feed.text).toContain('Oak\\, maple\\; and');
    const list = events(feed.text);
    expect(list.length).toBeGreaterThanOrEqual(2);
    expect(new Set(list.map((e) => e.uid)).size).toBe(list.length);
    const opens = list.find((e) => e.summary.startsWith('Next layer can go on'));
    expect(opens?.summary).toContain('Oak, maple; and walnut board');
    const closes = list.find((e) => e.summary.startsWith('Next layer window closes'));
    expect(closes?.alarms).toBe(1);
    for (const e of list) {
      expect(e.url).toBe(`http://127.0.0.1:8080/pours/${w.pour.id}`);
      expect(e.start).toBeGreaterThan(Date.now() - 60_000);
    }
    // The same events under the same UIDs on the next fetch, as a phone's calendar expects.
    expect(
      events((await feedOf(me.calendarUrl)).text)
        .map((e) => e.uid)
        .sort(),
    ).toEqual(list.map((e) => e.uid).sort());
  });

  it('follows the cure model as readings arrive', async () => {
    const w = await pourUnderWay();
    const me = (await h.http().get('/api/me').set(bearer(w.maker)).expect(200)).body;
    const before = events((await feedOf(me.calendarUrl)).text).find((e) => e.summary.startsWith('Next layer can go on'))!;
    // A cold shop: 8 °C for the two hours since the pour. The window opens later, under the same UID.
    const cold = Array.from({ length: 3 }, (_, i) => ({ at: iso((2 - i) * hour), tempC: 8 }));
    await h.http().post(`/api/pours/${w.pour.id}/readings`).set(bearer(w.maker)).send({ readings: cold }).expect(200);
    const after = events((await feedOf(me.calendarUrl)).text).find((e) => e.uid === before.uid)!;
    expect(after.start).toBeGreaterThan(before.start);
  });

  it('revokes the old URL on rotation: it answers 404, the new one works', async () => {
    const w = await pourUnderWay();
    const old = (await h.http().get('/api/me').set(bearer(w.maker)).expect(200)).body.calendarUrl as string;
    expect((await feedOf(old)).status).toBe(200);
    const rotated = (await h.http().post('/api/me/calendar/rotate').set(bearer(w.maker)).expect(200)).body.calendarUrl as string;
    expect(rotated).not.toBe(old);
    expect((await feedOf(old)).status).toBe(404);
    expect((await feedOf(rotated)).status).toBe(200);
    expect((await h.http().get('/api/me').set(bearer(w.maker)).expect(200)).body.calendarUrl).toBe(rotated);
    // Made-up and malformed tokens are the same 404.
    expect((await h.http().get('/api/calendar/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA.ics')).status).toBe(404);
    expect((await h.http().get('/api/calendar/..%2F..%2Fetc')).status).toBe(404);
  });

  it('stops answering for a member who was disabled, and shows no other shop’s pours', async () => {
    const w = await pourUnderWay();
    const other = await pourUnderWay();
    const url = (await h.http().get('/api/me').set(bearer(other.maker)).expect(200)).body.calendarUrl as string;
    expect((await feedOf(url)).text).not.toContain(w.pour.id);
    await h.ds.query(`UPDATE memberships SET status = 'disabled' WHERE user_id = $1`, [other.maker.user.id]);
    expect((await feedOf(url)).status).toBe(404);
  });
});
