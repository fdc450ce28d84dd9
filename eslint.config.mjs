import nextVitals from 'eslint-config-next/core-web-vitals';
import nextTs from 'eslint-config-next/typescript';
import { defineConfig, globalIgnores } from 'eslint/config';

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  globalIgnores([
    '.next/**',
    'node_modules/**',
    'drizzle/**',
    'test-results/**',
    'playwright-report/**',
    'next-env.d.ts',
    '.data*/**',
  ]),
  // Layers (DESIGN.md, Architecture): solver/ is a library of its own; lib/ never reaches into React
  // components or routes; db/ imports nothing from the app; and no module may import itself back
  // through others.
  {
    files: ['**/*.{ts,tsx,mjs}'],
    // Packages are never parsed for cycles (slow, and some do not parse at all).
    settings: { 'import/ignore': ['node_modules'] },
    rules: { 'import/no-cycle': ['error', { ignoreExternal: true }] },
  },
  {
    files: ['solver/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['@/*', '../*'], message: 'solver/ imports nothing from the app.' }] },
      ],
    },
  },
  {
    files: ['lib/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['@/components/*', '@/app/*', '**/components/*', '**/app/*'],
              message: 'lib/ does not import components or routes: move the shared code into lib/.',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['db/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['@/lib/*', '@/components/*', '@/app/*', '**/lib/*', '**/components/*', '**/app/*'],
              message: 'db/ is the bottom layer: lib/ calls it, never the other way round.',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['tests/**'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
]);
