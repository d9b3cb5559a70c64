import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

const apiPort = Number(process.env.API_PORT ?? 3001);

export default defineConfig({
  plugins: [react(), tailwindcss()],
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    chunkSizeWarningLimit: 1200,
    rolldownOptions: {
      // The UI primitives and the client's helpers run no code on import: a page that takes Button
      // from the `components/ui` barrel must not pull the desk's tables into the entry's chunks.
      treeshake: {
        moduleSideEffects: (id: string) => !/[\\/]src[\\/](components|lib)[\\/]/.test(id),
      },
    },
  },
  server: {
    host: '127.0.0.1',
    port: 5173,
    proxy: { '/api': { target: `http://127.0.0.1:${apiPort}`, changeOrigin: false } },
  },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['tests/shared/**/*.test.ts', 'tests/client/**/*.test.{ts,tsx}'],
          setupFiles: ['tests/support/matchers.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'integration',
          include: ['tests/server/**/*.test.ts', 'tests/seeders/**/*.test.ts'],
          setupFiles: ['tests/support/matchers.ts'],
          fileParallelism: false,
          testTimeout: 30000,
          hookTimeout: 60000,
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          fileParallelism: false,
          testTimeout: 90000,
          hookTimeout: 120000,
        },
      },
    ],
  },
});
