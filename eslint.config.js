// ESLint flat config. Layering rules keep the physics and geometry free of UI code
// (see DEVELOPERS.md, "Layers").
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

const uiPackages = ['react', 'react-dom', 'konva', 'konva/*', 'zustand', 'zustand/*', 'd3', 'd3-*'];

export default tseslint.config(
  { ignores: ['dist', 'node_modules', 'reports', 'test-results', 'playwright-report'] },
  js.configs.recommended,
  ...tseslint.configs.strict,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/consistent-type-imports': 'error',
    },
  },
  {
    files: ['src/**/*.tsx', 'src/**/*.ts'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
  {
    files: [
      'src/model/**',
      'src/geometry/**',
      'src/engine/**',
      'src/io/**',
      'src/cli/**',
      'src/build/**',
      'src/explore/**',
    ],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: uiPackages,
              message: 'The model, geometry, engine, io, cli, build and explore layers stay free of UI code.',
            },
            {
              group: ['**/store/**', '**/canvas/**', '**/panels/**', '**/commands/**', '**/app/**'],
              message: 'Lower layers never import upper layers.',
            },
          ],
        },
      ],
    },
  },
);
