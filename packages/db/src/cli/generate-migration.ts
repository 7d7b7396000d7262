// Writes a migration for the difference between the entities and the database, like TypeORM's
// migration:generate, without needing ts-node: the schema builder's own up and down queries.
import { writeFileSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { createDataSource } from '../data-source';

const name = process.argv[2];
if (!name || !/^[A-Za-z][A-Za-z0-9]*$/.test(name)) {
  console.error('usage: npm run db:generate -- CamelCaseName');
  process.exit(2);
}
const ds = createDataSource({ applicationName: 'gelpoint-generate' });
await ds.initialize();
await ds.runMigrations();
const sql = await ds.driver.createSchemaBuilder().log();
await ds.destroy();
if (sql.upQueries.length === 0) {
  console.log('no changes: the database already matches the entities');
  process.exit(0);
}
const stamp = Date.now();
const cls = `${name}${stamp}`;
const q = (s: string) => '`' + s.replace(/\\/g, '\\\\').replace(/`/g, '\\`').replace(/\$\{/g, '\\${') + '`';
const up = sql.upQueries.map((x) => `    await queryRunner.query(${q(x.query)});`).join('\n');
const down = [...sql.downQueries]
  .reverse()
  .map((x) => `    await queryRunner.query(${q(x.query)});`)
  .join('\n');
const file = `${stamp}-${name.charAt(0).toLowerCase()}${name.slice(1)}`;
const dir = fileURLToPath(new URL('../migrations/', import.meta.url));
writeFileSync(
  `${dir}${file}.ts`,
  `import type { MigrationInterface, QueryRunner } from 'typeorm';

export class ${cls} implements MigrationInterface {
  name = '${cls}';

  async up(queryRunner: QueryRunner): Promise<void> {
${up}
  }

  async down(queryRunner: QueryRunner): Promise<void> {
${down}
  }
}
`,
);
const indexPath = `${dir}index.ts`;
const index = readFileSync(indexPath, 'utf8')
  .replace(/^(\/\/.*\n)/, `$1import { ${cls} } from './${file}';\n`)
  // The list may span lines (the formatter wraps it): read it whole, write it one class per line.
  .replace(/export const migrations: Function\[\] = \[([^\]]*)\];/, (_m, list: string) => {
    const items = list
      .split(',')
      .map((s) => s.trim())
      .filter(Boolean);
    return `export const migrations: Function[] = [\n${[...items, cls].map((c) => `  ${c},`).join('\n')}\n];`;
  });
writeFileSync(indexPath, index);
console.log(`wrote packages/db/src/migrations/${file}.ts`);
