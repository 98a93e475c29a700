// Flat config: typescript-eslint, React hooks, TanStack Query, and import boundaries
// (shared imports nothing from api/web; api and web never import each other).
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import pluginQuery from '@tanstack/eslint-plugin-query';
import { importX } from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import globals from 'globals';

export default tseslint.config(
  { ignores: ['node_modules', 'dist', '.data', '.test-data', 'test-artifacts', 'drizzle', 'coverage'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    plugins: { 'import-x': importX },
    settings: { 'import-x/resolver-next': [createTypeScriptImportResolver({ project: './tsconfig.json' })] },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'import-x/no-cycle': ['error', { maxDepth: 6 }],
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            { target: './shared', from: ['./api', './web', './scripts', './fakes'], message: 'shared/ is pure: no api, web or scripts.' },
            { target: './api', from: './web', message: 'api and web talk over HTTP only.' },
            { target: './web', from: ['./api', './scripts', './fakes'], message: 'web reaches the server through web/lib/api-client.ts.' },
          ],
        },
      ],
    },
  },
  {
    files: ['web/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks, '@tanstack/query': pluginQuery },
    rules: {
      ...reactHooks.configs.recommended.rules,
      ...pluginQuery.configs.recommended.rules,
    },
  },
);
