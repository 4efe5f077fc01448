import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vitest/config';

const apiPort = Number(process.env.API_PORT ?? 3001);

export default defineConfig({
  plugins: [react(), tailwindcss()],
  build: {
    outDir: 'dist',
    sourcemap: true,
    chunkSizeWarningLimit: 800,
  },
  worker: { format: 'es' },
  server: {
    // /s/<id> stays with the client in development: the read-only page asks the API for the data.
    proxy: { '/api': `http://127.0.0.1:${apiPort}`, '/auth': `http://127.0.0.1:${apiPort}` },
  },
  test: {
    include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
    testTimeout: 30_000,
    hookTimeout: 240_000,
    pool: 'forks',
  },
});
