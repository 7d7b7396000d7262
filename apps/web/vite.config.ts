import { fileURLToPath } from 'node:url';
import { constants as zlibConstants } from 'node:zlib';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';
import { compression } from 'vite-plugin-compression2';

const webRoot = fileURLToPath(new URL('.', import.meta.url));
const apiTarget = process.env.GELPOINT_API_URL ?? 'http://127.0.0.1:8080';

export default defineConfig({
  root: webRoot,
  plugins: [
    react(),
    tailwindcss(),
    // Hashed assets ship beside a .br and a .gz twin, compressed once at build time at the highest
    // levels; the API picks one by Accept-Encoding (apps/api/src/http/static-web.ts).
    compression({
      include: /^assets\/.+\.(js|css|svg|json|map)$/,
      threshold: 1024,
      algorithms: [
        ['brotliCompress', { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: zlibConstants.BROTLI_MAX_QUALITY } }],
        ['gzip', { level: zlibConstants.Z_BEST_COMPRESSION }],
      ],
      logLevel: 'silent',
    }),
  ],
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
