// ESLint flat config: Expo's rules for the app, typescript-eslint's for the server and
// scripts, and Prettier (run separately by `npm run lint`) for layout.
const { defineConfig } = require('eslint/config');
const expoConfig = require('eslint-config-expo/flat');
const tseslint = require('typescript-eslint');

module.exports = defineConfig([
  { ignores: ['node_modules/**', 'dist/**', 'dist-*/**', '.data/**', '.expo/**', 'expo-env.d.ts'] },
  expoConfig,
  {
    files: [
      'server/**/*.ts',
      'scripts/**/*.ts',
      '__tests__/server/**/*.ts',
      '__tests__/e2e/**/*.ts',
      '__tests__/helpers/**/*.ts',
    ],
    extends: [tseslint.configs.recommended],
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' },
      ],
    },
  },
  {
    // jest helpers are named use…() like hooks (useTestDatabase registers beforeAll/afterAll);
    // they are not React hooks, so the hooks rule has nothing to check there.
    files: ['__tests__/server/**', '__tests__/e2e/**', '__tests__/lib/**', '__tests__/helpers/**'],
    rules: { 'react-hooks/rules-of-hooks': 'off' },
  },
  {
    files: ['scripts/**/*.js', '*.config.js', 'babel.config.js', 'metro.config.js'],
    languageOptions: {
      globals: {
        __dirname: 'readonly',
        require: 'readonly',
        module: 'writable',
        process: 'readonly',
        console: 'readonly',
      },
    },
  },
  {
    files: ['**/*.ts', '**/*.tsx'],
    rules: {
      'import/no-unresolved': 'off', // tsc resolves every import, the `@/` alias included
      // A zod schema and its inferred type share one name on purpose (STYLE.md §3); tsc checks real clashes.
      '@typescript-eslint/no-redeclare': 'off',
      // express, papaparse and convert-units document their API as members of the default export.
      'import/no-named-as-default-member': 'off',
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' },
      ],
    },
  },
]);
