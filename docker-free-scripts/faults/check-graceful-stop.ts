import { request } from 'node:http';
import type pg from 'pg';
import { binaryStl, pocketMouldTriangles } from '../../apps/api/src/test-support/pocket-mould';
import { signIn } from './api-client';
import { makeDueReminders, outboxOf } from './database';
import { mustBeMailedOnce, waitForAllSent } from './delivery';
import { sleep, within } from './processes';
import type { FaultStack } from './stack';
import { must } from './verdict';

interface SlowUpload {
  /** Resolves once the headers and the first half of the body are on the wire. */
  halfSent: Promise<void>;
  /** Sends the rest of the body in small pieces over about a second. */
  sendRest(): Promise<void>;
  /** The API's answer, or a rejection when the connection was cut. */
  answer: Promise<{ status: number; body: string }>;
}

/** A mould upload (multipart, as the web app sends it) whose body arrives slowly, on a connection of its own. */
function slowUpload(port: number, token: string, name: string, stl: Buffer): SlowUpload {
  const boundary = `----gelpoint-${name.replace(/\W/g, '')}`;
  const body = Buffer.concat([
    Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="name"\r\n\r\n${name}\r\n`),
    Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="pocket.stl"\r\nContent-Type: application/octet-stream\r\n\r\n`),
    stl,
    Buffer.from(`\r\n--${boundary}--\r\n`),
  ]);
  const half = Math.floor(body.length / 2);
  const req = request({
    host: '127.0.0.1',
    port,
    method: 'POST',
    path: '/api/molds',
    agent: false,
    headers: { Authorization: `Bearer ${token}`, 'Content-Type': `multipart/form-data; boundary=${boundary}`, 'Content-Length': body.length },
  });
  const answer = new Promise<{ status: number; body: string }>((resolve, reject) => {
    req.on('response', (res) => {
      let text = '';
      res.setEncoding('utf8');
      res.on('data', (c: string) => (text += c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body: text }));
      res.on('error', reject);
    });
    req.on('error', reject);
  });
  answer.catch(() => undefined);
  const halfSent = new Promise<void>((resolve) => req.write(body.subarray(0, half), () => resolve()));
  const sendRest = async () => {
    const pieces = 10;
    const step = Math.ceil((body.length - half) / pieces);
    for (let at = half; at < body.length; at += step) {
      req.write(body.subarray(at, Math.min(body.length, at + step)));
      await sleep(100);
    }
    req.end();
  };
  return { halfSent, sendRest, answer };
}

const GRACE_S = 6;

/**
 * SIGTERM while two uploads are half sent: the API closes its door at once, lets the upload that keeps
 * coming finish and stores it whole, cuts the one that stalls at the deadline without a trace of it,
 * then exits 0 with its pool closed.
 */
