import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';
import { boundaries } from './tools/eslint/boundaries.mjs';

// The pure packages run in the browser and the server alike: no framework, no database, no I/O.
const pureFrameworkBan = {
  paths: ['react', 'react-dom', 'react-router', 'express', 'typeorm', 'pg', 'three', 'nodemailer', 'node-cron', 'jsonwebtoken', '@gelpoint/db'].map((name) => ({
    name,
    message: 'core, mesh, thermal and contracts import no framework and do no I/O; keep this in an app or in packages/db.',
  })),
  patterns: [
    {
      group: ['node:*', 'fs', 'fs/*', 'path', 'http', 'https', 'net', 'child_process', 'worker_threads'],
      message: 'a pure package does no I/O; take the bytes or values as arguments.',
    },
    {
      group: ['@tanstack/*', '@react-three/*', 'three-stdlib', '@gelpoint/api', '@gelpoint/web', '@gelpoint/worker'],
      message: 'a pure package imports no framework or app.',
    },
  ],
};

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', '**/.data/**', '**/coverage/**', '**/*.d.ts', '**/.tsbuild/**', 'apps/web/dev-dist/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { ecmaVersion: 2023, sourceType: 'module', globals: { ...globals.node } },
    plugins: { gelpoint: boundaries },
    rules: {
      'gelpoint/layout': 'error',
      // A handler set up before the value it calls exists (an event hub, a router made after its client).
      'prefer-const': ['error', { ignoreReadBeforeAssign: true }],
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' },
      ],
    },
  },
  {
    files: ['apps/web/**/*.{ts,tsx}'],
    ignores: ['apps/web/e2e/**', 'apps/web/scripts/**', 'apps/web/*.ts'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    // The rules of hooks and their dependency lists. The React Compiler's own checks (purity, refs, set-state in
    // effects...) are for code the compiler rewrites; the app does not use it.
    rules: { 'react-hooks/rules-of-hooks': 'error', 'react-hooks/exhaustive-deps': 'error' },
  },
  {
    files: ['packages/{core,mesh,thermal,contracts}/src/**/*.ts'],
    ignores: ['**/*.test.ts', '**/*.bench.ts'],
    rules: { 'no-restricted-imports': ['error', pureFrameworkBan] },
  },
  {
    // The migration list's type is what TypeORM's DataSource takes, and the migration generator rewrites this line.
    files: ['packages/db/src/migrations/index.ts'],
    rules: { '@typescript-eslint/no-unsafe-function-type': 'off' },
  },
  prettier,
);
