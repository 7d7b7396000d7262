#!/usr/bin/env -S -u NODE_EXTRA_CA_CERTS GLIBC_TUNABLES=glibc.malloc.hugetlb=1 node
// Runs the built command (npm run build writes apps/cli/dist); a checkout that has not been built
// yet falls back to the TypeScript sources through tsx's loader.
import { existsSync } from 'node:fs';

const built = new URL('../dist/main.js', import.meta.url);
let main;
if (existsSync(built)) {
  ({ main } = await import(built.href));
} else {
  const { register } = await import('tsx/esm/api');
  register();
  ({ main } = await import('../src/main.ts'));
}
process.exitCode = await main(process.argv.slice(2));