export async function apiDrainsOnSigterm(stack: FaultStack, pool: pg.Pool): Promise<string> {
  const api = await stack.startApi({ GELPOINT_SHUTDOWN_GRACE_S: String(GRACE_S) });
  const { token } = await signIn(stack.baseUrl, 'maker@gelpoint.test');
  must(token, 'the demo maker should be able to sign in');
  const stl = binaryStl(pocketMouldTriangles({ outer: [120, 90, 30], pocket: [20, 20, 100, 70], floorZ: 8 }));
  const tag = `drain-${Date.now()}`;
  const finishing = slowUpload(stack.apiPort, token, `${tag} finished`, stl);
  const stalled = slowUpload(stack.apiPort, token, `${tag} stalled`, stl);
  await Promise.all([finishing.halfSent, stalled.halfSent]);
  await sleep(200);

  const stoppedAt = Date.now();
  api.send('SIGTERM');
  await sleep(500);
  must(api.running, 'the API should still be draining half a second after SIGTERM, with two uploads under way');
  const refused = await fetch(`${stack.baseUrl}/api/health`).then(
    () => false,
    () => true,
  );
  must(refused, 'a new connection during the drain should be refused');

  await finishing.sendRest();
  const answer = await within('the answer to the upload that finished during the drain', 10_000, finishing.answer);
  must(answer.status === 202, `the upload that finished during the drain should be accepted (202); got ${answer.status} ${answer.body.slice(0, 200)}`);
  const moldId = (JSON.parse(answer.body) as { id: string }).id;

  const code = await within('the API exiting after its drain deadline', (GRACE_S + 10) * 1000, api.exited());
  const tookS = (Date.now() - stoppedAt) / 1000;
  must(code === 0, `the API should exit 0 after draining; it exited ${code}`);
  must(tookS >= GRACE_S - 0.5, `the API should wait for the stalled upload until its ${GRACE_S} s deadline; it exited after ${tookS.toFixed(1)} s`);
  const stalledOutcome = await stalled.answer.then(
    (a) => `answered ${a.status}`,
    () => 'cut',
  );
  must(stalledOutcome === 'cut', `the upload that never finished should be cut at the deadline; it was ${stalledOutcome}`);

  const stored = (
    await pool.query<{ name: string; bytes: number }>(
      `SELECT m.name, octet_length(f.bytes) AS bytes FROM molds m LEFT JOIN mold_files f ON f.mold_id = m.id WHERE m.name LIKE $1`,
      [`${tag}%`],
    )
  ).rows;
  must(stored.length === 1 && stored[0]!.name === `${tag} finished`, `only the finished upload should be stored; the database holds ${JSON.stringify(stored)}`);
  must(stored[0]!.bytes === stl.length, `the stored STL should be whole (${stl.length} bytes); it has ${stored[0]!.bytes}`);
  const row = (await pool.query<{ id: string }>(`SELECT id FROM molds WHERE id = $1`, [moldId])).rows;
  must(row.length === 1, 'the accepted upload should be the stored one');
  return `drained in ${tookS.toFixed(1)} s: the upload that kept coming was stored whole (${stl.length} bytes), the stalled one was cut at ${GRACE_S} s and left nothing`;
}

const POURS = 12;
const PAUSE_AFTER_SENT = 5;

/**
 * SIGTERM while a mail send hangs on a paused mail sink: the worker waits for that send, records it,
 * hands back the rest it had claimed and exits 0; the next worker sends the rest at once (no lease to
 * wait out), and every mail goes through exactly one SMTP delivery.
 */
export async function workerStopsCleanly(stack: FaultStack, pool: pg.Pool): Promise<string> {
  await stack.startSink();
  const sink = stack.sink!;
  const due = await makeDueReminders(pool, POURS, 'graceful stop');
  const expected = due.reminderIds.length * due.recipients.length;

  let sent = 0;
  let markPaused: () => void = () => undefined;
  const paused = new Promise<void>((resolve) => (markPaused = resolve));
  const first = await stack.startWorker({ cron: '*/2 * * * * *' }, (line) => {
    if (line.includes('"mail sent"') && ++sent === PAUSE_AFTER_SENT) {
      sink.send('SIGSTOP');
      markPaused();
    }
  });
  await within('the worker sending its first mails', 30_000, paused);
  // The next send connects and waits for the paused sink's greeting.
  await sleep(700);
  first.send('SIGTERM');
  await sleep(1_500);
  must(first.running, 'the worker should wait for the send under way instead of exiting without recording it');
  sink.send('SIGCONT');
  const code = await within('the worker exiting after SIGTERM', 20_000, first.exited());
  must(code === 0, `the worker should exit 0 once the send under way is recorded; it exited ${code}`);

  const atStop = await outboxOf(pool, due.reminderIds);
  const sentAtStop = atStop.filter((r) => r.status === 'sent').length;
  const held = atStop.filter((r) => r.status === 'sending').length;
  must(held === 0, `a stopped worker should hold nothing; ${held} mails are still marked sending`);
  must(
    sentAtStop > PAUSE_AFTER_SENT && sentAtStop < expected,
    `the send under way should have been finished and the rest handed back; ${sentAtStop} of ${expected} were sent at the stop`,
  );

  // The default two-minute lease: only mail handed back can go out within the wait below.
  await stack.startWorker({ cron: '*/2 * * * * *' });
  await waitForAllSent(pool, due, 40_000);
  const tally = await mustBeMailedOnce(stack, pool, due);
  const rows = await outboxOf(pool, due.reminderIds);
  const twice = rows.filter((r) => r.attempts !== 1);
  must(twice.length === 0, `every mail should have gone through one SMTP delivery; ${twice.length} were tried more than once`);
  return `${tally.mails} mails: stopped with ${sentAtStop} sent (the paused send finished), the rest handed back and sent by the next worker at once, each delivered once`;
}
