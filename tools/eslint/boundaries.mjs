// Import boundaries of the layout (DEVELOPERS.md, Layout): apps import packages and never another app; a web feature
// never imports another feature (shared pieces live in src/components, src/lib, src/hooks...). Relative imports are
// resolved against the importing file, so the rule does not depend on how deep the file sits.
import path from 'node:path';

const root = path.resolve(import.meta.dirname, '../..');
const appOf = (file) => /^apps\/([^/]+)\//.exec(path.relative(root, file).split(path.sep).join('/'))?.[1];
const featureOf = (file) => /^apps\/web\/src\/features\/([^/]+)\//.exec(path.relative(root, file).split(path.sep).join('/'))?.[1];
const appPackages = new Set(['@gelpoint/api', '@gelpoint/web', '@gelpoint/worker', '@gelpoint/cli', '@gelpoint/mailsink']);

/** @type {import('eslint').Rule.RuleModule} */
const layout = {
  meta: {
    type: 'problem',
    schema: [],
    messages: {
      otherApp: '{{from}} may not import from the {{to}} app: share code through a package under packages/.',
      appPackage: 'import {{name}} is an app; apps import packages, not each other.',
      otherFeature: 'The {{from}} feature may not import from the {{to}} feature: move what both need to src/components, src/lib or src/hooks.',
    },
  },
  create(context) {
    const file = context.filename;
    const check = (node) => {
      const source = node.source?.value;
      if (typeof source !== 'string') return;
      const fromApp = appOf(file);
      if (appPackages.has(source) || [...appPackages].some((p) => source.startsWith(`${p}/`))) {
        const name = source.split('/').slice(0, 2).join('/');
        if (name !== `@gelpoint/${fromApp}`) context.report({ node: node.source, messageId: 'appPackage', data: { name } });
        return;
      }
      if (!source.startsWith('.')) return;
      const target = path.resolve(path.dirname(file), source);
      const toApp = appOf(target);
      // Repository scripts (the fault checks, benches) drive the apps from outside and may reach into them.
      if (fromApp && toApp && toApp !== fromApp) {
        context.report({ node: node.source, messageId: 'otherApp', data: { from: fromApp ?? path.relative(root, file), to: toApp } });
        return;
      }
      const fromFeature = featureOf(file);
      const toFeature = featureOf(target);
      if (fromFeature && toFeature && fromFeature !== toFeature)
        context.report({ node: node.source, messageId: 'otherFeature', data: { from: fromFeature, to: toFeature } });
    };
    return { ImportDeclaration: check, ExportNamedDeclaration: check, ExportAllDeclaration: check, ImportExpression: check };
  },
};

export const boundaries = { rules: { layout } };
