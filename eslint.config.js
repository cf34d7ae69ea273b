// One lint configuration for the three workspaces. The rules here encode the architecture (who may import
// whom) and the mistakes that bite at run time (floating promises, hook order), not style: formatting is
// left to the editor. `npm test` runs it and fails on any error.
import js from '@eslint/js';
import boundaries from 'eslint-plugin-boundaries';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const typeScriptFiles = ['**/*.ts', '**/*.tsx', '**/*.mts'];

/** Where each part of the product lives; a file belongs to the first element whose folder holds it. */
const elements = [
  { type: 'shared-units', pattern: 'shared/src/units' },
  { type: 'shared-schemas', pattern: 'shared/src/schemas' },
  { type: 'shared-device', pattern: 'shared/src/device' },
  { type: 'shared-module', pattern: 'shared/src/*', capture: ['module'] },
  { type: 'shared-tooling', pattern: 'shared/(test|bench)' },
  { type: 'server', pattern: 'server' },
  { type: 'client-app', pattern: 'client/src/app' },
  { type: 'client-feature', pattern: 'client/src/features/*', capture: ['feature'] },
  { type: 'client-common', pattern: 'client/src/(lib|components)' },
  { type: 'client-tooling', pattern: 'client/(src/test|e2e)' },
];

const sharedSource = ['shared-units', 'shared-schemas', 'shared-device', 'shared-module'];
const clientParts = ['client-app', 'client-feature', 'client-common', 'client-tooling'];
const anyOf = (types) => ({ element: { types: { anyOf: types } } });

/** Who may not import whom. Everything not named here is allowed. */
const policies = [
  // The engine and the contract are pure: nothing from the server or the client.
  { from: anyOf(sharedSource), disallow: { to: anyOf(['server', ...clientParts]) } },
  // One direction inside shared: the engine may use the contract's types, never the reverse; units use neither.
  { from: anyOf(['shared-schemas']), disallow: { to: anyOf(['shared-device']) } },
  { from: anyOf(['shared-units']), disallow: { to: anyOf(['shared-device', 'shared-schemas', 'shared-module']) } },
  // The server and the client reach the engine only through the package @channelwright/shared, never its sources.
  { from: anyOf(['server', ...clientParts]), disallow: { to: anyOf([...sharedSource, 'shared-tooling']) } },
  // Client features do not know each other: routes in app/ compose them; a shared need moves to lib/ or components/.
  {
    from: anyOf(['client-feature']),
    disallow: { to: { element: { type: 'client-feature', captured: { feature: '!{{ from.element.captured.feature }}' } } } },
  },
  { from: anyOf(['client-feature', 'client-common']), disallow: { to: anyOf(['client-app']) } },
  { from: anyOf(['client-common']), disallow: { to: anyOf(['client-feature']) } },
  // Neither side of the wire imports the other.
  { from: anyOf(['server']), disallow: { to: anyOf(clientParts) } },
  { from: anyOf(clientParts), disallow: { to: anyOf(['server']) } },
];

export default tseslint.config(
  {
    ignores: [
      '**/node_modules/**',
      '**/dist/**',
      '**/coverage/**',
      'client/e2e/screenshots/**',
      'data/**',
      '**/*.d.ts',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: {
      ecmaVersion: 2023,
      sourceType: 'module',
      globals: { ...globals.node },
    },
    rules: {
      // Unused names are noise and often a bug; a leading underscore marks one kept on purpose.
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
    },
  },
  {
    files: typeScriptFiles,
    languageOptions: {
      parserOptions: { projectService: { allowDefaultProject: ['shared/vitest.config.ts'] }, tsconfigRootDir: import.meta.dirname },
    },
    plugins: { boundaries },
    settings: {
      'boundaries/root-path': import.meta.dirname,
      'boundaries/elements': elements,
      'boundaries/dependency-nodes': ['import', 'export', 'dynamic-import'],
      'import/resolver': {
        typescript: {
          project: ['shared/tsconfig.json', 'shared/test/tsconfig.json', 'server/tsconfig.json', 'client/tsconfig.json'],
          noWarnOnMultipleProjects: true,
        },
      },
    },
    rules: {
      'boundaries/dependencies': ['error', { default: 'allow', policies }],
      // A promise nobody awaits loses its error and its ordering.
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/no-misused-promises': ['error', { checksVoidReturn: { attributes: false } }],
      // The server imports the engine only through its package entry points.
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['@channelwright/shared/src/*', '@channelwright/shared/dist/*'], message: 'Import @channelwright/shared/<entry> (device, schemas, units…), not its files.' },
          ],
        },
      ],
    },
  },
  {
    files: ['client/**/*.tsx', 'client/**/*.ts'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
  {
    files: ['**/*.cjs'],
    languageOptions: { sourceType: 'commonjs' },
  },
);
