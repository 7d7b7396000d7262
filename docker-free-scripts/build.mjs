// npm run build: every Node entry point bundled by esbuild into its workspace's dist/, and the web app
// built by Vite into apps/web/dist. Plain JavaScript, so it runs before anything is built.
//
// A target is rebuilt only when it is stale: each build records a hash of the files that went into
// it (esbuild's metafile lists them; for the web app, its folders) and the names of its outputs.
// The next run hashes the same files again and skips the target when nothing changed and every
// output is still there. `--force` rebuilds everything; target names pick some (`node build.mjs cli`).
import { createHash } from 'node:crypto';
import { createRequire } from 'node:module';
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import * as esbuild from 'esbuild';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const stampDir = join(root, 'node_modules/.cache/gelpoint-build');
const args = process.argv.slice(2);
const force = args.includes('--force');
const picked = args.filter((a) => !a.startsWith('--'));

// Inputs that change every target's output without appearing in its module graph.
const sharedInputs = ['package-lock.json', 'tsconfig.base.json', 'docker-free-scripts/build.mjs'];

/**
 * Server entry points. Workspace packages (@gelpoint/*) are compiled into each bundle from source;
 * registry packages stay external and load from node_modules as they do under tsx. A worker thread's
 * entry is bundled beside main.js under its own file name: ts-worker.ts finds it there.
 * The CLI bundles its registry packages too, so tree-shaking keeps only the parts of mathjs it calls
 * and a command loads one file instead of hundreds.
 */
const nodeTargets = [
  { name: 'api', dir: 'apps/api', entries: { main: 'src/main.ts', 'stl-check.thread': 'src/modules/molds/stl-check.thread.ts' } },
  { name: 'worker', dir: 'apps/worker', entries: { main: 'src/main.ts', 'mold-analysis.thread': 'src/molds/mold-analysis.thread.ts' } },
  { name: 'mailsink', dir: 'apps/mailsink', entries: { main: 'src/main.ts' } },
  { name: 'db', dir: 'packages/db', entries: { 'cli/migrate': 'src/cli/migrate.ts', 'cli/seed': 'src/cli/seed.ts' } },
  {
    name: 'cli',
    dir: 'apps/cli',
    entries: { main: 'src/main.ts' },
    bundleRegistryPackages: true,
    // Loaded when first used instead of with the command: the polygon library (235 kB) only works out
    // the outline of a mould with overhangs, yet parsing it cost every `gelpoint mold` about 10 ms.
    onFirstUse: [{ module: 'packages/mesh/src/polygon-library.ts', exportName: 'polygonLibrary', library: 'clipper2-ts' }],
  },
  { name: 'stack', dir: 'docker-free-scripts', entries: { stack: 'stack.ts' } },
];

// Everything the web build reads; its own dist, tests and benchmarks are left out.
const webInputs = {
  dirs: ['apps/web/src', 'apps/web/public', 'packages/core/src', 'packages/contracts/src', 'packages/mesh/src', 'packages/thermal/src'],
  files: [
    'apps/web/index.html',
    'apps/web/vite.config.ts',
    'apps/web/installable.ts',
    'apps/web/package.json',
    'apps/web/tsconfig.json',
    'packages/core/package.json',
    'packages/contracts/package.json',
    'packages/mesh/package.json',
    'packages/thermal/package.json',
  ],
  skip: /\.test\.tsx?$/,
};

function hashFiles(files) {
  const h = createHash('sha256');
  for (const f of [...files].sort()) {
    h.update(f).update('\0');
    h.update(existsSync(join(root, f)) ? readFileSync(join(root, f)) : 'missing').update('\0');
  }
  return h.digest('hex');
}

function listDir(dir, skip) {
  const out = [];
  const walk = (rel) => {
    for (const entry of readdirSync(join(root, rel), { withFileTypes: true })) {
      const path = `${rel}/${entry.name}`;
      if (entry.isDirectory()) walk(path);
      else if (!skip.test(entry.name)) out.push(path);
    }
  };
  if (existsSync(join(root, dir))) walk(dir);
  return out;
}

function readStamp(name) {
  try {
    return JSON.parse(readFileSync(join(stampDir, `${name}.json`), 'utf8'));
  } catch {
    return undefined;
  }
}

function writeStamp(name, stamp) {
  mkdirSync(stampDir, { recursive: true });
  writeFileSync(join(stampDir, `${name}.json`), JSON.stringify(stamp));
}

/** Fresh when the recorded inputs hash the same and every recorded output still exists. */
function isFresh(name) {
  const stamp = readStamp(name);
  if (!stamp || force) return false;
  if (!stamp.outputs.every((o) => existsSync(join(root, o)))) return false;
  return hashFiles(stamp.inputs) === stamp.hash;
}

/**
 * For each `onFirstUse` entry: the library bundled on its own as CommonJS beside the target's
 * output, and the module that hands it out replaced by one that requires that file the first time
 * it is called (a synchronous load, which an ES module's import cannot be).
 */
