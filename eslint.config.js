import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const features = (() => {
  try {
    return readdirSync(new URL('./src/features/', import.meta.url), { withFileTypes: true })
      .filter((d) => d.isDirectory())
      .map((d) => d.name);
  } catch {
    return [];
  }
})();

/** The engine is pure: nothing from the DOM, Node, the database, React or the rest of the app. */
const engineFence = {
  files: ['src/engine/**/*.ts'],
  rules: {
    'no-restricted-imports': [
      'error',
      {
        patterns: [
          { group: ['node:*', 'fs', 'path', 'crypto', 'os', 'child_process', 'http', 'https'], message: 'The engine is pure: no Node APIs.' },
          { group: ['react', 'react-*', 'react/*', '@tanstack/*', 'recharts', 'jspdf*'], message: 'The engine is pure: no UI libraries.' },
          { group: ['sequelize', 'sqlite3', 'express', 'pino', 'nodemailer', 'multer'], message: 'The engine is pure: no server libraries.' },
          { group: ['**/server/**', '**/app/**', '**/features/**', '**/lib/**', '**/components/**', '**/cli/**'], message: 'The engine may import only itself and src/contracts.' },
          {
            // Only these packages, each pure (no I/O, no clock, no randomness): validation, decimal
            // money, canonical JSON and SHA-256 for input hashes, CSV parsing for measurement files.
            regex: '^(?!\\.{1,2}/)(?!(zod|decimal\\.js|canonicalize|papaparse|@noble/hashes)(/|$))',
            message: 'The engine imports only zod, decimal.js, canonicalize, papaparse and @noble/hashes; add a pure package here after review.',
          },
        ],
      },
    ],
    'no-restricted-globals': [
      'error',
      ...['window', 'document', 'navigator', 'localStorage', 'sessionStorage', 'fetch', 'process', 'Buffer', 'setTimeout', 'setInterval'].map((name) => ({
        name,
        message: 'The engine is pure: no DOM, Node or timers.',
      })),
      { name: 'Date', message: 'The engine has no clock: pass times in.' },
    ],
    'no-restricted-properties': [
      'error',
      { object: 'Math', property: 'random', message: 'The engine has no hidden randomness: use a seeded generator passed in.' },
      { object: 'performance', property: 'now', message: 'The engine has no clock.' },
    ],
  },
};

const clientPatterns = [{ group: ['**/server/**', 'sequelize', 'sqlite3', 'express', 'node:*'], message: 'The client must not import server code.' }];

/** A feature may not import another feature; shared pieces live in src/components, src/lib or src/contracts. */
const featureFences = features.map((name) => ({
  files: [`src/features/${name}/**/*.{ts,tsx}`],
  rules: {
    'no-restricted-imports': [
      'error',
      {
        patterns: [
          ...clientPatterns,
          ...features
            .filter((other) => other !== name)
            .map((other) => ({ group: [`**/features/${other}`, `**/features/${other}/**`], message: `Feature "${name}" must not import feature "${other}".` })),
        ],
      },
    ],
  },
}));

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', 'coverage/**', 'test-results/**', 'data/**', 'bench/out/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      '@typescript-eslint/consistent-type-imports': ['error', { prefer: 'type-imports', fixStyle: 'separate-type-imports' }],
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-non-null-assertion': 'off',
      'no-console': ['error', { allow: ['warn', 'error'] }],
    },
  },
  {
    files: ['src/**/*.tsx', 'src/**/*.ts'],
    plugins: { 'react-hooks': reactHooks },
    rules: { 'react-hooks/rules-of-hooks': 'error', 'react-hooks/exhaustive-deps': 'warn' },
  },
  {
    files: ['src/app/**', 'src/features/**', 'src/components/**', 'src/lib/**'],
    rules: {
      'no-restricted-imports': ['error', { patterns: clientPatterns }],
    },
  },
  engineFence,
  ...featureFences,
  {
    files: ['tests/**', 'bench/**', 'scripts/**'],
    rules: { 'no-console': 'off' },
  },
);
