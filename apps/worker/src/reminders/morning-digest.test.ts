import { randomUUID } from 'node:crypto';
import { pino } from 'pino';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDataSource } from '@gelpoint/db';
import { sendMorningDigests } from './morning-digest.job';
import { dispatchDueReminders } from './reminder-dispatch.job';

const logger = pino({ level: 'silent' });
const url = 'http://127.0.0.1:8080';
let ds: DataSource;
let restarted: DataSource;

function testUrl(): string {
  const u = process.env.GELPOINT_TEST_DATABASE_URL;
  if (!u) throw new Error('GELPOINT_TEST_DATABASE_URL is not set: run the tests through npm test');
  return u;
}

beforeAll(async () => {
  ds = await createDataSource({ url: testUrl(), poolSize: 3 }).initialize();
  restarted = await createDataSource({ url: testUrl(), poolSize: 3 }).initialize();
});
afterAll(async () => {
  await ds?.destroy();
  await restarted?.destroy();
});

// Vancouver is UTC−8 in December (PST), per the IANA tz database: 07:30 PST on 4 December 2026 is 15:30Z.
const morning = new Date('2026-12-04T15:30:00Z');
const at = (isoZ: string) => new Date(isoZ);

/** A West Coast shop (day from 07:00, quiet from 21:00) with a pour naming two of its three active members. */
async function westCoastShop() {
  const one = async (sql: string, params: unknown[]) => ((await ds.query(sql, params)) as { id: string }[])[0]!.id;
  const shop = await one(
    `INSERT INTO shops (name, time_zone, day_start_hour, quiet_from_hour) VALUES ('Harbour Slab Works', 'America/Vancouver', 7, 21) RETURNING id`,
    [],
  );
  const user = async (label: string, status = 'active') => {
    const id = await one(`INSERT INTO users (email, name, password_hash) VALUES ($1, $2, 'x') RETURNING id`, [
      `${label}-${randomUUID().slice(0, 8)}@example.test`,
      label,
    ]);
    await ds.query(`INSERT INTO memberships (user_id, shop_id, role, status) VALUES ($1, $2, 'maker', $3)`, [id, shop, status]);
    return id;
  };
  const [ana, ben, cy, dee] = [await user('ana'), await user('ben'), await user('cy', 'disabled'), await user('dee')];
  const piece = await one(`INSERT INTO pieces (shop_id, name) VALUES ($1, 'Walnut river table') RETURNING id`, [shop]);
  const plan = await one(
    `INSERT INTO pour_plans (shop_id, piece_id, name, inputs, product_snapshot, result) VALUES ($1, $2, 'Deep pour', '{}', '{}', '{}') RETURNING id`,
    [shop, piece],
  );
  const pour = await one(`INSERT INTO pours (shop_id, piece_id, pour_plan_id, assumed_temp_c, notify_user_ids) VALUES ($1, $2, $3, 21, $4) RETURNING id`, [
    shop,
    piece,
    plan,
    [ana, ben, cy],
  ]);
  const reminder = (kind: string, step: string, dueAt: Date, eventAt: Date, viaDigest: boolean, extra = '') =>
    one(
      `INSERT INTO reminders (shop_id, pour_id, kind, step, due_at, event_at, lead_min, title, via_digest${extra ? ', done_at, status' : ''})
       VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9${extra}) RETURNING id`,
      [shop, pour, kind, step, dueAt, eventAt, Math.round((eventAt.getTime() - dueAt.getTime()) / 60_000), `Title ${kind} ${step}`, viaDigest],
    );
  return {
    shop,
    people: { ana, ben, cy, dee },
    pour,
    // 02:10 PST, held through the night.
    held: await reminder('next_layer_window_opens', 'layer:1', at('2026-12-04T10:10:00Z'), at('2026-12-04T10:10:00Z'), true),
    // 13:00 PST today, sent on its own later: listed as coming.
    coming: await reminder('demold_check', 'layer:2', at('2026-12-04T21:00:00Z'), at('2026-12-04T21:00:00Z'), false),
    // 06:00 PST tomorrow: inside the next 24 hours, and in quiet hours, so it will wait for tomorrow's digest too.
    tomorrow: await reminder('ready_to_machine', 'layer:2', at('2026-12-05T14:00:00Z'), at('2026-12-05T14:00:00Z'), true),
    // Three days out: not in this digest.
    later: await reminder('finish_coat_due', 'finish:1', at('2026-12-07T18:00:00Z'), at('2026-12-07T18:00:00Z'), false),
    // Marked done: not listed.
    done: await reminder('next_layer_window_closes', 'layer:1', at('2026-12-04T16:00:00Z'), at('2026-12-04T16:30:00Z'), false, `, now(), 'cancelled'`),
  };
}

