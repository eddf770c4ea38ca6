// Lint rules that hold the architecture: dependencies point one way
// (shared <- workers <- server/src), features stay apart, and no import cycles.
import { readdirSync } from 'node:fs';
import tseslint from 'typescript-eslint';
import importX, { createNodeResolver } from 'eslint-plugin-import-x';

// Every folder under src/features is a feature: it may import shared pieces (components, lib, shared,
// workers) but no other feature. Pages that compose several features live in src/app/routes.
const features = readdirSync(new URL('./src/features', import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);
const featureZones = features.map((feature) => ({
  target: `./src/features/${feature}`,
  from: './src/features',
  except: [`./${feature}`],
  message:
    'Features do not import one another: compose them in src/app/routes, or move the shared piece to src/lib or src/components.',
}));

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', 'test-artifacts/**'] },
  ...tseslint.configs.recommended,
  {
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.tsx', '.js', '.mjs', '.json'] })],
    },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'import-x/no-cycle': 'error',
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            {
              target: './shared',
              from: ['./src', './server', './workers', './tests'],
              message: 'shared/ holds schemas only and imports nothing but zod.',
            },
            {
              target: './workers',
              from: ['./src', './server'],
              message: 'The simulation knows nothing of React, HTTP or the database.',
            },
            {
              target: './workers/engine/kernel',
              from: ['./workers/engine/model', './workers/engine/observe', './workers/engine/random'],
              message: 'The kernel (clock, event queue, event loop, priorities) knows no line model and no recorder.',
            },
            {
              target: './workers/engine/model',
              from: './workers/engine/observe',
              except: ['./observer.ts'],
              message:
                'The line model reports through the Observer interface only; the replication module wires in the recorder.',
            },
            {
              target: [
                './workers/engine/observe/observer.ts',
                './workers/engine/observe/recorder.ts',
                './workers/engine/observe/bottleneck.ts',
                './workers/engine/observe/window.ts',
              ],
              from: './workers/engine/model',
              message: 'The recorder knows the observer vocabulary (observer.ts), not the line model or its constants.',
            },
            { target: './server', from: './src', message: 'The server never imports client code.' },
            { target: './src', from: './server', message: 'The client talks to the server over HTTP only.' },
            {
              target: './src/components',
              from: ['./src/features', './src/app'],
              message: 'Shared UI pieces know no feature or route.',
            },
            {
              target: './src/lib',
              from: ['./src/features', './src/app'],
              message: 'Client libraries know no feature or route.',
            },
            {
              target: './src/features',
              from: './src/app',
              message: 'Features are composed by app/, never the other way round.',
            },
            ...featureZones,
          ],
        },
      ],
    },
  },
  {
    // Environment variables are read through one parsed configuration per program: the server's
    // (server/config.ts), the set-up scripts' (server/setup/setup-config.ts) and the test run's
    // (tests/support/test-env.ts). Passing the whole environment on to a child process is fine.
    ignores: [
      'server/config.ts',
      'server/setup/setup-config.ts',
      'tests/support/test-env.ts',
      'server/setup/ensure-deps.mjs',
    ],
    rules: {
      'no-restricted-syntax': [
        'error',
        {
          selector:
            "MemberExpression[object.type='MemberExpression'][object.object.name='process'][object.property.name='env']",
          message:
            'Read environment variables through the parsed configuration (server/config.ts, server/setup/setup-config.ts or tests/support/test-env.ts).',
        },
      ],
    },
  },
  {
    files: ['shared/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ regex: '^(?!zod$)[^.]', message: 'shared/ imports only zod (and its own files).' }] },
      ],
    },
  },
  {
    files: ['workers/engine/**'],
    rules: {
      'no-restricted-globals': [
        'error',
        'window',
        'document',
        'navigator',
        'localStorage',
        'sessionStorage',
        'fetch',
        'XMLHttpRequest',
        'process',
        'Buffer',
      ],
      'no-restricted-imports': ['error', { patterns: ['node:*', 'react', 'react-dom', 'express', 'typeorm', 'pg'] }],
    },
  },
);
