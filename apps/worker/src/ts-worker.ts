import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { Worker, type WorkerOptions } from 'node:worker_threads';

// Node 20 does not apply `--import tsx` to a worker's own entry file, so the thread registers tsx's
// loader itself before importing the TypeScript entry (resolved from here, not from the cwd).
const tsxPackage = createRequire(import.meta.url).resolve('tsx/package.json');
const tsxApi = pathToFileURL(join(dirname(tsxPackage), (JSON.parse(readFileSync(tsxPackage, 'utf8')) as { exports: Record<string, { import: { default: string } }> }).exports['./esm/api']!.import.default)).href;

export function tsWorker(entry: URL, options: WorkerOptions = {}): Worker {
  const code = `import(${JSON.stringify(tsxApi)}).then((m) => { m.register(); return import(${JSON.stringify(entry.href)}); })`;
  return new Worker(code, { ...options, eval: true });
}
