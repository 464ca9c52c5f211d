// ESLint flat config: typescript-eslint's recommended type-checked rules on every TypeScript file of
// the core, the workbook link, the functions, the pane, the scripts and the tests; ESLint's and
// typescript-eslint's recommended (untyped) rules on the plain-JavaScript scripts, which carry no types
// for the type-checked rules to use. `npm run lint` runs it with --max-warnings 0.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', 'test-output/**', 'docs/**', 'demo/**/*.xlsx', '.certs/**'] },
  {
    files: ['**/*.ts', '**/*.mts'],
    extends: [js.configs.recommended, ...tseslint.configs.recommendedTypeChecked],
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
    },
    rules: {
      // `const { key: _omit, ...rest } = row` and `_name` parameters are the usual way to say "not used".
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', ignoreRestSiblings: true }],
    },
  },
  {
    // Generated from the specs (npm run declarations): functions the metadata generator reads but nothing
    // calls by name, with any[][] parameters and results because that is how it learns "a value or a range".
    files: ['functions/declarations/*.ts'],
    rules: {
      '@typescript-eslint/no-unused-vars': 'off',
      '@typescript-eslint/no-explicit-any': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
    },
  },
  {
    // Tests parse stored texts into loose JSON to damage them, and mock Office's untyped objects.
    files: ['tests/**/*.ts'],
    rules: {
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-unsafe-argument': 'off',
    },
  },
  {
    files: ['**/*.mjs', '**/*.cjs', '**/*.js'],
    extends: [js.configs.recommended, ...tseslint.configs.recommended],
    languageOptions: {
      globals: { console: 'readonly', process: 'readonly', URL: 'readonly', performance: 'readonly', setTimeout: 'readonly', clearTimeout: 'readonly' },
    },
  },
  {
    // The webpack config is CommonJS, as webpack-cli loads it.
    files: ['**/*.cjs'],
    languageOptions: { sourceType: 'commonjs', globals: { require: 'readonly', module: 'writable', __dirname: 'readonly' } },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  {
    // A classic script that stands in for office.js in the browser tests: it defines page globals with var, as office.js does.
    files: ['tests/browser/stub-office.js'],
    rules: { 'no-var': 'off', 'prefer-rest-params': 'off', '@typescript-eslint/no-this-alias': 'off' },
  },
);
