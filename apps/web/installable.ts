import type { ManifestOptions } from 'vite-plugin-pwa';

/**
 * What makes Gelpoint installable to a phone's home screen (W3C Web Application Manifest): a name, where it opens,
 * that it runs in its own window, our colours, and our icon (public/icons, drawn by scripts/draw-icons.ts).
 */
export const webAppManifest: Partial<ManifestOptions> = {
  id: '/',
  name: 'Gelpoint',
  short_name: 'Gelpoint',
  description: 'Plan, mix and log resin pours into wooden moulds, at the bench.',
  lang: 'en',
  start_url: '/today',
  scope: '/',
  display: 'standalone',
  background_color: '#fbf8f3',
  theme_color: '#3e2a17',
  icons: [
    { src: '/icons/gelpoint-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
    { src: '/icons/gelpoint-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
    // The mark sits inside the central 80 %, so the same picture survives a round or squircle mask.
    { src: '/icons/gelpoint-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
  ],
};

/** The service worker's runtime cache of cure-check photos; the app empties it (with every other) on sign-out. */
export const cureCheckPhotoCache = 'gelpoint-check-photos';
