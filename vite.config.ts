import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { compression } from 'vite-plugin-compression2';
import { VitePWA } from 'vite-plugin-pwa';
import { defineConfig, type Plugin } from 'vitest/config';

/**
 * React Router 7's package exports name only its development build, for every condition (upstream issue
 * remix-run/react-router#12532); the built app takes its production build, which leaves out the dev warnings.
 */
const reactRouterProduction: Plugin = {
  name: 'react-router-production',
  apply: 'build',
  config: () => ({
    resolve: {
      alias: [
        {
          find: /^react-router$/,
          replacement: fileURLToPath(new URL('node_modules/react-router/dist/production/index.mjs', import.meta.url)),
        },
      ],
    },
  }),
};

const apiPort = process.env.PORT ?? '5180';

export default defineConfig({
  plugins: [
    reactRouterProduction,
    react(),
    tailwindcss(),
    // Compressed once at build, so a busy server never spends a weak connection's time gzipping on the fly.
    compression({ algorithms: ['gzip', 'brotliCompress'], include: /\.(js|css|html|svg|wasm|webmanifest)$/ }),
    VitePWA({
      injectRegister: null,
      registerType: 'autoUpdate',
      manifest: {
        name: 'Asepta',
        short_name: 'Asepta',
        description: 'Contamination incident register for spawn labs',
        start_url: '/',
        scope: '/',
        display: 'standalone',
        background_color: '#f3f5f4',
        theme_color: '#13627a',
        icons: [
          { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png', purpose: 'any maskable' },
          { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'any maskable' },
        ],
      },
      workbox: {
        // The whole shell, the shelf screens and the scanner's reader: they open with no signal.
        globPatterns: ['**/*.{js,css,html,woff2,png,svg,wasm}'],
        maximumFileSizeToCacheInBytes: 6 * 1024 * 1024,
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api\//],
        cleanupOutdatedCaches: true,
        runtimeCaching: [
          {
            // Reads seen once (the user, a jar's page, a shelf) stay readable offline; fresh data wins when it comes.
            urlPattern: ({ url, request }) =>
              request.method === 'GET' &&
              url.pathname.startsWith('/api/') &&
              url.pathname !== '/api/auth/csrf' &&
              !url.pathname.startsWith('/api/photos/'),
            handler: 'NetworkFirst',
            options: {
              cacheName: 'asepta-api',
              networkTimeoutSeconds: 4,
              expiration: { maxEntries: 400, maxAgeSeconds: 14 * 24 * 60 * 60 },
            },
          },
        ],
      },
    }),
  ],
  server: {
    port: 5173,
    proxy: { '/api': `http://127.0.0.1:${apiPort}`, '/j': `http://127.0.0.1:${apiPort}` },
  },
  // The manifest tells the server which chunks a jar page needs, so it can preload them with the page.
  build: {
    outDir: 'dist',
    sourcemap: true,
    manifest: true,
    rolldownOptions: {
      output: {
        // On a weak signal each extra file waits for a free connection (six per host), so what the entry
        // needs is one file, and what the jar page (a QR code's address) adds is one more.
        codeSplitting: {
          groups: [
            { name: 'app', tags: ['$initial'] },
            {
              name: 'jar-page',
              test: /[\\/]src[\\/](app[\\/]routes[\\/]jar\.tsx|features[\\/]jars[\\/]components[\\/](jar-page|jar-status-badge|jar-timeline|no-such-jar|jar-event-actions)\.tsx?|components[\\/]ui[\\/](field|text-input)\.tsx)$/,
            },
          ],
        },
      },
    },
  },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['tests/shared/**/*.test.ts', 'tests/client/**/*.test.{ts,tsx}'],
          environment: 'node',
        },
      },
      {
        extends: true,
        test: {
          name: 'api',
          include: ['tests/server/**/*.test.ts'],
          globalSetup: ['tests/setup/global-db.ts', 'tests/setup/global-mail.ts'],
          setupFiles: ['tests/setup/worker-mail.ts', 'tests/setup/worker-db.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.e2e.ts'],
          globalSetup: ['tests/setup/global-db.ts', 'tests/setup/global-mail.ts', 'tests/setup/global-e2e.ts'],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
