// ESLint's flat config, kept as a dotfile (`npm run lint` passes it with --config).
import js from '@eslint/js';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', 'test-artifacts/**', '**/*.js', '**/*.mjs'] },
  js.configs.recommended,
  ...tseslint.configs.strict,
  {
    files: ['**/*.ts', '**/*.tsx', '**/*.mts'],
    rules: {
      // `any` only at the Excel boundary, where src/functions/functions.ts disables this rule in its own text.
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      // TypeScript checks names itself.
      'no-undef': 'off',
      // `x!` marks a lookup the code has just made sure of (a Map key taken from the same Map, a
      // coefficient table read within its length); a run-time guard there would only add noise.
      '@typescript-eslint/no-non-null-assertion': 'off',
    },
  },
);
