import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

// The engine in shared/ must run unchanged in the browser and on the server, so it may not
// import a framework, a renderer, the DOM or Node's built-ins.
const impureModules = [
  'react', 'react-dom', 'react-dom/*', 'react-router', 'react-router-dom', '@tanstack/*',
  'three', 'three/*', '@react-three/*', 'zustand', 'zustand/*', 'jspdf', 'jspdf-autotable',
  'express', 'express-*', 'sequelize', 'pg', 'passport', 'passport-*', 'nodemailer', 'umzug',
  'node:*', 'fs', 'fs/*', 'path', 'os', 'child_process', 'crypto', 'http', 'https', 'net', 'url',
  'stream', 'util', 'worker_threads', 'process', 'buffer',
];

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', '.tmp/**', 'coverage/**', 'out/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': 'error',
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'warn',
    },
  },
  {
    files: ['shared/**/*.ts'],
    languageOptions: { globals: {} },
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [{ group: impureModules, message: 'shared/ is the pure engine: no frameworks, DOM, database or Node built-ins.' }],
      }],
      'no-restricted-globals': ['error', 'window', 'document', 'navigator', 'localStorage', 'process', 'require', 'Buffer', '__dirname'],
    },
  },
);
