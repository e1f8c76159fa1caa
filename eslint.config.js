// Lint: typescript-eslint, the rules of hooks, file size, and the layering of docs/decisions/008 as import rules.
import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import importX from 'eslint-plugin-import-x';
import globals from 'globals';

const dirs = (path) =>
  readdirSync(new URL(path, import.meta.url), { withFileTypes: true })
    .filter((d) => d.isDirectory())
    .map((d) => d.name);

// One zone per feature: a feature may import its own files, never another feature's.
const featureZones = (root, message) =>
  dirs(root).map((f) => ({ target: `${root}/${f}`, from: root, except: [`./${f}`], message }));

const layering = [
  { target: './shared', from: ['./client', './server', './tests'], message: 'shared/ is pure code for both sides.' },
  { target: './client', from: ['./server'], message: 'The client never imports server code.' },
  { target: './server', from: ['./client'], message: 'The server never imports client code.' },
  {
    target: ['./client/src/lib', './client/src/components', './client/src/config'],
    from: ['./client/src/features', './client/src/routes', './client/src/app'],
    message: 'lib/, components/ and config/ know no feature: move the shared piece down, or pass it in.',
  },
  {
    target: './client/src/features',
    from: ['./client/src/routes', './client/src/app'],
    message: 'A feature does not import routes or the app; the route composes features.',
  },
  ...featureZones('./client/src/features', 'Client features never import each other (docs/decisions/008).'),
  {
    target: ['./server/src/core', './server/src/http', './server/src/db', './server/src/mail', './server/src/auth'],
    from: ['./server/src/features'],
    message: 'Lower layers know no feature: features register hooks and jobs instead.',
  },
  {
    target: ['./server/src/storage', './server/src/config', './server/src/jobs'],
    from: ['./server/src/features'],
    message: 'Lower layers know no feature: features register hooks and jobs instead.',
  },
  ...featureZones('./server/src/features', 'Server features never import each other (docs/decisions/008).'),
];

export default tseslint.config(
  { ignores: ['dist/', 'node_modules/', 'drizzle/', 'tests/.results/', '.data/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver': { node: { extensions: ['.ts', '.tsx', '.js', '.mjs'] } },
      'import-x/parsers': { '@typescript-eslint/parser': ['.ts', '.tsx'] },
      'import-x/extensions': ['.ts', '.tsx', '.js', '.mjs'],
    },
    rules: {
      'import-x/no-restricted-paths': ['error', { zones: layering }],
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'import-x/no-self-import': 'error',
      'max-lines': ['error', { max: 400 }],
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', ignoreRestSiblings: true },
      ],
      '@typescript-eslint/no-explicit-any': 'error',
    },
  },
  {
    // The test agent reads whatever JSON an endpoint answers; assertions give it its shape.
    files: ['tests/**/*.ts'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    files: ['client/**/*.{ts,tsx}', 'shared/**/*.ts'],
    rules: {
      'no-restricted-syntax': [
        'error',
        { selector: 'ExportAllDeclaration', message: 'No barrel files: import from the module that defines it.' },
      ],
    },
  },
  {
    // Pages never build URLs or keys: the fetcher and the key factory live in the feature's api/ folder.
    files: ['client/src/routes/**/*.{ts,tsx}', 'client/src/app/**/*.{ts,tsx}', 'client/src/components/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['**/lib/api'],
              importNames: ['api'],
              message: 'Call the API through an operation in features/<f>/api/, which alone knows the URL.',
            },
          ],
        },
      ],
      'no-restricted-syntax': [
        'error',
        {
          selector: 'Property[key.name=/^(queryKey|mutationKey)$/] > ArrayExpression',
          message: "Take query keys from the feature's key factory (features/<f>/api/keys.ts).",
        },
        { selector: 'ExportAllDeclaration', message: 'No barrel files: import from the module that defines it.' },
      ],
    },
  },
  {
    // Inside a feature, keys come from its key factory too, so one prefix invalidates all of them.
    files: ['client/src/features/**/*.{ts,tsx}'],
    ignores: ['client/src/features/*/api/keys.ts'],
    rules: {
      'no-restricted-syntax': [
        'error',
        {
          selector: 'Property[key.name=/^(queryKey|mutationKey)$/] > ArrayExpression',
          message: "Take query keys from the feature's key factory (features/<f>/api/keys.ts).",
        },
        { selector: 'ExportAllDeclaration', message: 'No barrel files: import from the module that defines it.' },
      ],
    },
  },
  {
    // SQL lives in a feature's queries (queries.ts or queries/): routes parse and answer, services decide.
    // Sign-in (server/src/auth) follows the same layering.
    files: ['server/src/features/**/*.ts', 'server/src/auth/**/*.ts'],
    ignores: ['server/src/features/*/queries.ts', 'server/src/features/*/queries/**', 'server/src/auth/queries.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['drizzle-orm', 'drizzle-orm/*', '**/db/schema', '**/db/schema/*'],
              allowTypeImports: true,
              message: "SQL belongs in the feature's queries.ts or queries/ (docs/decisions/008).",
            },
          ],
        },
      ],
    },
  },
  {
    files: ['client/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
);
