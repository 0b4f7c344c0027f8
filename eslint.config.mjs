import js from '@eslint/js';
import { defineConfig } from 'eslint/config';
import nextCoreWebVitals from 'eslint-config-next/core-web-vitals';
import nextTypescript from 'eslint-config-next/typescript';

const pureRingFiles = [
  'lib/units/**',
  'lib/geometry/**',
  'lib/photometry/**',
  'lib/analysis/**',
  'lib/formats/**',
  'lib/numeric.ts',
  'lib/seededRandom.ts',
];

const pureRingMessage =
  'The pure rings (lib/units, lib/geometry, lib/photometry, lib/analysis, lib/formats, lib/numeric.ts) take plain data and return plain data.';

// Never lib → components/app: React views belong in components/, pages and route handlers in app/.
const viewPatterns = [
  {
    group: ['**/components', '**/components/**', '**/app', '**/app/**'],
    message:
      'lib/ must not import components/ or app/: move the shared code into lib/ and import it from the view.',
  },
];

export default defineConfig(
  {
    ignores: ['.next/**', 'node_modules/**', 'coverage/**', 'test-artifacts/**', 'out/**', 'next-env.d.ts'],
  },
  js.configs.recommended,
  ...nextCoreWebVitals,
  ...nextTypescript,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
    },
  },
  {
    // CommonJS entry points for Node worker threads (they load tsx's require hook before TypeScript).
    files: ['scripts/**/*.cjs'],
    languageOptions: {
      sourceType: 'commonjs',
      globals: { require: 'readonly', module: 'writable', __dirname: 'readonly' },
    },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  {
    // Tests spoil documents on purpose to check the error messages; `any` is the honest type there.
    files: ['tests/**'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    files: ['lib/**'],
    rules: {
      'no-restricted-imports': ['error', { patterns: viewPatterns }],
    },
  },
  {
    files: pureRingFiles,
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: [
            { name: 'react', message: `${pureRingMessage} React code belongs in components/.` },
            { name: 'react-dom', message: `${pureRingMessage} React code belongs in components/.` },
            { name: 'konva', message: `${pureRingMessage} Canvas drawing belongs in components/.` },
            { name: 'react-konva', message: `${pureRingMessage} Canvas drawing belongs in components/.` },
            { name: 'next', message: `${pureRingMessage} Next.js code belongs in app/.` },
            { name: 'immer', message: `${pureRingMessage} Document changes (immer) belong in lib/plot.` },
            { name: 'zod', message: `${pureRingMessage} Schemas and validation (zod) belong in lib/plot.` },
          ],
          patterns: [
            ...viewPatterns,
            {
              group: ['react/*', 'react-dom/*', 'konva/*', 'react-konva/*'],
              message: `${pureRingMessage} React and canvas code belongs in components/.`,
            },
            { group: ['next/*'], message: `${pureRingMessage} Next.js code belongs in app/.` },
            {
              group: ['immer/*', 'zod/*'],
              message: `${pureRingMessage} Document model code belongs in lib/plot.`,
            },
            {
              group: ['@/lib/plot', '@/lib/plot/**', '**/plot', '**/plot/**'],
              message: `${pureRingMessage} They must not depend on the document model: pass plain values in from lib/plot instead.`,
            },
            {
              group: ['@/lib/storage', '@/lib/storage/**', '**/storage', '**/storage/**'],
              message: `${pureRingMessage} Storage is server-only and sits above lib/plot; only app/ route handlers use it.`,
            },
          ],
        },
      ],
    },
  },
);
