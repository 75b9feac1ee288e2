import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

const apiPort = Number(process.env.SEEDWAKE_PORT ?? 5180);

export default defineConfig({
  root: 'client',
  publicDir: 'public',
  plugins: [react(), tailwindcss()],
  build: { outDir: '../dist/client', emptyOutDir: true, sourcemap: true },
  server: {
    port: 5173,
    proxy: { '/api': { target: `http://127.0.0.1:${apiPort}`, changeOrigin: false } },
  },
  test: {
    root: '.',
    projects: [
      {
        test: {
          name: 'unit',
          root: '.',
          include: [
            'tests/models/**/*.test.ts',
            'tests/shared/**/*.test.ts',
            'tests/server/unit/**/*.test.ts',
            'tests/client/**/*.test.ts',
          ],
          environment: 'node',
          testTimeout: 60_000,
        },
      },
      {
        test: {
          name: 'api',
          root: '.',
          include: ['tests/server/api/**/*.test.ts'],
          environment: 'node',
          testTimeout: 60_000,
          hookTimeout: 60_000,
          fileParallelism: false,
        },
      },
      {
        test: {
          name: 'browser',
          root: '.',
          include: ['tests/browser/**/*.test.ts'],
          environment: 'node',
          testTimeout: 120_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
