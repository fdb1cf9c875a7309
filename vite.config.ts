/// <reference types="vitest/config" />
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

const apiTarget = `http://127.0.0.1:${process.env.PITWALL_API_PORT ?? '5810'}`;

export default defineConfig({
  root: 'client',
  publicDir: 'public',
  plugins: [react(), tailwindcss()],
  build: { outDir: '../dist/client', emptyOutDir: true, chunkSizeWarningLimit: 900 },
  server: {
    host: '127.0.0.1',
    proxy: {
      '/api': { target: apiTarget, changeOrigin: false },
      '/relay': { target: apiTarget.replace('http', 'ws'), ws: true },
    },
  },
  test: {
    root: '.',
    reporters: ['default'],
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          root: '.',
          include: [
            'shared/**/*.test.ts',
            'server/**/*.test.ts',
            'simulator/**/*.test.ts',
            'client/**/*.test.ts',
            'tests/reference/**/*.test.ts',
          ],
          environment: 'node',
        },
      },
      {
        extends: true,
        test: {
          name: 'integration',
          root: '.',
          include: ['tests/integration/**/*.test.ts'],
          globalSetup: ['tests/support/global-postgres.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'browser',
          root: '.',
          include: ['tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/support/global-postgres.ts'],
          testTimeout: 90_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
