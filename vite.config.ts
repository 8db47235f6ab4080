/// <reference types="vitest/config" />
import { defineConfig } from 'vite';
import vue from '@vitejs/plugin-vue';

const apiPort = Number(process.env.PORT ?? 5480);

// One file for the client build, the dev server and the test runner.
// Test projects: `unit` (pure code, no services), `server` (supertest against a
// throwaway MariaDB started by tests/support/global-db.ts) and `e2e` (the built
// app in Debian's chromium through playwright-core).
export default defineConfig({
  plugins: [vue()],
  server: {
    port: Number(process.env.VITE_PORT ?? 5173),
    proxy: { '/api': `http://127.0.0.1:${apiPort}` },
  },
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    // Plotly is loaded lazily as its own ~1.4 MB chunk; only that chunk is big.
    chunkSizeWarningLimit: 5000,
  },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          environment: 'node',
          include: ['tests/engine/**/*.test.ts', 'tests/shared/**/*.test.ts', 'tests/src/**/*.test.ts'],
          setupFiles: ['tests/support/install-unit-reader.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'server',
          // Cheap bcrypt in tests; production uses 12.
          env: { BCRYPT_COST: '10' },
          environment: 'node',
          include: ['tests/server/**/*.test.ts'],
          globalSetup: ['tests/support/global-db.ts'],
          hookTimeout: 60_000,
          testTimeout: 30_000,
          // One database for the project: files run one after another.
          fileParallelism: false,
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          environment: 'node',
          env: { BCRYPT_COST: '10' },
          include: ['tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/support/global-app.ts'],
          hookTimeout: 120_000,
          testTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
