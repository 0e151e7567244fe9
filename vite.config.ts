import { fileURLToPath, URL } from 'node:url';
import react from '@vitejs/plugin-react';
import { VitePWA } from 'vite-plugin-pwa';
import { defineConfig } from 'vitest/config';

/** Names this build: the persisted query cache of another build is not restored (its shapes may differ). */
const buildId = new Date().toISOString();

/**
 * The service worker (Workbox, generated at build time, nothing fetched): the app shell, every
 * script, style sheet and font file is precached, so the app opens in the woods without a
 * network; a navigation falls back to the shell, except the API's and the tiles' own paths.
 * A new build waits until the user reloads (see docs/decisions/015).
 */
const serviceWorker = VitePWA({
  registerType: 'prompt',
  injectRegister: false,
  manifest: {
    name: 'Clearwood',
    short_name: 'Clearwood',
    description: 'The record of a sugarbush and its tapping advice, in the woods too.',
    start_url: '/',
    display: 'standalone',
    background_color: '#FBF8F1',
    theme_color: '#FBF8F1',
    icons: [{ src: '/favicon.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' }],
  },
  workbox: {
    globPatterns: ['**/*.{html,js,css,woff2,woff,svg,webmanifest}'],
    globIgnores: ['tiles/**'],
    // The lazily loaded map and charts are large; every chunk is precached.
    maximumFileSizeToCacheInBytes: 8 * 1024 * 1024,
    navigateFallback: 'index.html',
    navigateFallbackDenylist: [/^\/api\//, /^\/tiles\//],
    cleanupOutdatedCaches: true,
    // The first visit is served by the worker at once; a later build still waits (no skipWaiting).
    clientsClaim: true,
  },
});

const alias = {
  '@': fileURLToPath(new URL('./src', import.meta.url)),
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
};

export default defineConfig({
  plugins: [react(), serviceWorker],
  define: { __APP_BUILD__: JSON.stringify(buildId) },
  resolve: { alias },
  server: {
    port: 5173,
    proxy: { '/api': 'http://localhost:3000' },
  },
  build: { outDir: 'dist', sourcemap: false, chunkSizeWarningLimit: 1500 },
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: 'rules',
          environment: 'node',
          include: ['shared/**/*.test.ts', 'tests/checks/**/*.test.ts'],
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'server',
          environment: 'node',
          include: ['server/**/*.test.ts', 'tests/api/**/*.test.ts', 'seeds/**/*.test.ts'],
          pool: 'forks',
          testTimeout: 30000,
          hookTimeout: 60000,
        },
      },
      {
        plugins: [react()],
        define: { __APP_BUILD__: JSON.stringify('test') },
        resolve: { alias },
        test: {
          name: 'client',
          environment: 'jsdom',
          globals: true,
          include: ['src/**/*.test.{ts,tsx}'],
          setupFiles: ['src/test/setup.ts'],
          // Interaction tests type and click through whole pages in jsdom; on a busy two-core
          // machine some take several seconds.
          testTimeout: 20000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.test.ts'],
          pool: 'forks',
          fileParallelism: false,
          testTimeout: 60000,
          hookTimeout: 120000,
        },
      },
    ],
  },
});
