import { readdirSync } from 'node:fs';
import path from 'node:path';
import comments from '@eslint-community/eslint-plugin-eslint-comments/configs';
import js from '@eslint/js';
import vitest from '@vitest/eslint-plugin';
import prettier from 'eslint-config-prettier';
import importX, { createNodeResolver } from 'eslint-plugin-import-x';
import jsxA11y from 'eslint-plugin-jsx-a11y';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const root = import.meta.dirname;
const folders = (dir) =>
  readdirSync(path.join(root, dir), { withFileTypes: true })
    .filter((d) => d.isDirectory())
    .map((d) => d.name);

/** Features meet only in src/app/routes; what two features share lives in src/components or src/lib. */
const featureZones = folders('src/features').map((f) => ({
  target: `./src/features/${f}`,
  from: './src/features',
  except: [`./${f}`],
  message:
    'A feature never imports another feature: compose them in src/app/routes or move the shared part to src/components.',
}));

/** A module may call another module's service, never its repository or its router. */
const moduleZones = folders('server').map((m) => ({
  target: `./server/${m}`,
  from: ['./server/*/*.repository.ts', './server/*/*.router.ts'],
  except: [path.join(root, 'server', m, '**')],
  message: "Call the other module's service; its repository and router are its own.",
}));

export default tseslint.config(
  { ignores: ['index.html', 'dist/', 'node_modules/', '.data/', 'coverage/', 'server/db/migrations/*-*.ts'] },
  js.configs.recommended,
  comments.recommended,
  ...tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
      globals: { ...globals.node, ...globals.browser },
    },
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.tsx', '.js', '.mjs', '.json'] })],
    },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-misused-promises': [
        'error',
        { checksVoidReturn: { arguments: false, attributes: false } },
      ],
      // react-router's redirect() is a Response thrown from loaders by design.
      '@typescript-eslint/only-throw-error': ['error', { allow: [{ from: 'lib', name: 'Response' }] }],
      'import-x/no-cycle': 'error',
      // A rule switched off in place says why on the same line (`-- reason`).
      '@eslint-community/eslint-comments/require-description': ['error', { ignore: ['eslint-enable'] }],
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            {
              target: './shared',
              from: ['./src', './server', './seed', './tests', './scripts'],
              message: 'shared/ imports nothing of ours.',
            },
            { target: './src', from: ['./server', './seed'], message: 'The client reaches the server only over HTTP.' },
            { target: './server', from: ['./src', './seed', './tests'] },
            {
              target: './tests',
              from: './seed',
              message: 'Tests never use seed/: take rows from tests/setup or the module the seed loads through.',
            },
            ...featureZones,
            ...moduleZones,
          ],
        },
      ],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks, 'jsx-a11y': jsxA11y },
    rules: { ...reactHooks.configs.recommended.rules, ...jsxA11y.flatConfigs.recommended.rules },
  },

  {
    files: ['tests/**/*.ts', 'tests/**/*.tsx'],
    plugins: { vitest },
    rules: {
      ...vitest.configs.recommended.rules,
      'vitest/expect-expect': ['error', { assertFunctionNames: ['expect', 'expect*', '*.expect'] }],
      '@typescript-eslint/no-non-null-assertion': 'off',
    },
  },
  { files: ['eslint.config.js'], ...tseslint.configs.disableTypeChecked },
  prettier,
);
