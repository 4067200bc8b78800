import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

export default tseslint.config(
  {
    ignores: [
      '**/dist/**',
      '**/node_modules/**',
      'drizzle/**',
      'data/**',
      'test-output/**',
      'coverage/**',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
      ],
    },
  },
  {
    files: ['app/src/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'warn',
    },
  },
  {
    // The physics core is pure: no framework, no I/O.
    files: ['common/src/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            '@nestjs/*',
            'react',
            'react-*',
            'node:fs',
            'fs',
            'node:http',
            'drizzle-orm*',
            'better-sqlite3',
          ],
        },
      ],
    },
  },
  {
    // The server logs through Nest's Logger (levels, context); console only in entry points.
    files: ['api/src/**/*.ts'],
    ignores: ['api/src/main.ts', 'api/src/cli/*.main.ts', 'api/src/standins/*/main.ts'],
    rules: { 'no-console': 'error' },
  },
  {
    // Features do not import each other (CONVENTIONS: Client).
    files: ['app/src/features/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['**/features/*/**', '@/features/*'],
              message:
                'Features do not import each other; move shared code to components/ or lib/.',
            },
          ],
        },
      ],
    },
  },
);
