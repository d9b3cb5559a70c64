import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', 'test-results/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
      ],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: { ...reactHooks.configs.recommended.rules },
  },
  {
    // The engine and contracts run in the browser and in Node: they import nothing of the app.
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['**/src/**', '**/server/**', '../../src/*', '../../server/*'],
              message: 'shared/ imports nothing from src/ or server/.',
            },
            {
              group: [
                'node:*',
                'fs',
                'path',
                'os',
                'child_process',
                'react',
                'react-*',
                'express',
                'sequelize',
              ],
              message: 'shared/ stays free of Node built-ins, React, Express and Sequelize.',
            },
          ],
        },
      ],
    },
  },
  {
    // The engine is the lower layer: the API contracts build on it, never the other way round.
    files: ['shared/engine/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['**/src/**', '**/server/**'],
              message: 'shared/ imports nothing from src/ or server/.',
            },
            {
              group: [
                'node:*',
                'fs',
                'path',
                'os',
                'child_process',
                'react',
                'react-*',
                'express',
                'sequelize',
              ],
              message: 'shared/ stays free of Node built-ins, React, Express and Sequelize.',
            },
            {
              group: ['../api/*', '../../api/*', '../../../api/*'],
              message:
                'shared/engine does not import shared/api (the contracts build on the engine).',
            },
          ],
        },
      ],
    },
  },
);
