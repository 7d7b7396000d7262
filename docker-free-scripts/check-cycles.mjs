// npm run check:cycles (and a step of npm test): fails when a module imports itself back through
// others in any workspace's sources. A cycle makes load order decide what a module sees (an import
// that is still undefined), and it ties modules together that should change on their own.
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import madge from 'madge';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const sources = ['apps', 'packages'].flatMap((group) =>
  readdirSync(join(root, group), { withFileTypes: true })
    .filter((d) => d.isDirectory())
    .map((d) => join(group, d.name, 'src')),
);

const graph = await madge(
  sources.map((s) => join(root, s)),
  { baseDir: root, fileExtensions: ['ts', 'tsx'], tsConfig: join(root, 'tsconfig.base.json'), excludeRegExp: [/\.test\.tsx?$/] },
);
const cycles = graph.circular();
if (cycles.length) {
  console.error(`import cycles (${cycles.length}):`);
  for (const c of cycles) console.error(`  ${[...c, c[0]].join(' → ')}`);
  process.exit(1);
}
console.log(`no import cycles in ${Object.keys(graph.obj()).length} modules`);
