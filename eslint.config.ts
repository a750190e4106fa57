import { readdirSync } from 'node:fs';
import reactHooks from 'eslint-plugin-react-hooks';
import { defineConfig } from 'eslint/config';
import tseslint from 'typescript-eslint';
import type { Linter } from 'eslint';

/**
 * One block per feature folder: a feature may not import another feature (compose them in routes).
 * On the server a feature may import exactly one file of another: its read models, `<other>/<other>.reads`.
 */
function featureBoundaries(root: 'src' | 'server', importPrefix: (feature: string) => string[], message: string) {
  const features = readdirSync(`${root}/features`, { withFileTypes: true }).filter((d) => d.isDirectory()).map((d) => d.name);
  return features.map((feature): Linter.Config => {
    const others = features.filter((f) => f !== feature);
    return {
      files: [`${root}/features/${feature}/**/*.{ts,tsx}`],
      rules: {
        'no-restricted-imports': [
          'error',
          {
            patterns: [
              ...sideRules[root],
              ...(others.length > 0
                ? [{ group: others.flatMap(importPrefix), message }]
                : []),
            ],
          },
        ],
      },
    };
  });
}

const CLIENT_ONLY = { group: ['**/server/**', '../server/*', '../../server/*'], message: 'src/ never imports server/; share code through shared/.' };
const SERVER_ONLY = { group: ['@/*', '**/src/**', 'react', 'react-dom', 'react-router'], message: 'server/ never imports the client; share code through shared/.' };
const sideRules = { src: [CLIENT_ONLY], server: [SERVER_ONLY] };

/**
 * Routers call services only, and services never see the request: plain data in, plain data out.
 * These use the typescript-eslint copy of the rule, so they add to the import rules above instead
 * of replacing them (a later block's options for the same rule would).
 */
const ROUTERS_CALL_SERVICES = {
  files: ['server/**/*.router.ts'],
  rules: {
    '@typescript-eslint/no-restricted-imports': [
      'error',
      {
        patterns: [
          {
            group: ['**/*.repo', '**/db/schema', '**/db/schema/*'],
            message: "A router calls its feature's services only; give the query or the write a service function.",
          },
        ],
      },
    ],
  },
} satisfies Linter.Config;
const NO_HTTP = [
  { name: 'express', message: 'Services never see req or res: the router reads the request and hands over plain data.' },
  { name: 'multer', message: 'Uploads are read by server/middleware/upload.ts; a service takes the UploadedFile it hands over.' },
];
const SERVICES_TAKE_PLAIN_DATA = {
  files: ['server/**/*.ts'],
  // The HTTP edge: the app, routers, middleware, the static client and lib's request helpers.
  ignores: ['server/app.ts', 'server/**/*.router.ts', 'server/middleware/**', 'server/lib/**', 'server/static/**'],
  rules: { '@typescript-eslint/no-restricted-imports': ['error', { paths: NO_HTTP }] },
} satisfies Linter.Config;
/** Services hold the rules and leave the queries to their repositories (row types may still be imported). */
const SERVICES_QUERY_THROUGH_REPOS = {
  files: ['server/**/*.service.ts'],
  rules: {
    '@typescript-eslint/no-restricted-imports': [
      'error',
      {
        paths: NO_HTTP,
        patterns: [
          {
            group: ['drizzle-orm', 'drizzle-orm/*', '**/db/schema', '**/db/schema/*'],
            allowTypeImports: true,
            message: "A service leaves queries to its feature's repository (*.repo.ts); import row types with `import type`.",
          },
        ],
      },
    ],
  },
} satisfies Linter.Config;

export default defineConfig(
  { ignores: ['dist/**', 'node_modules/**', 'drizzle/**', 'coverage/**'] },
  tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
    },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      '@typescript-eslint/no-misused-promises': ['error', { checksVoidReturn: { attributes: false } }],
      // React Router loaders throw redirect() and data() responses by design.
      '@typescript-eslint/only-throw-error': [
        'error',
        { allow: [{ from: 'lib', name: 'Response' }, { from: 'package', package: 'react-router', name: 'DataWithResponseInit' }] },
      ],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    extends: [reactHooks.configs.flat.recommended],
    rules: { 'no-restricted-imports': ['error', { patterns: [CLIENT_ONLY] }] },
  },
  { files: ['server/**/*.ts'], rules: { 'no-restricted-imports': ['error', { patterns: [SERVER_ONLY] }] } },
  {
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['express', 'express-*', 'drizzle-orm', 'drizzle-orm/*', 'better-sqlite3', 'react', 'react-*', '@/*', '**/src/**', '**/server/**'],
              message: 'shared/ is pure TypeScript + zod, used by both sides.',
            },
          ],
        },
      ],
    },
  },
  ...featureBoundaries('src', (f) => [`@/features/${f}`, `@/features/${f}/**`], 'Features do not import each other; compose them in a route or move the shared part down.'),
  ...featureBoundaries(
    'server',
    // Later `!` patterns let through the one file a feature offers others: its read models.
    (f) => [`../${f}/*`, `../../features/${f}/*`, `**/features/${f}/**`, `!../${f}/${f}.reads`, `!../../features/${f}/${f}.reads`, `!**/features/${f}/${f}.reads`],
    "Features do not import each other, except another feature's read models (`<other>/<other>.reads`); for a write, publish a domain event. Compose the rest in a route or move the shared part down.",
  ),
  ROUTERS_CALL_SERVICES,
  SERVICES_TAKE_PLAIN_DATA,
  SERVICES_QUERY_THROUGH_REPOS,
  {
    files: ['tests/**/*.{ts,tsx}'],
    rules: {
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-argument': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-non-null-assertion': 'off',
      '@typescript-eslint/prefer-promise-reject-errors': 'off',
    },
  },
);
