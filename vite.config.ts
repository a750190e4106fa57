import { fileURLToPath } from 'node:url';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { compression } from 'vite-plugin-compression2';
import { defineConfig } from 'vitest/config';
import { pwaPlugin } from './vite-plugins/pwa.js';

const alias = {
  '@': fileURLToPath(new URL('./src', import.meta.url)),
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
};
const apiPort = process.env.PORT ?? '3000';

export default defineConfig({
  plugins: [
    react(),
    tailwindcss(),
    pwaPlugin(),
    // Brotli and gzip copies beside each text file; the server picks one by Accept-Encoding
    // (server/static/client-static.ts). The build manifest is read by the budget test, never served.
    compression({
      algorithms: ['brotliCompress', 'gzip'],
      include: /\.(html|js|mjs|css|json|svg|webmanifest|txt)$/,
      exclude: /(^|[\\/])\.vite[\\/]/,
      logLevel: 'silent',
    }),
  ],
  resolve: { alias },
  server: {
    port: 5173,
    proxy: { '/api': `http://localhost:${apiPort}` },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    // dist/.vite/manifest.json: what each page loads, read by tests/build/first-load-budget.test.ts.
    manifest: true,
    // Libraries change less often than our code: separate chunks stay cached on members' phones.
    rolldownOptions: {
      output: {
        codeSplitting: {
          groups: [
            { name: 'react', test: /node_modules[\\/](react|react-dom|scheduler)[\\/]/ },
            { name: 'router', test: /node_modules[\\/]react-router[\\/]/ },
            { name: 'zod', test: /node_modules[\\/]zod[\\/]/ },
          ],
        },
      },
    },
  },
  test: {
    reporters: ['default', './tests/helpers/summary-reporter.ts'],
    projects: [
      {
        extends: true,
        test: {
          name: 'server',
          sequence: { groupOrder: 0 },
          environment: 'node',
          include: ['tests/server/**/*.test.ts', 'tests/shared/**/*.test.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'build',
          sequence: { groupOrder: 0 },
          environment: 'node',
          include: ['tests/build/**/*.test.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'client',
          sequence: { groupOrder: 0 },
          environment: 'happy-dom',
          include: ['tests/client/**/*.test.{ts,tsx}'],
          setupFiles: ['tests/helpers/client-setup.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'browser',
          sequence: { groupOrder: 0 },
          environment: 'node',
          include: ['tests/browser/**/*.test.ts'],
          testTimeout: 60_000,
          hookTimeout: 60_000,
          fileParallelism: false,
        },
      },
      {
        // Tests that a busy CPU makes unreliable in the browser itself (the service worker's hand-over to a
        // new version): they run one at a time with nothing else beside them. Vitest runs the groups in turn:
        // server, build and client together (groupOrder 0), then this one (1), then the browser project's
        // one-at-a-time files (fileParallelism: false puts them in a group of their own, last).
        extends: true,
        test: {
          name: 'browser-alone',
          environment: 'node',
          include: ['tests/browser-alone/**/*.test.ts'],
          testTimeout: 60_000,
          hookTimeout: 60_000,
          fileParallelism: false,
          sequence: { groupOrder: 1 },
        },
      },
    ],
  },
});
