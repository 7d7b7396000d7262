// Runs the API (serving the built web app), the worker and the mail sink as children, prefixes their
// output, prints where everything is once it answers, and stops them all on Ctrl-C or `npm stop`.
// Built (docker-free-scripts/dist/stack.js, as npm start runs it) it starts the built apps with plain
// node; from source (npm run dev, through tsx) it starts their sources through tsx.
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createInterface } from 'node:readline';
import { demoSignIns } from '@gelpoint/db';
import { allocatorSettings } from './allocator-settings';

const built = !import.meta.url.endsWith('.ts');
const root = fileURLToPath(new URL(built ? '../../' : '../', import.meta.url));
const dataDir = process.env.GELPOINT_DATA_DIR ?? join(root, '.data');
const pidFile = join(dataDir, 'stack.pid');
const apiUrl = process.env.GELPOINT_PUBLIC_URL ?? `http://127.0.0.1:${process.env.GELPOINT_API_PORT ?? 8080}`;
const mailUrl = `http://${process.env.MAILSINK_HOST ?? '127.0.0.1'}:${process.env.MAILSINK_HTTP_PORT ?? 8025}`;

const services = [
  { name: 'mail', app: 'mailsink', colour: 35 },
  { name: 'api', app: 'api', colour: 36 },
  { name: 'worker', app: 'worker', colour: 33 },
];

const children = new Map<string, ChildProcess>();
let stopping = false;

function pipe(name: string, colour: number, stream: NodeJS.ReadableStream | null) {
  if (!stream) return;
  const rl = createInterface({ input: stream });
  rl.on('line', (line) => process.stdout.write(`\x1b[${colour}m${name.padEnd(6)}\x1b[0m| ${line}\n`));
}

function start(s: (typeof services)[number]) {
  const args = built ? [`apps/${s.app}/dist/main.js`] : ['--import', 'tsx', `apps/${s.app}/src/main.ts`];
  const child = spawn(process.execPath, args, { cwd: root, env: { ...allocatorSettings, ...process.env }, stdio: ['ignore', 'pipe', 'pipe'] });
  pipe(s.name, s.colour, child.stdout);
  pipe(s.name, s.colour, child.stderr);
  child.on('exit', (code, signal) => {
    children.delete(s.name);
    if (!stopping) {
      process.stderr.write(`gelpoint: ${s.name} stopped unexpectedly (${signal ?? `exit ${code}`}); stopping the rest\n`);
      void stopAll(1);
    }
  });
  children.set(s.name, child);
}

async function stopAll(code: number) {
  if (stopping) return;
  stopping = true;
  for (const child of children.values()) child.kill('SIGTERM');
  const deadline = Date.now() + 10_000;
  while (children.size > 0 && Date.now() < deadline) await new Promise((r) => setTimeout(r, 100));
  for (const child of children.values()) child.kill('SIGKILL');
  rmSync(pidFile, { force: true });
  process.exit(code);
}

async function waitFor(url: string, timeoutMs: number): Promise<boolean> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline && !stopping) {
    try {
      const r = await fetch(url);
      if (r.ok) return true;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  return false;
}

mkdirSync(dataDir, { recursive: true });
writeFileSync(pidFile, String(process.pid));
process.on('SIGINT', () => void stopAll(0));
process.on('SIGTERM', () => void stopAll(0));
for (const s of services) start(s);

const ready = (await Promise.all([waitFor(`${apiUrl}/api/health`, 60_000), waitFor(`${mailUrl}/api/messages`, 60_000)])).every(Boolean);
if (!ready) {
  if (!stopping) process.stderr.write('gelpoint: the stack did not come up within a minute; see the lines above\n');
  await stopAll(1);
}
const width = Math.max(...demoSignIns.map((d) => d.email.length));
process.stdout.write(
  [
    '',
    '\x1b[1mGelpoint is running\x1b[0m',
    `  app          ${apiUrl}/`,
    `  API          ${apiUrl}/api  (OpenAPI: ${apiUrl}/api/openapi.json)`,
    `  mail sink    ${mailUrl}/  (JSON: ${mailUrl}/api/messages; SMTP on ${process.env.MAILSINK_SMTP_PORT ?? 2525})`,
    '  demo sign-ins (password for all three):',
    ...demoSignIns.map((d) => `    ${d.email.padEnd(width)}  ${d.role.padEnd(10)}  ${d.password}`),
    '  Ctrl-C stops the app; npm stop also stops PostgreSQL.',
    '',
  ].join('\n') + '\n',
);
