import { fileURLToPath } from 'node:url';
import { constants as zlibConstants } from 'node:zlib';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';
import { compression } from 'vite-plugin-compression2';
import { VitePWA } from 'vite-plugin-pwa';
import { cureCheckPhotoCache, webAppManifest } from './installable';

const webRoot = fileURLToPath(new URL('.', import.meta.url));
const apiTarget = process.env.GELPOINT_API_URL ?? 'http://127.0.0.1:8080';

export default defineConfig({
  root: webRoot,
  define: {
    // A new build forgets the data the previous one kept for offline use: its shapes may have changed.
    __GELPOINT_BUILD_ID__: JSON.stringify(Date.now().toString(36)),
  },
  plugins: [
    react(),
    tailwindcss(),
    // The installable app: the manifest, and a service worker (Workbox's generateSW) that precaches the app shell
    // so a signed-in page opens with the network cut. main.tsx registers it; the API serves both files revalidated.
    VitePWA({
      injectRegister: false,
      registerType: 'autoUpdate',
      manifest: webAppManifest,
      manifestFilename: 'manifest.webmanifest',
      workbox: {
        globPatterns: ['**/*.{js,css,html,svg,png,webmanifest}', 'assets/source-sans-3-latin-*.woff2', 'assets/source-sans-3-latin-ext-*.woff2'],
        // The mould viewer's three.js chunk is about 1 MB; the bench never needs it offline, but a planner might.
        maximumFileSizeToCacheInBytes: 2 * 1024 * 1024,
        navigateFallback: '/index.html',
        // The API (calendar feeds included) is never answered with the app's page.
        navigateFallbackDenylist: [/^\/api\//],
        cleanupOutdatedCaches: true,
        clientsClaim: true,
        skipWaiting: true,
        runtimeCaching: [
          {
            urlPattern: ({ url, sameOrigin }) => sameOrigin && /^\/api\/pours\/[^/]+\/checks\/[^/]+\/photo$/.test(url.pathname),
            handler: 'CacheFirst',
            options: { cacheName: cureCheckPhotoCache, expiration: { maxEntries: 200, maxAgeSeconds: 7 * 24 * 3600 }, cacheableResponse: { statuses: [200] } },
          },
        ],
      },
    }),
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