function onFirstUse(target, outdir) {
  const entries = target.onFirstUse ?? [];
  const file = (entry) => `${entry.library.replace(/[^a-z0-9]+/gi, '-')}.cjs`;
  // A regular expression matching `text` itself, at the end of a path.
  const endingIn = (text) => new RegExp(`${text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}$`);
  const plugin = {
    name: 'load-on-first-use',
    setup(build) {
      for (const entry of entries) {
        const path = join(root, entry.module);
        build.onLoad({ filter: endingIn(entry.module) }, (args) =>
          args.path === path
            ? {
                contents: `let loaded;\nexport function ${entry.exportName}() {\n  return (loaded ??= require('./${file(entry)}'));\n}\n`,
                loader: 'js',
              }
            : undefined,
        );
        build.onResolve({ filter: endingIn(`./${file(entry)}`) }, (args) =>
          args.path === `./${file(entry)}` ? { path: args.path, external: true } : undefined,
        );
      }
    },
  };
  const libraries = () =>
    Promise.all(
      entries.map((entry) =>
        esbuild.build({
          absWorkingDir: root,
          stdin: { contents: `module.exports = require('${entry.library}');`, resolveDir: join(root, dirname(entry.module)) },
          outfile: join(outdir, file(entry)),
          bundle: true,
          format: 'cjs',
          platform: 'node',
          target: 'node20',
          metafile: true,
          logLevel: 'warning',
        }),
      ),
    );
  return { plugins: entries.length > 0 ? [plugin] : [], libraries };
}

const workspaceOnly = {
  name: 'registry-packages-external',
  setup(build) {
    build.onResolve({ filter: /^[^./]/ }, (args) => {
      if (args.path.startsWith('@gelpoint/') || args.path.startsWith('node:')) return undefined;
      return { path: args.path, external: true };
    });
  },
};

async function buildNode(target) {
  const outdir = join(root, target.dir, 'dist');
  rmSync(outdir, { recursive: true, force: true });
  const firstUse = onFirstUse(target, outdir);
  const result = await esbuild.build({
    absWorkingDir: root,
    entryPoints: Object.fromEntries(Object.entries(target.entries).map(([out, src]) => [out, join(target.dir, src)])),
    outdir,
    bundle: true,
    splitting: true,
    format: 'esm',
    platform: 'node',
    target: 'node20',
    sourcemap: true,
    metafile: true,
    logLevel: 'warning',
    plugins: [...(target.bundleRegistryPackages ? [] : [workspaceOnly]), ...firstUse.plugins],
    // Bundled CommonJS modules may require Node's own modules; an ES module has no `require` of its own.
    banner: target.bundleRegistryPackages
      ? { js: "import { createRequire as __gpRequire } from 'node:module'; const require = __gpRequire(import.meta.url);" }
      : {},
  });
  const separate = await firstUse.libraries();
  const sources = [result, ...separate].flatMap((r) => Object.keys(r.metafile.inputs)).filter((f) => !f.startsWith('node_modules/') && !f.startsWith('<'));
  // A workspace's package.json (sideEffects, exports) and tsconfig.json (decorators) shape its code too.
  const workspaces = [...new Set(sources.map((f) => /^(apps|packages)\/[^/]+/.exec(f)?.[0] ?? target.dir))];
  const settings = workspaces.flatMap((w) => [`${w}/package.json`, `${w}/tsconfig.json`]).filter((f) => existsSync(join(root, f)));
  const inputs = [...new Set([...sources, ...settings, ...sharedInputs])];
  const outputs = [result, ...separate].flatMap((r) => Object.keys(r.metafile.outputs));
  writeStamp(target.name, { hash: hashFiles(inputs), inputs, outputs });
}

/**
 * The web app's own Vite, the version its package.json pins: the repository's root holds another one, which the test
 * runner brought, and a different Vite splits the app into different chunks.
 */
const webVite = join(dirname(createRequire(join(root, 'apps/web/package.json')).resolve('vite/package.json')), 'bin/vite.js');

function buildWeb() {
  const r = spawnSync(process.execPath, [webVite, 'build', '--logLevel', 'warn'], {
    cwd: join(root, 'apps/web'),
    // Always the production build: a test runner calls this with NODE_ENV=test, which would bundle React's development
    // build (twice the size) and leave it behind as the app that `npm start` serves.
    env: { ...process.env, NODE_ENV: 'production' },
    stdio: 'inherit',
  });
  if (r.status !== 0) throw new Error('the web build failed (see above)');
  const inputs = [...webInputs.dirs.flatMap((d) => listDir(d, webInputs.skip)), ...webInputs.files, ...sharedInputs];
  writeStamp('web', { hash: hashFiles(inputs), inputs, outputs: ['apps/web/dist/index.html'] });
}

const targets = [...nodeTargets.map((t) => ({ name: t.name, run: () => buildNode(t) })), { name: 'web', run: buildWeb }];
const unknown = picked.filter((p) => !targets.some((t) => t.name === p));
if (unknown.length) {
  console.error(`build: unknown target ${unknown.join(', ')} (targets: ${targets.map((t) => t.name).join(', ')})`);
  process.exit(2);
}

const built = [];
for (const t of targets) {
  if (picked.length && !picked.includes(t.name)) continue;
  if (isFresh(t.name)) continue;
  const started = Date.now();
  try {
    await t.run();
  } catch (err) {
    console.error(`build: ${t.name} failed: ${err instanceof Error ? err.message : String(err)}`);
    process.exit(1);
  }
  built.push(`${t.name} (${((Date.now() - started) / 1000).toFixed(1)} s)`);
}
console.log(built.length ? `built ${built.join(', ')}` : 'build: everything is up to date');
