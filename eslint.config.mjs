// Lint: ESLint's and typescript-eslint's recommended rules, Microsoft's Office add-in rules on
// the code that calls Office.js, and a guard that keeps src/chem pure (no Office, DOM or I/O).
// Formatting is Prettier's (.prettierrc.json); `npm run lint` runs both checks.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import officeAddins from 'eslint-plugin-office-addins';

export default tseslint.config(
  { ignores: ['dist/**', 'lib/**', 'lib-bench/**', 'coverage/**', 'test-artifacts/**', 'node_modules/**', '**/*.js', '**/*.mjs'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' }],
      // Tests reach into modules with jest.requireActual; the catalog's `any` is how custom-functions metadata spells a cell.
      '@typescript-eslint/no-require-imports': 'off',
    },
  },
  {
    files: ['src/functions/functions.ts', 'test/**/*.ts', 'bench/**/*.ts', 'scripts/**/*.ts'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    files: ['src/workbook/excelAdapter.ts', 'src/taskpane/taskpane.ts', 'src/functions/excel.ts'],
    plugins: { 'office-addins': officeAddins },
    rules: {
      'office-addins/call-sync-before-read': 'error',
      'office-addins/call-sync-after-load': 'error',
      'office-addins/load-object-before-read': 'error',
      'office-addins/no-context-sync-in-loop': 'warn',
      'office-addins/no-empty-load': 'error',
      'office-addins/no-navigational-load': 'error',
      'office-addins/test-for-null-using-isNullObject': 'error',
    },
  },
  {
    files: ['src/chem/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['fs', 'path', 'child_process', 'os', 'exceljs', 'hyperformula', '@microsoft/*', '../../*'], message: 'src/chem is pure: no I/O, Office or host code.' },
          ],
        },
      ],
      'no-restricted-globals': ['error', 'document', 'window', 'Office', 'Excel', 'CustomFunctions', 'fetch', 'localStorage'],
    },
  },
);
