import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { basename, dirname, join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { Worker, type WorkerOptions } from 'node:worker_threads';

// Built, this module lives inside dist/main.js (or a chunk beside it) and each thread's entry was
// bundled beside it as <name>.js: the thread then runs plain JavaScript, with no loader.
const built = !import.meta.url.endsWith('.ts');

// From source (tests, npm run dev), Node 20 does not apply `--import tsx` to a worker's own entry
// file, so the thread registers tsx's loader itself before importing the TypeScript entry
// (resolved from here, not from the cwd).
function tsxApiUrl(): string {
  const tsxPackage = createRequire(import.meta.url).resolve('tsx/package.json');
  const manifest = JSON.parse(readFileSync(tsxPackage, 'utf8')) as { exports: Record<string, { import: { default: string } }> };
  return pathToFileURL(join(dirname(tsxPackage), manifest.exports['./esm/api']!.import.default)).href;
}

/** A worker thread on a TypeScript entry given relative to its caller's source file. */
export function tsWorker(entry: URL, options: WorkerOptions = {}): Worker {
  if (built) return new Worker(new URL(`./${basename(entry.pathname).replace(/\.ts$/, '.js')}`, import.meta.url), options);
  const code = `import(${JSON.stringify(tsxApiUrl())}).then((m) => { m.register(); return import(${JSON.stringify(entry.href)}); })`;
  return new Worker(code, { ...options, eval: true });
}
