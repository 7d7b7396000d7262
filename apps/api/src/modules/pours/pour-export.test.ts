import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { bearer, createShop, useHarness } from '../../test-support/harness';
import { loggedPour } from '../../test-support/logged-pour';

const h = useHarness();

/** The CSV read back by csv-parse, an RFC 4180 parser independent of the writer, with numbers cast as it casts them. */
const readCsv = (text: string) => parse(text, { columns: true, cast: true, cast_date: false, record_delimiter: '\r\n' }) as Record<string, string | number>[];

describe('a pour as CSV', () => {
  it('writes every batch with its units in the column names, and the numbers read back equal the pour’s JSON', async () => {
    const w = await loggedPour(h, 'csvbatches');
    await h.ds.query(`UPDATE shops SET time_zone = 'America/Vancouver' WHERE id = $1`, [w.shop.shopId]);
    const res = await h.http().get(`/api/pours/${w.pourId}/batches.csv`).set(bearer(w.apprentice)).buffer(true).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toBe('attachment; filename="tray-csvbatches-batches.csv"');
    // RFC 4180 §2: CRLF between records.
    expect(res.text.split('\r\n')[0]).toBe(
      'cup,step,mixedAt,mixedBy,lotA,lotB,lotPigment,targetAG,targetBG,targetPigmentG,weighedAG,weighedBG,weighedPigmentG,offRatioPct,ambientTempC,surfaceTempC,rhPct,dewPointC,warnings,notes,voided,batchId',
    );
    const rows = readCsv(res.text);
    const pour = (await h.http().get(`/api/pours/${w.pourId}`).set(bearer(w.apprentice)).expect(200)).body;
    expect(rows).toHaveLength(pour.batches.length);
    expect(rows).toHaveLength(w.logged.length);
    for (const [i, batch] of (pour.batches as Record<string, unknown>[]).entries()) {
      const row = rows[i]!;
      expect(row.batchId).toBe(batch.id);
      expect(row.cup).toBe((batch.planBatchIndex as number) + 1);
      for (const key of [
        'targetAG',
        'targetBG',
        'targetPigmentG',
        'weighedAG',
        'weighedBG',
        'weighedPigmentG',
        'offRatioPct',
        'ambientTempC',
        'surfaceTempC',
        'rhPct',
        'dewPointC',
      ] as const) {
        expect(row[key], `${key} of cup ${i + 1}`).toBe(batch[key]);
      }
      // ISO 8601 with the shop's offset (Vancouver: −08:00 in winter, −07:00 in summer, IANA tz), the same instant as the JSON's.
      expect(row.mixedAt).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(\.\d{3})?-0[78]:00$/);
      expect(Date.parse(String(row.mixedAt))).toBe(Date.parse(batch.mixedAt as string));
      const localHour = new Intl.DateTimeFormat('en-GB', { timeZone: 'America/Vancouver', hour: '2-digit', hourCycle: 'h23' }).format(
        new Date(batch.mixedAt as string),
      );
      expect(String(row.mixedAt).slice(11, 13)).toBe(localHour);
      expect(row).toMatchObject({
        step: batch.step,
        mixedBy: (batch.mixedBy as { name: string }).name,
        lotA: 'csvbatches-A-1',
        lotB: 'csvbatches-B-1',
        lotPigment: 'csvbatches-P-1',
        voided: 'false',
      });
    }
    // The weighed grams are the ones logged, decimals and all.
    expect(rows.map((r) => r.weighedAG)).toEqual(w.logged.map((l) => l.weighedAG));
    expect(rows.map((r) => r.weighedPigmentG)).toEqual(w.logged.map((l) => l.weighedPigmentG));
    // A note that looks like a formula reaches a spreadsheet as text (OWASP CSV injection).
    expect(rows[0]!.notes).toBe("'=SUM(A1:A9) stirred 3 min");
  });

  it('writes every reading oldest first, tempC and takenAt as logged', async () => {
    const w = await loggedPour(h, 'csvreadings');
    const res = await h.http().get(`/api/pours/${w.pourId}/readings.csv`).set(bearer(w.shop.lead)).buffer(true).expect(200);
    expect(res.headers['content-disposition']).toBe('attachment; filename="tray-csvreadings-readings.csv"');
    expect(res.text.split('\r\n')[0]).toBe('takenAt,tempC,source,voided');
    const rows = readCsv(res.text);
    const pour = (await h.http().get(`/api/pours/${w.pourId}`).set(bearer(w.shop.lead)).expect(200)).body;
    const logged = (pour.readings as { at: string; tempC: number; source: string }[]).map((r) => ({ at: Date.parse(r.at), tempC: r.tempC, source: r.source }));
    expect(rows.map((r) => ({ at: Date.parse(String(r.takenAt)), tempC: r.tempC, source: r.source }))).toEqual(logged);
    expect(rows.map((r) => r.tempC)).toEqual(w.readings.map((r) => r.tempC));
    expect(rows.map((r) => Date.parse(String(r.takenAt)))).toEqual(w.readings.map((r) => Date.parse(r.at)));
  });

  it('answers a header alone for a pour with nothing logged, and 404 for another shop’s pour', async () => {
    const w = await loggedPour(h, 'csvempty');
    const other = await createShop(h, 'Other shop');
    await h.http().get(`/api/pours/${w.pourId}/batches.csv`).set(bearer(other.lead)).expect(404);
    await h.http().get(`/api/pours/${w.pourId}/readings.csv`).set(bearer(other.lead)).expect(404);
    const plan = (await h.http().get(`/api/pours/${w.pourId}`).set(bearer(w.shop.lead)).expect(200)).body.pourPlanId as string;
    const fresh = (await h.http().post('/api/pours').set(bearer(w.shop.lead)).send({ pourPlanId: plan }).expect(201)).body.id as string;
    const empty = await h.http().get(`/api/pours/${fresh}/readings.csv`).set(bearer(w.shop.lead)).buffer(true).expect(200);
    expect(parse(empty.text)).toEqual([['takenAt', 'tempC', 'source', 'voided']]);
  });
});
