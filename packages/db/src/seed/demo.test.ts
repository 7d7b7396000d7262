import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { createDataSource } from '../data-source';
import { Membership, Piece, Shop, User } from '../entities';
import { verifyPassword } from '../passwords';
import { DEMO_PASSWORD, demoSignIns, seedDemo } from './demo';

// npm test seeds the e2e database with the real seed command before the tests run.
let ds: DataSource;
beforeAll(async () => {
  const url = process.env.GELPOINT_E2E_DATABASE_URL;
  if (!url) throw new Error('GELPOINT_E2E_DATABASE_URL is not set: run the tests through npm test');
  ds = createDataSource({ url, poolSize: 2 });
  await ds.initialize();
});
afterAll(() => ds?.destroy());

describe('demo scenario', () => {
  it('holds one shop with a lead, a maker and an apprentice who can sign in with the demo password', async () => {
    const shops = await ds.getRepository(Shop).find();
    expect(shops).toHaveLength(1);
    for (const d of demoSignIns) {
      const user = await ds.getRepository(User).findOneByOrFail({ email: d.email });
      expect(await verifyPassword(DEMO_PASSWORD, user.passwordHash)).toBe(true);
      const m = await ds.getRepository(Membership).findOneByOrFail({ userId: user.id, shopId: shops[0]!.id });
      expect(m.role).toBe(d.role);
    }
    expect(demoSignIns.map((d) => d.role).sort()).toEqual(['apprentice', 'lead', 'maker']);
  });

  it('has pieces at several different stages', async () => {
    const pieces = await ds.getRepository(Piece).find();
    expect(new Set(pieces.map((p) => p.stage)).size).toBeGreaterThanOrEqual(4);
  });

  it('stocks the shelf with products, pigments and lots, one of them expired and one low', async () => {
    const resins: { use: string }[] = await ds.query('SELECT use FROM resin_systems');
    expect(new Set(resins.map((r) => r.use))).toEqual(new Set(['deep_pour', 'coating', 'casting']));
    const lots: { expired: boolean; low: boolean }[] = await ds.query(
      'SELECT expires_on < CURRENT_DATE AS expired, remaining_g < quantity_g * 0.1 AS low FROM lots',
    );
    expect(lots.some((l) => l.expired)).toBe(true);
    expect(lots.some((l) => l.low)).toBe(true);
  });

  it('has a pour whose demold check is already due, and a piece cured enough to release', async () => {
    // Seeded pending; the browser tests' worker may have mailed it already, so sent counts too.
    const due: { kind: string; title: string }[] = await ds.query(
      `SELECT kind, title FROM reminders WHERE due_at <= now() AND (status = 'pending' OR (status = 'sent' AND sent_at > due_at))`,
    );
    expect(due.map((r) => r.kind)).toEqual(['demold_check']);
    expect(due[0]!.title).toContain('River table');
    const ready: { n: number }[] = await ds.query(`SELECT count(*)::int AS n FROM reminders WHERE kind = 'ready_to_machine' AND status = 'sent'`);
    expect(ready[0]!.n).toBe(1);
  });

  it('does nothing when run again', async () => {
    const before = await ds.getRepository(User).count();
    expect(await seedDemo(ds)).toBe(false);
    expect(await ds.getRepository(User).count()).toBe(before);
    expect(await ds.getRepository(Shop).count()).toBe(1);
  });
});
