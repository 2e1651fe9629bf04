import { defineConfig } from 'vitest/config'
import path from 'node:path'

const alias = {
  '@': path.resolve(__dirname),
  'server-only': path.resolve(__dirname, 'tests/support/server-only.ts'),
}

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: { name: 'unit', include: ['tests/unit/**/*.test.ts'], environment: 'node' },
      },
      {
        resolve: { alias },
        test: {
          name: 'integration',
          include: ['tests/integration/**/*.test.ts'],
          environment: 'node',
          setupFiles: ['tests/integration/setup.ts'],
          // PGlite in memory per file; files run in parallel workers but each owns its database.
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
})
