// ESLint rule that keeps imports flowing one way (see DEVELOPERS.md, "Import boundaries"):
// models → nothing of ours; shared → models; server → shared, models; client app →
// features → client shared → shared, models; a feature never imports another feature.
import path from 'node:path';

const root = path.resolve(import.meta.dirname, '../..');

/** The layer a repo-relative path belongs to, e.g. 'models', 'client/features/auth'. */
export function layerOf(rel) {
  const parts = rel.split(path.sep).join('/').split('/');
  if (['models', 'shared', 'server', 'tests'].includes(parts[0])) return parts[0];
  if (parts[0] === 'client' && parts[1] === 'src') {
    if (parts[2] === 'features' && parts[3] && parts.length > 4) return `client/features/${parts[3]}`;
    if (parts[2] === 'app') return 'client/app';
    if (parts[2] === 'shared') return 'client/shared';
    return 'client/app'; // main.tsx and styles sit with the app shell
  }
  return 'other';
}

/** Whether code in layer `from` may import code in layer `to`. */
export function allowed(from, to) {
  if (from === to || to === 'other' || from === 'tests' || from === 'other') return true;
  switch (from) {
    case 'models':
      return false;
    case 'shared':
      return to === 'models';
    case 'server':
      return to === 'shared' || to === 'models';
    case 'client/app':
      return to.startsWith('client/') || to === 'shared' || to === 'models';
    case 'client/shared':
      return to === 'shared' || to === 'models';
    default:
      if (from.startsWith('client/features/'))
        return to === 'client/shared' || to === 'shared' || to === 'models';
      return true;
  }
}

export const boundariesRule = {
  meta: {
    type: 'problem',
    docs: { description: 'Keep imports flowing one way between Seedwake layers' },
    messages: {
      crossing: '{{from}} may not import {{to}} ("{{source}}"); see DEVELOPERS.md, Import boundaries.',
    },
    schema: [],
  },
  create(context) {
    const file = context.filename;
    const from = layerOf(path.relative(root, file));
    function check(node, source) {
      if (typeof source !== 'string' || !source.startsWith('.')) return;
      const to = layerOf(path.relative(root, path.resolve(path.dirname(file), source)));
      if (!allowed(from, to)) context.report({ node, messageId: 'crossing', data: { from, to, source } });
    }
    return {
      ImportDeclaration: (node) => check(node, node.source.value),
      ExportNamedDeclaration: (node) => node.source && check(node, node.source.value),
      ExportAllDeclaration: (node) => check(node, node.source.value),
      ImportExpression: (node) => node.source.type === 'Literal' && check(node, node.source.value),
    };
  },
};
