import { defineConfig } from 'vitest/config'

// The fault suite (`npm run test:faults`): kills PostgreSQL and workers on purpose, on a
// cluster of its own, one file at a time. Not part of `npm test`; CI runs both.
export default defineConfig({
  test: {
    name: 'faults',
    include: ['tests/faults/**/*.test.ts'],
    environment: 'node',
    globalSetup: ['tests/faults/support/globalSetup.ts'],
    testTimeout: 600_000,
    hookTimeout: 180_000,
    fileParallelism: false,
  },
})
