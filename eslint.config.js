// Lint: typescript-eslint's recommended rules over lib/, test/, data/, bench/ and content/.
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['node_modules/', '_site-demo/', 'coverage/', '**/*.cjs', 'test/fixtures/**', 'data/demo/**'] },
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-explicit-any': 'error',
    },
  },
);
