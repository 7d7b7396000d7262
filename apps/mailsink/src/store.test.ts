import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { encodeLogLine } from './message-log';
import type { SinkMessage } from './sink-message';
import { MESSAGE_LOG_FILE, openMessageStore, type MessageStore } from './store';
import { getJson, sinkHarness } from './test-sink';

function sample(id: string, subject = `subject ${id}`): SinkMessage {
  return {
    id,
    receivedAt: '2024-03-05T06:07:08.000Z',
    messageId: `<${id}@gelpoint.test>`,
    date: '2024-03-05T06:07:08.000Z',
    from: 'reminders@gelpoint.test',
    to: ['maker@example.com'],
    cc: [],
    subject,
    text: 'line one\nline two',
    html: null,
    envelope: { mailFrom: 'reminders@gelpoint.test', rcptTo: ['maker@example.com'] },
    sizeBytes: 123,
  };
}

const folders: string[] = [];
const stores: MessageStore[] = [];
const harness = sinkHarness();
afterEach(async () => {
  await Promise.all(stores.splice(0).map((store) => store.close()));
  await harness.closeAll();
  await Promise.all(folders.splice(0).map((folder) => rm(folder, { recursive: true, force: true })));
});

async function folderWithLog(content: string): Promise<string> {
  const folder = await mkdtemp(join(tmpdir(), 'gelpoint-mailsink-store-'));
  folders.push(folder);
  await writeFile(join(folder, MESSAGE_LOG_FILE), content);
  return folder;
}

async function open(folder: string): Promise<MessageStore> {
  const store = await openMessageStore(folder);
  stores.push(store);
  return store;
}

describe('message log on disk', () => {
  it('writes one JSON line per message, with line breaks inside the text escaped', () => {
    const line = encodeLogLine(sample('a'));
    expect(line.endsWith('\n')).toBe(true);
    expect(line.slice(0, -1)).not.toContain('\n');
    // ECMA-262 JSON.parse is the reference decoder for what was written.
    expect(JSON.parse(line)).toEqual(sample('a'));
  });

  it('skips a truncated last line and repairs the file so the next append starts a fresh line', async () => {
    const whole = encodeLogLine(sample('a')) + encodeLogLine(sample('b'));
    const torn = encodeLogLine(sample('c')).slice(0, 40);
    const folder = await folderWithLog(whole + torn);

    const store = await open(folder);
    expect(store.list().map((m) => m.id)).toEqual(['b', 'a']);
    expect(store.skippedLines).toBe(1);
    expect(await readFile(join(folder, MESSAGE_LOG_FILE), 'utf8')).toBe(whole);

    await store.append(sample('d'));
    await store.close();
    stores.length = 0;
    const reopened = await open(folder);
    expect(reopened.list().map((m) => m.id)).toEqual(['d', 'b', 'a']);
    expect(reopened.skippedLines).toBe(0);
  });

  it('keeps a whole last message that only lacks its line break', async () => {
    const folder = await folderWithLog(encodeLogLine(sample('a')) + encodeLogLine(sample('b')).trimEnd());
    const store = await open(folder);
    await store.append(sample('c'));
    expect(store.list().map((m) => m.id)).toEqual(['c', 'b', 'a']);
    const lines = (await readFile(join(folder, MESSAGE_LOG_FILE), 'utf8')).split('\n');
    expect(lines.map((line) => (line ? (JSON.parse(line) as SinkMessage).id : ''))).toEqual(['a', 'b', 'c', '']);
  });

  it('leaves out lines that are not messages without giving up on the rest', async () => {
    const folder = await folderWithLog(`${encodeLogLine(sample('a'))}not json at all\n{"id":42}\n\n${encodeLogLine(sample('b'))}`);
    const store = await open(folder);
    expect(store.list().map((m) => m.id)).toEqual(['b', 'a']);
    expect(store.skippedLines).toBe(2);
  });

  it('starts empty in a folder that does not exist yet, creating it', async () => {
    const parent = await folderWithLog('');
    const store = await open(join(parent, 'nested', 'mailsink'));
    expect(store.list()).toEqual([]);
    await store.append(sample('a'));
    expect(await readFile(join(parent, 'nested', 'mailsink', MESSAGE_LOG_FILE), 'utf8')).toBe(encodeLogLine(sample('a')));
  });

  it('has every appended message on disk by the time append resolves, in order', async () => {
    const folder = await folderWithLog('');
    const store = await open(folder);
    await Promise.all(['a', 'b', 'c', 'd'].map((id) => store.append(sample(id))));
    const onDisk = (await readFile(join(folder, MESSAGE_LOG_FILE), 'utf8')).trimEnd().split('\n');
    expect(onDisk.map((line) => (JSON.parse(line) as SinkMessage).id)).toEqual(['a', 'b', 'c', 'd']);
    await store.clear();
    expect(await readFile(join(folder, MESSAGE_LOG_FILE), 'utf8')).toBe('');
    expect(store.list()).toEqual([]);
  });

  it('keeps one copy of a Message-ID sent twice, as a provider honouring an idempotency key does', async () => {
    const folder = await folderWithLog('');
    const store = await openMessageStore(folder);
    stores.push(store);
    expect(await store.append(sample('first'))).toBe(true);
    expect(await store.append({ ...sample('again'), messageId: '<first@gelpoint.test>' })).toBe(false);
    expect(await store.append({ ...sample('no-id'), messageId: null })).toBe(true);
    expect(await store.append({ ...sample('no-id-2'), messageId: null })).toBe(true);
    expect(store.list().map((m) => m.id)).toEqual(['no-id-2', 'no-id', 'first']);
    const lines = (await readFile(join(folder, MESSAGE_LOG_FILE), 'utf8')).trim().split('\n');
    expect(lines).toHaveLength(3);
  });

  it('serves a sink started on a log with a torn tail', async () => {
    const folder = await folderWithLog(encodeLogLine(sample('a', 'survivor')) + '{"id":"half');
    const { baseUrl } = await harness.start(folder);
    const { body } = await getJson(`${baseUrl}/api/messages`);
    expect((body as SinkMessage[]).map((m) => m.subject)).toEqual(['survivor']);
  });
});
