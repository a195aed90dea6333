// Lint rules, including the one-way dependencies that DEVELOPERS.md describes:
// geometry/ imports nothing of ours and no platform API; src/ and server/ never import each other;
// in src/, features do not import each other (routes in app/ compose them).
import fs from 'node:fs';
import js from '@eslint/js';
import globals from 'globals';
import { createNodeResolver, importX } from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import tseslint from 'typescript-eslint';

const features = fs.existsSync('src/features')
  ? fs.readdirSync('src/features', { withFileTypes: true }).filter((d) => d.isDirectory()).map((d) => d.name)
  : [];

const zones = [
  { target: './geometry', from: ['./src', './server', './tests'], message: 'geometry/ imports nothing of ours outside geometry/.' },
  { target: './src', from: './server', message: 'src/ runs in the browser and does not import the server.' },
  { target: './server', from: './src', message: 'server/ does not import the client.' },
  ...features.map((f) => ({
    target: `./src/features/${f}`,
    from: './src/features',
    except: [`./${f}`],
    message: 'Features do not import each other: compose them in src/app/routes, or move shared code to src/components or src/lib.',
  })),
];

const platform = (names, message) => ({
  'no-restricted-imports': ['error', { patterns: [{ group: names, message }] }],
});

export default tseslint.config(
  { ignores: ['dist/', 'node_modules/', 'test-output/', '.data/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.tsx', '.js', '.mjs'] })],
    },
    rules: {
      'import-x/no-restricted-paths': ['error', { zones }],
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-namespace': 'off',
    },
  },
  {
    files: ['geometry/**/*.ts'],
    rules: platform(
      ['node:*', 'fs', 'path', 'react', 'react-dom', 'express', 'typeorm', 'pg', 'paper', 'paper/**'],
      'geometry/ is pure: no I/O, no DOM, no framework.',
    ),
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    languageOptions: { globals: globals.browser },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      ...platform(['node:*', 'express', 'typeorm', 'pg'], 'src/ runs in the browser.'),
    },
  },
  {
    files: ['server/**/*.{ts,mjs}', 'tests/**/*.ts', '*.js', '*.ts'],
    languageOptions: { globals: globals.node },
  },
);
