// ESLint (flat config): the recommended JavaScript and typescript-eslint rules, without type information
// (fast enough for npm test). Formatting is Prettier's job (.prettierrc.json), not the linter's.
import js from '@eslint/js';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  // Generated code (ajv's standalone validator) is checked by its own test, not linted.
  { ignores: ['dist/', 'dist-web/', 'coverage/', '.test-results/', 'node_modules/', 'src/**/*.generated.ts'] },
  js.configs.recommended,
  tseslint.configs.recommended,
  {
    rules: {
      // `_name` marks a parameter or binding kept on purpose (a callback's unused argument, a destructured rest).
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
      // A reference to a local declaration file (papaparse-core.d.ts) is how a module without types gets them.
      '@typescript-eslint/triple-slash-reference': ['error', { path: 'always', types: 'prefer-import', lib: 'always' }],
      // Generated code is a deliberate exception with its reason beside it (compiled-propagation.ts).
      'no-new-func': 'error',
    },
  },
  // The kind maps are empty interfaces that each kind's file extends by declaration merging (DEVELOPERS.md).
  { files: ['src/inputs/budget-input.ts'], rules: { '@typescript-eslint/no-empty-object-type': ['error', { allowInterfaces: 'always' }] } },
  { files: ['src/cli/**', 'test/**', '*.config.*', '**/*.mjs'], languageOptions: { globals: globals.node } },
  // Scripts that drive Chromium: their page.evaluate callbacks run in the page.
  { files: ['test/tools/**', 'test/bench/typing-bench.mjs'], languageOptions: { globals: { ...globals.node, ...globals.browser } } },
  { files: ['web/**', 'test/web/**'], languageOptions: { globals: { ...globals.browser, ...globals.mocha } } },
  {
    files: ['test/**'],
    rules: {
      // Published check values are quoted with all their digits, more than a double holds.
      'no-loss-of-precision': 'off',
      // Tests mutate documents freely to build bad input.
      '@typescript-eslint/no-explicit-any': 'off',
    },
  },
  // chai's property assertions (`expect(x).to.exist`) are expressions.
  { files: ['test/web/**'], rules: { '@typescript-eslint/no-unused-expressions': 'off' } },
);
