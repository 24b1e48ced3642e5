import js from '@eslint/js';
import tseslint from 'typescript-eslint';

// Flat config: typescript-eslint's recommended rules, plus the project's boundaries
// (shared/ is isomorphic; the app never imports the server).
export default tseslint.config(
  { ignores: ['node_modules/', 'dist/', 'build/', '.expo/', 'bench/results.json', 'tests/e2e/screenshots/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-require-imports': 'off',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: ['react', 'react-native*', 'express', 'typeorm', 'node:*', '../server/*', '../../server/*', '@/server/*', '@/app/*', '@/components/*', '@/hooks/*'] },
      ],
    },
  },
  {
    files: ['app/**/*.{ts,tsx}', 'components/**/*.{ts,tsx}', 'hooks/**/*.{ts,tsx}', 'constants/**/*.ts'],
    rules: { 'no-restricted-imports': ['error', { patterns: ['@/server/*', '../server/*', '../../server/*', 'typeorm', 'express'] }] },
  },
  {
    // Metro reads its config as CommonJS.
    files: ['metro.config.js'],
    languageOptions: { sourceType: 'commonjs', globals: { require: 'readonly', module: 'writable', __dirname: 'readonly' } },
  },
  {
    files: ['scripts/**/*.mjs'],
    languageOptions: { globals: { process: 'readonly', console: 'readonly', __dirname: 'readonly' } },
  },
);
