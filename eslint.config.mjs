import nextVitals from 'eslint-config-next/core-web-vitals'
import nextTs from 'eslint-config-next/typescript'

const config = [
  ...nextVitals,
  ...nextTs,
  {
    // Specs take `test` from the fixture that scans every visited page with axe.
    files: ['tests/e2e/**/*.spec.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        { paths: [{ name: '@playwright/test', importNames: ['test', 'expect'], allowTypeImports: true, message: "Import test and expect from './fixtures' so every page gets the axe check." }] },
      ],
    },
  },
  { ignores: ['.next/**', '.next-*/**', 'node_modules/**', '.data/**', 'db/migrations/**', 'next-env.d.ts', 'test-results/**', 'playwright-report/**'] },
]

export default config
