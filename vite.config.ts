/// <reference types="vitest/config" />
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

// The API runs on its own port in development; Vite proxies /api to it so the
// browser sees one origin (the session cookie and the CSRF rule rely on that).
const apiPort = Number(process.env.FARTHING_API_PORT ?? 4100);

export default defineConfig({
  plugins: [react(), tailwindcss()],
  server: { proxy: { '/api': `http://127.0.0.1:${apiPort}` } },
  build: { outDir: 'dist', sourcemap: true },
  test: {
    environment: 'node',
    include: ['src/**/*.test.{ts,tsx}', 'server/**/*.test.ts', 'tests/**/*.test.ts', 'stripe-fake/**/*.test.ts'],
    exclude: ['**/node_modules/**', '**/.scratch/**', 'dist/**'],
    globalSetup: ['tests/setup/global.ts'],
    testTimeout: 30_000,
    hookTimeout: 60_000,
    pool: 'forks',
  },
});