type Mail = { dedupe_key: string; to_address: string; subject: string; body_text: string };
const mailOf = (shop: string): Promise<Mail[]> =>
  ds.query(`SELECT dedupe_key, to_address, subject, body_text FROM outbound_mail WHERE shop_id = $1 AND dedupe_key LIKE 'digest:%' ORDER BY to_address`, [
    shop,
  ]);

describe('the morning digest', () => {
  it('waits for the start of the shop’s day by its own clock', async () => {
    const f = await westCoastShop();
    // 06:59 PST: still quiet hours in Vancouver, though 14:59 in UTC.
    expect(await sendMorningDigests(ds, url, logger, { now: () => at('2026-12-04T14:59:00Z'), shopIds: [f.shop] })).toBe(0);
    expect(await mailOf(f.shop)).toHaveLength(0);
  });

  it('sends each member with something due one mail, in Pacific time, and sends the night’s held reminders with it', async () => {
    const f = await westCoastShop();
    expect(await sendMorningDigests(ds, url, logger, { now: () => morning, shopIds: [f.shop] })).toBe(2);
    const mail = await mailOf(f.shop);
    // ana and ben are on the pour; cy is disabled; dee has nothing due and gets no mail.
    expect(mail.map((m) => m.dedupe_key).sort()).toEqual([`digest:${f.shop}:${f.people.ana}:2026-12-04`, `digest:${f.shop}:${f.people.ben}:2026-12-04`].sort());
    const text = mail[0]!.body_text;
    expect(mail[0]!.subject).toBe('Harbour Slab Works: 3 things due today (2026-12-04)');
    expect(text).toContain('as of Fri 4 Dec 2026, 07:30 PST');
    expect(text).toMatch(/While the shop was quiet:\n- 02:10 PST: Title next_layer_window_opens layer:1/);
    expect(text).toMatch(/In the next 24 hours:\n- 13:00 PST: Title demold_check layer:2\n.*\n- Sat 5 Dec 2026, 06:00 PST: Title ready_to_machine/);
    expect(text).not.toContain('finish_coat_due');
    expect(text).not.toContain('next_layer_window_closes');
    expect(text).not.toMatch(/GMT|UTC/);
    expect(text).toContain(`${url}/pours/${f.pour}`);
    expect(text).toMatch(/SDS and TDS/);
    const status: { id: string; status: string; sent_at: Date | null }[] = await ds.query(`SELECT id, status, sent_at FROM reminders WHERE pour_id = $1`, [
      f.pour,
    ]);
    const byId = new Map(status.map((r) => [r.id, r.status]));
    expect(byId.get(f.held)).toBe('sent');
    expect(byId.get(f.coming)).toBe('pending');
    expect(byId.get(f.tomorrow)).toBe('pending');
  });

  it('is sent once per member per day, through a restart and with two workers at once', async () => {
    const f = await westCoastShop();
    const opts = { now: () => morning, shopIds: [f.shop] };
    await Promise.all([sendMorningDigests(ds, url, logger, opts), sendMorningDigests(restarted, url, logger, opts)]);
    // A restarted worker an hour later: the shop already had today's digest.
    expect(await sendMorningDigests(restarted, url, logger, { now: () => new Date(morning.getTime() + 3_600_000), shopIds: [f.shop] })).toBe(0);
    expect(await mailOf(f.shop)).toHaveLength(2);
    // Even with the day's mark lost (a restore from an older backup), the mail's key keeps it to one each.
    await ds.query(`UPDATE shops SET digest_on = NULL WHERE id = $1`, [f.shop]);
    await sendMorningDigests(restarted, url, logger, opts);
    expect(await mailOf(f.shop)).toHaveLength(2);
    // The next morning is a new day: tomorrow's held reminder goes out with it.
    expect(await sendMorningDigests(ds, url, logger, { now: () => at('2026-12-05T15:05:00Z'), shopIds: [f.shop] })).toBe(2);
    const tomorrow: { status: string }[] = await ds.query(`SELECT status FROM reminders WHERE id = $1`, [f.tomorrow]);
    expect(tomorrow[0]!.status).toBe('sent');
  });

  it('leaves a night the worker slept through entirely to the next morning, not to the evening', async () => {
    const f = await westCoastShop();
    // 22:00 PST on the 4th: the shop is quiet again.
    expect(await sendMorningDigests(ds, url, logger, { now: () => at('2026-12-05T06:00:00Z'), shopIds: [f.shop] })).toBe(0);
  });

  it('keeps held reminders out of the one-by-one dispatch', async () => {
    const f = await westCoastShop();
    await dispatchDueReminders(ds, url, logger);
    const held: { status: string }[] = await ds.query(`SELECT status FROM reminders WHERE id = $1`, [f.held]);
    expect(held[0]!.status).toBe('pending');
    const single: unknown[] = await ds.query(`SELECT 1 FROM outbound_mail WHERE dedupe_key = $1`, [`reminder:${f.held}:${f.people.ana}`]);
    expect(single).toHaveLength(0);
  });
});
