// One flat config for the whole repository: TypeScript, Vue, and the rule
// that keeps shared/ pure (it runs in the browser, the server and the CLI).
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import pluginVue from 'eslint-plugin-vue';
import vueParser from 'vue-eslint-parser';
import globals from 'globals';

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', 'drizzle/**', 'coverage/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  ...pluginVue.configs['flat/recommended'],
  {
    files: ['**/*.vue'],
    languageOptions: { parser: vueParser, parserOptions: { parser: tseslint.parser, sourceType: 'module' } },
  },
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-non-null-assertion': 'off',
      'vue/multi-word-component-names': 'off',
      'vue/max-attributes-per-line': 'off',
      'vue/singleline-html-element-content-newline': 'off',
      'vue/html-self-closing': 'off',
    },
  },
  {
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['vue', 'vue-router', 'pinia', 'primevue', 'primevue/*'], message: 'shared/ must not import the UI framework' },
            { group: ['express', 'express-*', 'drizzle-orm', 'drizzle-orm/*', 'mysql2', 'mysql2/*'], message: 'shared/ must not import server code' },
            { group: ['node:*', 'fs', 'path', 'os', 'child_process'], message: 'shared/ must not import Node APIs' },
            { group: ['**/server/**', '**/src/**'], message: 'shared/ imports nothing from server/ or src/' },
          ],
        },
      ],
    },
  },
);
