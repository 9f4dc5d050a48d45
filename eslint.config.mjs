// @ts-check
import { existsSync, readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';

/** The web client's feature folders; each may use shared code but not another feature. */
const webFeaturesDir = fileURLToPath(import.meta.resolve('./web/src/features'));
const webFeatures = existsSync(webFeaturesDir)
  ? readdirSync(webFeaturesDir, { withFileTypes: true })
      .filter((entry) => entry.isDirectory())
      .map((entry) => entry.name)
  : [];

export default tseslint.config(
  { ignores: ['**/node_modules/**', '**/dist/**', '.data/**', 'e2e/artifacts/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
      ],
    },
  },
  {
    files: ['web/src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
    },
  },
  {
    // The direction is app -> features -> shared: shared code never imports a feature or the app.
    files: [
      'web/src/components/**',
      'web/src/lib/**',
      'web/src/config/**',
      'web/src/theme/**',
      'web/src/types/**',
    ],
    rules: {
      'no-restricted-imports': ['error', { patterns: ['@/features/*', '@/app/*'] }],
    },
  },
  // Features may not import the app, nor each other (compose features in app/ instead).
  ...webFeatures.map((feature) => ({
    files: [`web/src/features/${feature}/**`],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['@/app/*'], message: 'Features may not import the app.' },
            ...webFeatures
              .filter((other) => other !== feature)
              .map((other) => ({
                group: [`@/features/${other}/*`],
                message: 'Features may not import each other; compose them in app/.',
              })),
          ],
        },
      ],
    },
  })),
);
