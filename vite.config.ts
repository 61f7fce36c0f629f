import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vitest/config';

const apiPort = process.env.PORT ?? '5180';

export default defineConfig({
  plugins: [react(), tailwindcss()],
  server: {
    port: 5173,
    proxy: { '/api': `http://127.0.0.1:${apiPort}`, '/j': `http://127.0.0.1:${apiPort}` },
  },
  build: { outDir: 'dist', sourcemap: true },
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
