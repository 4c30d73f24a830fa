// Lint rules for the whole tree: typescript-eslint's recommended rules for TypeScript,
// eslint-plugin-svelte's for components, and Node or browser globals by folder.
import js from '@eslint/js';
import svelte from 'eslint-plugin-svelte';
import globals from 'globals';
import tseslint from 'typescript-eslint';
import svelteConfig from './svelte.config.js';

export default tseslint.config(
  {
    ignores: [
      '**/dist/',
      'dist-electron/',
      'dist-cli/',
      'release/',
      'node_modules/',
      'test-results/',
      'playwright-report/',
      'bench/results/',
      'coverage/',
      'out/',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  ...svelte.configs.recommended,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      // Unused names are errors, except those that start with an underscore.
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
      // The state modules keep plain Maps and Sets as private caches and Dates as time stamps;
      // what the interface reads is in $state fields, so Svelte's reactive collections are not needed.
      'svelte/prefer-svelte-reactivity': 'off',
    },
  },
  {
    files: ['**/*.svelte', '**/*.svelte.ts'],
    languageOptions: { parserOptions: { parser: tseslint.parser, extraFileExtensions: ['.svelte'], svelteConfig } },
  },
  {
    files: ['test/**', 'e2e/**', 'bench/**'],
    rules: {
      // Tests build deliberately broken inputs and read JSON of unknown shape.
      '@typescript-eslint/no-explicit-any': 'off',
      '@typescript-eslint/no-non-null-assertion': 'off',
    },
  },
);
