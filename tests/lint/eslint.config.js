// Lint configuration (run with `npm run lint`; it lives here to keep the repo's top level
// to the agreed layout).
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import { boundariesRule } from './boundaries-rule.js';

export default tseslint.config(
  { ignores: ['node_modules/**', 'dist/**', '.data/**', '.test-data/**', 'test-output/**', 'drizzle/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    plugins: { seedwake: { rules: { boundaries: boundariesRule } } },
    rules: {
      'seedwake/boundaries': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
    },
  },
  {
    files: ['client/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: { ...reactHooks.configs.recommended.rules },
  },
);
