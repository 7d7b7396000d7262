import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { resinInput } from '../../test-support/fixtures';
import { bearer, createShop, useHarness, type ShopFixture } from '../../test-support/harness';

const h = useHarness();

interface Event {
  id: string;
  at: string;
  actor: { id: string; name: string } | null;
  action: string;
  objectType: string;
  objectId: string | null;
  objectName: string | null;
  link: string | null;
  detail: Record<string, unknown>;
}

async function list(
  shop: ShopFixture,
  query: Record<string, string | number> = {},
): Promise<{ items: Event[]; next: { before: string; beforeId: string } | null }> {
  return (await h.http().get('/api/audit').query(query).set(bearer(shop.lead)).expect(200)).body;
}

/** Pins the shop's events to chosen instants, so the date filters and paging are checked against known times. */
async function setTimes(ids: string[], at: string[]): Promise<void> {
  for (const [i, id] of ids.entries()) await h.ds.query('UPDATE audit_events SET created_at = $2 WHERE id = $1', [id, at[i]]);
}

describe('the audit log', () => {
  it('names the actor and the object, links what still exists, and keeps the recorded name of what is gone', async () => {
    const shop = await createShop(h, 'Audit shop');
    const lead = bearer(shop.lead);
    const maker = await shop.member('maker');
    const piece = (await h.http().post('/api/pieces').set(bearer(maker)).send({ name: 'Walnut tray' }).expect(201)).body;
    await h.http().patch(`/api/pieces/${piece.id}`).set(bearer(maker)).send({ name: 'Walnut serving tray' }).expect(200);
    const resin = (
      await h
        .http()
        .post('/api/shelf/resin-systems')
        .set(lead)
        .send(resinInput({ name: 'Deep 50' }))
        .expect(201)
    ).body;
    const lot = (
      await h
        .http()
        .post('/api/shelf/lots')
        .set(lead)
        .send({ part: 'A', resinSystemId: resin.id, lotNumber: 'BRI-A-0412', quantityG: 1000, receivedOn: '2026-11-01' })
        .expect(201)
    ).body;
    await h.http().delete(`/api/shelf/lots/${lot.id}`).set(lead).expect(204);

    const { items } = await list(shop);
    const byAction = (action: string) => items.find((e) => e.action === action)!;
    expect(byAction('lot.delete')).toMatchObject({
      objectId: lot.id,
      objectName: 'BRI-A-0412',
      link: null,
      actor: { id: shop.lead.user.id, name: 'Lead Person' },
    });
    expect(byAction('lot.create')).toMatchObject({ objectName: 'BRI-A-0412', link: null });
    // The piece is named as it is called now, by every event about it, and linked.
    for (const action of ['piece.create', 'piece.update']) {
      expect(byAction(action)).toMatchObject({ objectName: 'Walnut serving tray', link: `/pieces/${piece.id}`, actor: { id: maker.user.id } });
    }
    expect(byAction('resin_system.create')).toMatchObject({ objectName: 'Deep 50', link: `/shelf/resin-systems/${resin.id}` });
    expect(byAction('shop.create')).toMatchObject({ objectName: 'Audit shop', link: '/shop-settings' });
  });

  it('filters by person, by kind or action, and by dates or instants', async () => {
    const shop = await createShop(h, 'Filter shop');
    const maker = await shop.member('maker');
    const made = [];
    for (const name of ['One', 'Two', 'Three']) made.push((await h.http().post('/api/pieces').set(bearer(maker)).send({ name }).expect(201)).body.id as string);
    await h.http().patch(`/api/pieces/${made[0]}`).set(bearer(shop.lead)).send({ notes: 'checked' }).expect(200);

    const byMaker = await list(shop, { actorId: maker.user.id });
    expect(byMaker.items.every((e) => e.actor?.id === maker.user.id)).toBe(true);
    expect(byMaker.items.filter((e) => e.action === 'piece.create')).toHaveLength(3);
    expect(byMaker.items.some((e) => e.action === 'piece.update')).toBe(false);
    expect((await list(shop, { action: 'piece' })).items.map((e) => e.action).sort()).toEqual(['piece.create', 'piece.create', 'piece.create', 'piece.update']);
    expect((await list(shop, { action: 'piece.update' })).items.map((e) => e.objectId)).toEqual([made[0]]);
    // A kind is the whole first part of the action: "pour" is not "pour_plan".
    expect((await list(shop, { action: 'pour' })).items).toEqual([]);

    const creates = (await list(shop, { action: 'piece.create' })).items;
    // Newest first: Three, Two, One. Pinned to an evening in New York (UTC−5 in March, IANA tz database) and the next day.
    await setTimes(
      creates.map((e) => e.id),
      ['2026-03-03T00:30:00Z', '2026-03-02T23:30:00Z', '2026-03-01T10:00:00Z'],
    );
    const names = async (q: Record<string, string>) => (await list(shop, { action: 'piece.create', ...q })).items.map((e) => e.objectName);
    // Calendar dates are whole UTC days, both ends included.
    expect(await names({ from: '2026-03-02', to: '2026-03-02' })).toEqual(['Two']);
    expect(await names({ from: '2026-03-01', to: '2026-03-02' })).toEqual(['Two', 'One']);
    expect(await names({ from: '2026-03-03' })).toEqual(['Three']);
    // The reader's own day, 2 March in New York, sent as instants: 05:00Z on the 2nd to 05:00Z on the 3rd.
    expect(await names({ from: '2026-03-02T00:00:00-05:00', to: '2026-03-03T00:00:00-05:00' })).toEqual(['Three', 'Two']);

    const backwards = await h.http().get('/api/audit').query({ from: '2026-03-03', to: '2026-03-01' }).set(bearer(shop.lead)).expect(400);
    expect(backwards.body.error.fields.to).toMatch(/on or after/);
    for (const bad of [{ action: 'DROP TABLE' }, { actorId: 'nobody' }, { from: 'yesterday' }, { to: '2026-13-01' }]) {
      const res = await h.http().get('/api/audit').query(bad).set(bearer(shop.lead)).expect(400);
      expect(res.body.error.message.length).toBeGreaterThan(10);
    }
  });

  it('pages through events of the same instant without skipping or repeating one', async () => {
    const shop = await createShop(h, 'Paging shop');
    for (let i = 0; i < 6; i++)
      await h
        .http()
        .post('/api/pieces')
        .set(bearer(shop.lead))
        .send({ name: `Piece ${i}` })
        .expect(201);
    const all = (await list(shop, { limit: 200 })).items;
    expect(all.length).toBeGreaterThanOrEqual(7);
    // Everything at one instant, as events written in one transaction are.
    await setTimes(
      all.map((e) => e.id),
      all.map(() => '2026-05-05T12:00:00.123456Z'),
    );
    const seen: string[] = [];
    let query: Record<string, string | number> = { limit: 3 };
    for (let guard = 0; guard < 10; guard++) {
      const page = await list(shop, query);
      seen.push(...page.items.map((e) => e.id));
      if (!page.next) break;
      query = { limit: 3, before: page.next.before, beforeId: page.next.beforeId };
    }
    expect(seen).toHaveLength(all.length);
    expect(new Set(seen).size).toBe(all.length);
    expect(seen).toEqual((await list(shop, { limit: 200 })).items.map((e) => e.id));
  });

  it('exports the filtered log as RFC 4180 CSV that a parser reads back, with spreadsheet formulas defused', async () => {
    const shop = await createShop(h, 'Export shop');
    const lead = bearer(shop.lead);
    const tricky = ['=HYPERLINK("http://example.test","x")', '+1 tray', '-2 tray', '@SUM(A1)', 'Tray, with "quotes"\nand a new line'];
    for (const name of tricky) await h.http().post('/api/pieces').set(lead).send({ name }).expect(201);

    const res = await h.http().get('/api/audit/export').query({ action: 'piece' }).set(lead).buffer(true).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="gelpoint-audit-\d{4}-\d{2}-\d{2}\.csv"$/);
    // RFC 4180 §2: records end in CRLF.
    expect(res.text.split('\r\n')[0]).toBe('at,actor,event,action,objectType,objectId,objectName,detail');
    const rows = parse(res.text, { columns: true, relax_quotes: false }) as Record<string, string>[];
    const listed = (await list(shop, { action: 'piece' })).items;
    expect(rows).toHaveLength(tricky.length);
    expect(rows.map((r) => r.objectId)).toEqual(listed.map((e) => e.objectId));
    expect(rows.map((r) => Date.parse(r.at!))).toEqual(listed.map((e) => Date.parse(e.at)));
    // OWASP CSV injection: a cell starting with = + - @ is written with a leading apostrophe; everything else as it was.
    const names = rows.map((r) => r.objectName).reverse();
    expect(names).toEqual(["'" + tricky[0], "'" + tricky[1], "'" + tricky[2], "'" + tricky[3], tricky[4]]);
    expect(rows.at(-1)!.event).toBe(`Piece ${tricky[0]} created by Lead Person`);
    expect(rows.every((r) => r.actor === 'Lead Person' && r.action === 'piece.create')).toBe(true);
    expect(JSON.parse(rows[0]!.detail!)).toEqual({ name: tricky[4] });

    const none = await h.http().get('/api/audit/export').query({ from: '2001-01-01', to: '2001-01-02' }).set(lead).buffer(true).expect(200);
    expect(parse(none.text)).toEqual([['at', 'actor', 'event', 'action', 'objectType', 'objectId', 'objectName', 'detail']]);
    await h.http().get('/api/audit/export').query({ to: 'soon' }).set(lead).expect(400);
  });

  it("never shows another shop's events, even filtered by that shop's people", async () => {
    const a = await createShop(h, 'Shop A');
    const b = await createShop(h, 'Shop B');
    await h.http().post('/api/pieces').set(bearer(a.lead)).send({ name: 'Secret of A' }).expect(201);
    const seenByB = await list(b, { actorId: a.lead.user.id, limit: 200 });
    expect(seenByB.items).toEqual([]);
    const csv = await h.http().get('/api/audit/export').query({ actorId: a.lead.user.id }).set(bearer(b.lead)).buffer(true).expect(200);
    expect(csv.text).not.toContain('Secret of A');
    expect(parse(csv.text)).toHaveLength(1);
    const maker = await b.member('maker');
    await h.http().get('/api/audit/export').set(bearer(maker)).expect(403);
  });
});
