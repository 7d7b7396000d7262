import { randomUUID } from 'node:crypto';
import { pino } from 'pino';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDataSource } from '@gelpoint/db';
import { dispatchDueReminders } from './reminder-dispatch.job';

const logger = pino({ level: 'silent' });
let ds: DataSource;
let second: DataSource;

function testUrl(): string {
  const url = process.env.GELPOINT_TEST_DATABASE_URL;
  if (!url) throw new Error('GELPOINT_TEST_DATABASE_URL is not set: run the tests through npm test');
  return url;
}

beforeAll(async () => {
  ds = await createDataSource({ url: testUrl(), poolSize: 3 }).initialize();
  second = await createDataSource({ url: testUrl(), poolSize: 3 }).initialize();
});
afterAll(async () => {
  await ds?.destroy();
  await second?.destroy();
});

/** A shop with a pour naming three people (one of them disabled) and reminders due in the past and future. */
async function pourWithReminders() {
  const one = async (sql: string, params: unknown[]) => ((await ds.query(sql, params)) as { id: string }[])[0]!.id;
  const shop = await one(`INSERT INTO shops (name) VALUES ('Reminder shop') RETURNING id`, []);
  const user = async (label: string, status: string) => {
    const id = await one(`INSERT INTO users (email, name, password_hash) VALUES ($1, $2, 'x') RETURNING id`, [
      `${label}-${randomUUID().slice(0, 8)}@example.test`,
      label,
    ]);
    await ds.query(`INSERT INTO memberships (user_id, shop_id, role, status) VALUES ($1, $2, 'maker', $3)`, [id, shop, status]);
    return id;
  };
  const people = [await user('ana', 'active'), await user('ben', 'active'), await user('cy', 'disabled')];
  const piece = await one(`INSERT INTO pieces (shop_id, name) VALUES ($1, 'Burl bowl') RETURNING id`, [shop]);
  const plan = await one(
    `INSERT INTO pour_plans (shop_id, piece_id, name, inputs, product_snapshot, result) VALUES ($1, $2, 'Void fill', '{}', '{}', '{}') RETURNING id`,
    [shop, piece],
  );
  const pour = await one(`INSERT INTO pours (shop_id, piece_id, pour_plan_id, assumed_temp_c, notify_user_ids) VALUES ($1, $2, $3, 21, $4) RETURNING id`, [
    shop,
    piece,
    plan,
    people,
  ]);
  const reminder = (kind: string, step: string, dueSql: string) =>
    one(`INSERT INTO reminders (shop_id, pour_id, kind, step, due_at, event_at, title) VALUES ($1, $2, $3, $4, ${dueSql}, ${dueSql}, $5) RETURNING id`, [
      shop,
      pour,
      kind,
      step,
      `Title ${kind}`,
    ]);
  const due = [
    await reminder('demold_check', 'layer:2', `now() - interval '5 minutes'`),
    await reminder('next_layer_window_opens', 'layer:1', `now() - interval '2 hours'`),
    await reminder('ready_to_machine', 'layer:2', `now() - interval '1 minute'`),
  ];
  const later = await reminder('finish_coat_due', 'finish:1', `now() + interval '3 days'`);
  return { shop, people, pour, due, later };
}

describe('reminder dispatch', () => {
  it('turns each due reminder into one mail per active person named, even with two workers at once', async () => {
    const f = await pourWithReminders();
    await Promise.all([dispatchDueReminders(ds, 'http://127.0.0.1:8080', logger, 1), dispatchDueReminders(second, 'http://127.0.0.1:8080', logger, 1)]);
    await dispatchDueReminders(ds, 'http://127.0.0.1:8080', logger);
    const mail: { dedupe_key: string; subject: string; body_text: string }[] = await ds.query(
      `SELECT dedupe_key, subject, body_text FROM outbound_mail WHERE shop_id = $1 ORDER BY dedupe_key`,
      [f.shop],
    );
    expect(mail).toHaveLength(f.due.length * 2);
    expect(new Set(mail.map((m) => m.dedupe_key)).size).toBe(mail.length);
    expect(mail.every((m) => !m.dedupe_key.endsWith(f.people[2]!))).toBe(true);
    expect(mail[0]!.body_text).toContain(`http://127.0.0.1:8080/pours/${f.pour}`);
    expect(mail[0]!.body_text).toMatch(/SDS and TDS/);
    const status: { id: string; status: string }[] = await ds.query(`SELECT id, status FROM reminders WHERE pour_id = $1`, [f.pour]);
    for (const r of status) expect(r.status).toBe(r.id === f.later ? 'pending' : 'sent');
  });
});

describe('reminder mail', () => {
  it('writes the step’s time in the shop’s zone with its abbreviation, and says why a night window comes the evening before', async () => {
    const one = async (sql: string, params: unknown[]) => ((await ds.query(sql, params)) as { id: string }[])[0]!.id;
    const shop = await one(
      `INSERT INTO shops (name, time_zone, day_start_hour, quiet_from_hour) VALUES ('Pacific shop', 'America/Vancouver', 7, 21) RETURNING id`,
      [],
    );
    const user = await one(`INSERT INTO users (email, name, password_hash) VALUES ($1, 'Ana', 'x') RETURNING id`, [
      `ana-${randomUUID().slice(0, 8)}@example.test`,
    ]);
    await ds.query(`INSERT INTO memberships (user_id, shop_id, role, status) VALUES ($1, $2, 'maker', 'active')`, [user, shop]);
    const piece = await one(`INSERT INTO pieces (shop_id, name) VALUES ($1, 'Cedar slab') RETURNING id`, [shop]);
    const plan = await one(
      `INSERT INTO pour_plans (shop_id, piece_id, name, inputs, product_snapshot, result) VALUES ($1, $2, 'Fill', '{}', '{}', '{}') RETURNING id`,
      [shop, piece],
    );
    const pour = await one(`INSERT INTO pours (shop_id, piece_id, pour_plan_id, assumed_temp_c, notify_user_ids) VALUES ($1, $2, $3, 21, $4) RETURNING id`, [
      shop,
      piece,
      plan,
      [user],
    ]);
    // Closes 02:00 PST on 4 December 2026 (10:00Z); announced as quiet hours began, 21:00 PST (05:00Z), 5 h ahead.
    const id = await one(
      `INSERT INTO reminders (shop_id, pour_id, kind, step, due_at, event_at, lead_min, title) VALUES ($1, $2, 'next_layer_window_closes', 'layer:1', '2026-12-04T05:00:00Z', '2026-12-04T10:00:00Z', 300, 'Next layer window closes: Cedar slab, layer 1') RETURNING id`,
      [shop, pour],
    );
    await dispatchDueReminders(ds, 'http://127.0.0.1:8080', logger);
    const mail: { body_text: string }[] = await ds.query(`SELECT body_text FROM outbound_mail WHERE dedupe_key = $1`, [`reminder:${id}:${user}`]);
    expect(mail[0]!.body_text).toContain('Closes: Fri 4 Dec 2026, 02:00 PST, 5 h after this reminder was due: pour before then.');
    expect(mail[0]!.body_text).toContain('quiet hours, so this reminder comes the evening before');
    expect(mail[0]!.body_text).not.toMatch(/GMT|UTC/);
  });
});
