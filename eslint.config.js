// Lint: the project's boundaries as rules, plus the TypeScript checks that catch real mistakes.
// `npm run lint` runs it; `npm test` runs it before the suites. What each rule protects:
// - controllers translate HTTP only: no Knex, no database token in a *.controller.ts;
// - a module reaches another module's tables through that module's service, never its repository;
// - the computation (@pourgate/batching) and the role matrix (@pourgate/permissions) stay pure: no Nest, no database, no I/O;
// - the console, the seeds, the fakes and the SDK import the API's code by package name only, never by a path into api/;
// - no import cycles inside the API.
import js from '@eslint/js';
import importX from 'eslint-plugin-import-x';
import tseslint from 'typescript-eslint';

const intoApi = { group: ['**/api/src/**', '**/api/src', '**/api/package.json'], message: 'Import the API by package name (@pourgate/batching, @pourgate/permissions, @pourgate/sdk), never by a path into api/.' };

export default tseslint.config(
  { ignores: ['**/node_modules/**', '**/dist/**', 'admin/dist/**', 'sdk/src/schema.d.ts', 'test-output/**', '.data/**', 'coverage/**'] },
  {
    files: ['**/*.ts', '**/*.tsx'],
    extends: [js.configs.recommended, ...tseslint.configs.recommended],
    languageOptions: { ecmaVersion: 2023, sourceType: 'module' },
    rules: {
      // Nest's injection and the decorators need these patterns; tsc already checks unused names where it matters
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none', destructuredArrayIgnorePattern: '^_' }],
      '@typescript-eslint/no-explicit-any': 'off',
      '@typescript-eslint/no-empty-object-type': 'off',
      '@typescript-eslint/no-unsafe-declaration-merging': 'off',
      'no-empty': ['error', { allowEmptyCatch: true }],
      // a variable a closure reads, assigned once after the closure is made, stays `let`
      'prefer-const': ['error', { ignoreReadBeforeAssign: true }],
      'no-control-regex': 'off',
      'no-useless-escape': 'off',
    },
  },
  {
    files: ['api/src/**/*.ts'],
    plugins: { 'import-x': importX },
    settings: { 'import-x/extensions': ['.ts', '.js'], 'import-x/parsers': { '@typescript-eslint/parser': ['.ts'] }, 'import-x/resolver-next': [importX.createNodeResolver({ extensions: ['.ts', '.js'], extensionAlias: { '.js': ['.ts', '.js'] } })] },
    rules: {
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'no-restricted-imports': ['error', { patterns: [{ group: ['../*/*.repository.js', '../../*/*.repository.js'], message: 'A module reaches another module’s data through that module’s service, not its repository.' }] }],
    },
  },
  {
    files: ['api/src/**/*.controller.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: [{ name: 'knex', message: 'Controllers translate HTTP only: queries belong in the module’s repository.' }],
          patterns: [
            { group: ['**/database/database.module.js'], message: 'Controllers translate HTTP only: queries belong in the module’s repository.' },
            // a list's spec (its sortable fields and filters) may be read from the repository that applies it
            { group: ['./*.repository.js', '../*/*.repository.js'], importNamePattern: '^(?!\\w*[Ss]pec$)', message: 'Controllers call services; repositories are the services’ business (a list spec excepted).' },
          ],
        },
      ],
    },
  },
  {
    files: ['packages/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['@nestjs/*', 'knex', 'pg', 'ioredis', 'bull', 'fastify', 'node:fs', 'node:http', 'node:net', 'fs', 'http'], message: 'The workspace packages are pure: no framework, no database, no I/O.' },
            { group: ['**/api/**', '@pourgate/api'], message: 'A package never reaches into the API.' },
          ],
        },
      ],
    },
  },
  { files: ['packages/**/*.spec.ts'], rules: { 'no-restricted-imports': 'off' } },
  { files: ['admin/**/*.ts', 'admin/**/*.tsx', 'seeds/**/*.ts', 'fakes/**/*.ts', 'sdk/**/*.ts'], rules: { 'no-restricted-imports': ['error', { patterns: [intoApi] }] } },
);
