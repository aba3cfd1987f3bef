import { defineConfig, globalIgnores } from 'eslint/config';
import nextVitals from 'eslint-config-next/core-web-vitals';
import nextTs from 'eslint-config-next/typescript';

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  {
    // Tests read response bodies loosely (json.item.tag, json.errors[0]) to compare them with values from a source;
    // typing every body would add nothing the assertions do not already check.
    files: ['tests/**/*.ts'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    // CommonJS on purpose: run by plain `node --conditions=react-server`, where require() is how it loads.
    files: ['**/*.cjs'],
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  globalIgnores(['.next*/**', '.build/**', '.data/**', 'node_modules/**', 'tests/.artifacts/**', 'test-results/**', 'playwright-report/**', 'next-env.d.ts']),
]);
