// @ts-check
import eslint from '@eslint/js';
import angular from 'angular-eslint';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  {
    ignores: [
      'dist/**',
      '.angular/**',
      '.data/**',
      'node_modules/**',
      'coverage/**',
      'test-results/**',
      'engine/schema/generated/**',
      'src/app/core/forms/generated/**',
      'src/app/core/icons/generated/**',
    ],
  },
  {
    files: ['**/*.ts'],
    extends: [eslint.configs.recommended, ...tseslint.configs.recommended],
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['src/**/*.ts'],
    extends: [...angular.configs.tsRecommended],
    processor: angular.processInlineTemplates,
    rules: {
      '@angular-eslint/directive-selector': [
        'error',
        { type: 'attribute', prefix: 'cw', style: 'camelCase' },
      ],
      '@angular-eslint/component-selector': ['error', { type: 'element', prefix: 'cw', style: 'kebab-case' }],
      // The 2025 style guide names classes after what they are, without a "Component" suffix.
      '@angular-eslint/component-class-suffix': 'off',
      '@angular-eslint/directive-class-suffix': 'off',
      '@angular-eslint/prefer-on-push-component-change-detection': 'error',
      '@angular-eslint/prefer-signals': 'error',
    },
  },
  {
    files: ['src/**/*.ts'],
    rules: {
      // The client reaches the engine through its public API only, and never the server's code.
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              // The top-level engine/ (only ../ before it, so src/app/core/engine does not match), but not engine/index.
              regex: '^(\\.\\./)+engine(/(?!index$).*)?$',
              message:
                'Import the engine through engine/index.ts (the client calls it through src/app/core/engine).',
            },
            { regex: '(^|/)server(/|$)', message: 'The client never imports the server.' },
          ],
        },
      ],
    },
  },
  {
    // Screens and services reach the engine through the one adapter in src/app/core/engine (specs
    // may build their fixtures with it directly).
    files: ['src/**/*.ts'],
    ignores: ['src/app/core/engine/**', 'src/**/*.spec.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              regex: '^(\\.\\./)+engine(/.*)?$',
              message:
                'Reach the engine through src/app/core/engine (BrowserEngine, or engine-adapter in a lazy screen).',
            },
            { regex: '(^|/)server(/|$)', message: 'The client never imports the server.' },
          ],
        },
      ],
    },
  },
  {
    files: ['src/**/*.html'],
    extends: [...angular.configs.templateRecommended, ...angular.configs.templateAccessibility],
    rules: {},
  },
  {
    files: ['engine/**/*.ts'],
    rules: {
      // The engine runs in the browser and on the server: no Node built-ins.
      'no-restricted-imports': [
        'error',
        { patterns: ['node:*', 'fs', 'path', 'os', 'child_process', 'crypto', '**/server/**', '**/src/**'] },
      ],
      'no-restricted-globals': ['error', 'process', 'Buffer', 'require', '__dirname', 'window', 'document'],
    },
  },
  {
    files: ['shared/**/*.ts', 'rules/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: ['**/server/**', '**/src/**', '**/engine/**'] }],
    },
  },
  {
    files: ['server/**/*.ts'],
    rules: { 'no-restricted-imports': ['error', { patterns: ['**/src/**'] }] },
  },
);
