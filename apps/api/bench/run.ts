// npm run bench:load (through docker-free-scripts/bench-load.sh, which makes the fresh database):
// two API instances and two workers on one database, the main reads and writes under autocannon,
// and the checks that nothing one instance needs is kept in another's memory.
import { randomBytes } from 'node:crypto';
import { cpus, loadavg } from 'node:os';
import { must } from './api-client';
import { BenchStack } from './bench-stack';
import { prepareBoard, prepareWritePours, signIn, type Tokens } from './bench-scenario';
import { pourLog, rateLimitAcrossInstances, remindersOnce, sameAnswerOnBoth, sessionsAcrossInstances, type Finding } from './cross-instance';
import { CONNECTIONS, measure, table, type LoadRow, type LoadTarget } from './load-run';

const BOARD_POURS = 12;
const WRITE_POURS = 40;
const READ_S = 6;
const WRITE_S = 6;
const AUTH_RATE = 10;
const READ_P99_TARGET_MS = 100;

const say = (s: string) => process.stdout.write(`bench: ${s}\n`);

async function main(): Promise<number> {
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error('DATABASE_URL is not set: run npm run bench:load, which makes the gelpoint_bench database');
  const started = Date.now();
  const loadBefore = loadavg()[0]!;
  const stack = new BenchStack({ databaseUrl, jwtSecret: randomBytes(48).toString('base64url'), authRatePer15Min: AUTH_RATE });
  try {
    await stack.start();
    const apis = stack.apiUrls;
    say(`two API instances (${apis.join(', ')}), two workers and the mail sink are up after ${((Date.now() - started) / 1000).toFixed(1)} s`);

    // One sign-in per role (sign-in is rate limited per account); each token is then used on both instances.
    const tokens: Tokens = {
      lead: await signIn(apis[0]!, 'lead@gelpoint.test'),
      maker: await signIn(apis[1]!, 'maker@gelpoint.test'),
      apprentice: await signIn(apis[0]!, 'apprentice@gelpoint.test'),
    };
    const board = await prepareBoard(apis, tokens, BOARD_POURS);
    const onBoard = (await must<{ total: number }>(200, apis[1]!, 'GET', '/pours', { token: tokens.lead })).total;
    say(`shop prepared: a tray mould analysed by a worker, ${onBoard} open pours on the cure board (${BOARD_POURS} with six hours of readings)`);

    const findings: Finding[] = [...(await sessionsAcrossInstances(apis)), ...(await rateLimitAcrossInstances(apis, AUTH_RATE))];
    const midLevel = (board.floorMm + board.topMm) / 2;
    findings.push(await sameAnswerOnBoth(apis, tokens.maker, `/molds/${board.moldId}/fill?level=${midLevel}&from=mould`));

    const depth = board.topMm - board.floorMm;
    const reads = [
      { endpoint: 'GET /api/pours (cure board)', token: tokens.lead, path: '/api/pours' },
      {
        endpoint: 'GET /api/pour-plans/:id',
        token: tokens.maker,
        path: '',
        next: (i: number) => ({ path: `/api/pour-plans/${board.planIds[i % board.planIds.length]}` }),
      },
      { endpoint: 'GET /api/molds/:id (cavity report)', token: tokens.maker, path: `/api/molds/${board.moldId}` },
      {
        endpoint: 'GET /api/molds/:id/fill',
        token: tokens.maker,
        path: '',
        next: (i: number) => ({ path: `/api/molds/${board.moldId}/fill?level=${(board.floorMm + ((i * 7) % 100) * (depth / 100)).toFixed(2)}&from=mould` }),
      },
    ];
    say('warming up (2 s, not counted)…');
    const target: LoadTarget = { apiUrls: apis, apiPids: stack.apiPids, databaseUrl };
    for (const r of reads) await measure(target, { ...r, kind: 'read', method: 'GET', durationS: 0.5 });

    const rows: LoadRow[] = [];
    for (const r of reads) {
      say(`${r.endpoint}: ${CONNECTIONS} connections for ${READ_S} s…`);
      rows.push(await measure(target, { ...r, kind: 'read', method: 'GET', durationS: READ_S }));
    }

    const writes = await prepareWritePours(apis, tokens, board.resinSystemId, WRITE_POURS);
    // Each cup of each run sheet is logged once: request k logs cup ⌊k / pours⌋ of pour k mod pours.
    const cups = writes.runSheet.length * writes.pourIds.length;
    const batchAmount = cups - 2 * CONNECTIONS;
    say(
      `POST batches: ${CONNECTIONS} connections, up to ${batchAmount} distinct cups (${writes.pourIds.length} pours × ${writes.runSheet.length}) or ${WRITE_S} s…`,
    );
    rows.push(
      await measure(target, {
        endpoint: 'POST /api/pours/:id/batches',
        kind: 'write',
        token: tokens.apprentice,
        method: 'POST',
        path: '',
        durationS: WRITE_S,
        amount: batchAmount,
        next: (k) => {
          const cup = writes.runSheet[Math.floor(k / writes.pourIds.length)]!;
          return {
            path: `/api/pours/${writes.pourIds[k % writes.pourIds.length]}/batches`,
            body: {
              planBatchIndex: cup.index,
              weighedAG: Math.round(cup.partAG),
              weighedBG: Math.round(cup.partBG),
              lotANumber: 'BD25-A-0412',
              lotBNumber: 'BD25-B-0412',
              ambientTempC: 21,
              surfaceTempC: 20,
              rhPct: 45,
            },
          };
        },
      }),
    );
    // Readings at increasing times per pour, 30 s apart, ending about now.
    const readingAmount = 6000;
    const perPour = Math.ceil(readingAmount / writes.pourIds.length);
    const firstAt = Date.now() - perPour * 30_000;
    say(`POST readings: ${CONNECTIONS} connections, up to ${readingAmount} readings or ${WRITE_S} s…`);
    rows.push(
      await measure(target, {
        endpoint: 'POST /api/pours/:id/readings',
        kind: 'write',
        token: tokens.apprentice,
        method: 'POST',
        path: '',
        durationS: WRITE_S,
        amount: readingAmount,
        next: (k) => {
          const n = Math.floor(k / writes.pourIds.length);
          return {
            path: `/api/pours/${writes.pourIds[k % writes.pourIds.length]}/readings`,
            body: { readings: [{ at: new Date(firstAt + n * 30_000).toISOString(), tempC: 20 + (n % 20) / 10 }] },
          };
        },
      }),
    );
    findings.push(await sameAnswerOnBoth(apis, tokens.lead, `/pours/${writes.pourIds[0]}`, pourLog));
    findings.push(...(await remindersOnce(stack, apis[1]!, tokens.maker, board.reminderPourId, 20_000)));

    process.stdout.write(`\n${table(rows)}\n\n`);
    const readRows = rows.filter((r) => r.kind === 'read');
    const worstRead = Math.max(...readRows.map((r) => r.p99Ms));
    const failures = rows.reduce((n, r) => n + r.errors + r.non2xx, 0);
    process.stdout.write(
      `${cpus().length} CPU(s), load average ${loadBefore.toFixed(1)} when the bench began and ${loadavg()[0]!.toFixed(1)} at its end; ${CONNECTIONS} connections per endpoint split over 2 API instances; autocannon, PostgreSQL and both workers on the same machine.\n` +
        `reads: worst p99 ${worstRead.toFixed(0)} ms (target under ${READ_P99_TARGET_MS} ms: ${worstRead < READ_P99_TARGET_MS ? 'met' : 'missed'}); errors and non-2xx over all runs: ${failures}\n\n`,
    );
    for (const f of findings) process.stdout.write(`${f.ok ? 'yes' : 'NO '}  ${f.what} — ${f.detail}\n`);
    say(`done in ${((Date.now() - started) / 1000).toFixed(0)} s`);
    return findings.every((f) => f.ok) && failures === 0 ? 0 : 1;
  } finally {
    await stack.stop();
  }
}

main().then(
  (code) => process.exit(code),
  (err: unknown) => {
    process.stderr.write(`bench: ${err instanceof Error ? err.message : String(err)}\n`);
    process.exit(1);
  },
);
