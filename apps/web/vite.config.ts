import { fileURLToPath } from 'node:url';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

const webRoot = fileURLToPath(new URL('.', import.meta.url));
const apiTarget = process.env.GELPOINT_API_URL ?? 'http://127.0.0.1:8080';

export default defineConfig({
  root: webRoot,
  plugins: [react(), tailwindcss()],
  server: {
    host: '127.0.0.1',
    proxy: {
      '/api': { target: apiTarget, changeOrigin: false },
    },
  },
  preview: {
    host: '127.0.0.1',
    proxy: {
      '/api': { target: apiTarget, changeOrigin: false },
    },
  },
  build: {
    outDir: fileURLToPath(new URL('./dist', import.meta.url)),
    emptyOutDir: true,
    // The API's CSP has `font-src 'self'` without data:, so small fonts must stay files instead of being inlined.
    assetsInlineLimit: 0,
    // three.js (about 250 kB gzip) is one lazy chunk loaded only on the mould page; the initial bundle stays small.
    chunkSizeWarningLimit: 1000,
  },
});
