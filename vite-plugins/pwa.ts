import { VitePWA } from 'vite-plugin-pwa';
import type { PluginOption } from 'vite';
import { MANIFEST_ICONS, MARK_SVG_FILE, THEME_COLOUR, appIconsPlugin } from './app-icons.js';

/**
 * The installable app: the manifest, the icons, and a Workbox service worker that precaches the app
 * shell (every chunk, the lazy pages and the scanner included, the fonts and the icons) so the
 * installed app opens with no network. API answers are never cached here: they stay fresh, and the
 * offline copy of the catalogue lives in IndexedDB. A new version waits for the member's tap.
 */
export function pwaPlugin(): PluginOption[] {
  return [
    appIconsPlugin(),
    VitePWA({
      registerType: 'prompt',
      injectRegister: false,
      manifest: {
        name: 'Gripline',
        short_name: 'Gripline',
        description: "The chapter's tool crib and fastener stock: scan a label to check out, return or draw.",
        lang: 'en',
        start_url: '/',
        scope: '/',
        display: 'standalone',
        theme_color: THEME_COLOUR,
        background_color: '#f5f2ea',
        icons: [
          ...MANIFEST_ICONS.map((icon) => ({ src: `/${icon.file}`, sizes: `${icon.size}x${icon.size}`, type: 'image/png', purpose: icon.purpose })),
          { src: `/${MARK_SVG_FILE}`, sizes: 'any', type: 'image/svg+xml', purpose: 'any' },
        ],
      },
      workbox: {
        globPatterns: ['**/*.{html,js,css,woff2,png,svg}'],
        // The decoder library and the chart pages are large; they must still be in the precache.
        maximumFileSizeToCacheInBytes: 3 * 1024 * 1024,
        navigateFallback: 'index.html',
        navigateFallbackDenylist: [/^\/api(\/|$)/, /^\/certificate/],
        cleanupOutdatedCaches: true,
        // The first service worker takes over the open page at once, so the app opens offline
        // without a reload; a later version still waits for the member's tap (no skipWaiting).
        clientsClaim: true,
        runtimeCaching: [],
      },
    }),
  ];
}
