/// <reference types="vitest/config" />
import react from '@vitejs/plugin-react';
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import { compression } from 'vite-plugin-compression2';

const apiTarget = process.env.FITWRIGHT_API_URL ?? `http://127.0.0.1:${process.env.PORT ?? 3000}`;

export default defineConfig({
  // Brotli and gzip copies of every text asset over 1 kB, made once at build time and served by the API
  // (app.setup.ts) to browsers that accept them.
  plugins: [react(), compression({ algorithms: ['brotliCompress', 'gzip'], threshold: 1024 })],
  resolve: {
    alias: {
      '@fitwright/engine': fileURLToPath(new URL('../api/src/engine/index.ts', import.meta.url)),
      '@': fileURLToPath(new URL('./src', import.meta.url)),
    },
  },
  server: {
    port: 5173,
    strictPort: true,
    proxy: { '/api': { target: apiTarget, changeOrigin: false } },
  },
  build: {
    outDir: 'dist',
    sourcemap: true,
    // dist/.vite/manifest.json: which chunks each route loads, read by the viewer budget test and bench/bundle.
    manifest: true,
    chunkSizeWarningLimit: 700,
  },
  test: {
    environment: 'jsdom',
    globals: false,
    setupFiles: ['./src/testing/setup.ts'],
    include: ['src/**/*.test.{ts,tsx}'],
    css: false,
  },
});
