import { fileURLToPath } from 'node:url'
import { defineConfig } from 'vitest/config'

// Lives under tests/ so the project's top level stays as DEVELOPERS.md describes.
const root = fileURLToPath(new URL('..', import.meta.url))

export default defineConfig({
  root,
  resolve: {
    alias: {
      '#shared': fileURLToPath(new URL('../shared', import.meta.url)),
      '~~': root,
    },
  },
  test: {
    // fmin's ES source imports its files without extensions, which Node's loader refuses; Vite resolves them.
    server: { deps: { inline: ['fmin'] } },
    projects: [
      {
        extends: true,
        // Fuzz and sweep tests take a few seconds alone and several times that on a loaded machine.
        test: { name: 'unit', include: ['tests/unit/**/*.test.ts'], environment: 'node', testTimeout: 30_000 },
      },
      {
        extends: true,
        test: {
          name: 'server',
          include: ['tests/server/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/support/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 120_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/support/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 90_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
})
