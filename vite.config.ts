/// <reference types="vitest/config" />
import { fileURLToPath } from 'node:url';
import { defineConfig, type Connect, type Plugin } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

/** Run mode's addresses, served its own light page (client/run.html); server/app.ts does the same. */
const RUN_PAGE = /^\/(run|panels\/[^/]+\/run)\/?$/;

/** The dev and preview servers answer a page load of a run address with run.html, everything else keeps index.html. */
function runPage(): Plugin {
  const rewrite: Connect.NextHandleFunction = (req, _res, next) => {
    const [pathname = '', query] = (req.url ?? '').split('?');
    if ((req.method === 'GET' || req.method === 'HEAD') && RUN_PAGE.test(pathname) && req.headers.accept?.includes('text/html')) {
      req.url = `/run.html${query === undefined ? '' : `?${query}`}`;
    }
    next();
  };
  return {
    name: 'pitwall-run-page',
    configureServer: (server) => void server.middlewares.use(rewrite),
    configurePreviewServer: (server) => void server.middlewares.use(rewrite),
  };
}

const apiTarget = `http://127.0.0.1:${process.env.PITWALL_API_PORT ?? '5810'}`;

export default defineConfig({
  root: 'client',
  publicDir: 'public',
  plugins: [react(), tailwindcss(), runPage()],
  build: {
    outDir: '../dist/client',
    emptyOutDir: true,
    chunkSizeWarningLimit: 900,
    // Two pages: the app, and run mode's light page (no React Router, no app routes).
    rolldownOptions: {
      input: {
        index: fileURLToPath(new URL('./client/index.html', import.meta.url)),
        'run-page': fileURLToPath(new URL('./client/run.html', import.meta.url)),
      },
      // The libraries both pages load, in chunks named for them (else they take the name of a small module).
      output: {
        codeSplitting: {
          groups: [
            { name: 'react-dom', test: /node_modules[\\/](react|react-dom|scheduler)[\\/]/ },
            { name: 'zod', test: /node_modules[\\/]zod[\\/]/ },
            { name: 'tanstack-query', test: /node_modules[\\/]@tanstack[\\/](query-core|react-query)[\\/]/ },
          ],
        },
      },
    },
  },
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
