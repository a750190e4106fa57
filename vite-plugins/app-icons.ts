import sharp from 'sharp';
import type { Plugin } from 'vite';

export const THEME_COLOUR = '#1d2b36';
const BRASS = '#f2b134';

/**
 * Gripline's mark: a dark rounded square with two brass rivet heads. `fullBleed` fills the whole
 * square (for icons the system masks or rounds itself) and `rivetScale` shrinks the rivets towards
 * the middle, inside a maskable icon's safe zone (the central circle of 80 % of the width).
 */
export function markSvg({ fullBleed = false, rivetScale = 1 } = {}): string {
  const r = (3.2 * rivetScale).toFixed(2);
  const offset = 6 * rivetScale;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 32 32">`,
    `<rect width="32" height="32" rx="${fullBleed ? 0 : 7}" fill="${THEME_COLOUR}"/>`,
    `<circle cx="${16 - offset}" cy="16" r="${r}" fill="${BRASS}"/>`,
    `<circle cx="${16 + offset}" cy="16" r="${r}" fill="${BRASS}"/>`,
    `</svg>`,
  ].join('');
}

interface AppIcon {
  file: string;
  size: number;
  svg: string;
  purpose: 'any' | 'maskable';
}

/** The manifest's icons, all drawn from the one mark. */
export const MANIFEST_ICONS: AppIcon[] = [
  { file: 'icons/gripline-192.png', size: 192, svg: markSvg(), purpose: 'any' },
  { file: 'icons/gripline-512.png', size: 512, svg: markSvg(), purpose: 'any' },
  { file: 'icons/gripline-maskable-512.png', size: 512, svg: markSvg({ fullBleed: true, rivetScale: 0.8 }), purpose: 'maskable' },
];
/** iOS reads its home-screen icon from a link in index.html; it rounds the corners itself and paints transparent ones black. */
export const APPLE_TOUCH_ICON: AppIcon = { file: 'icons/apple-touch-icon-180.png', size: 180, svg: markSvg({ fullBleed: true }), purpose: 'any' };
export const MARK_SVG_FILE = 'icons/gripline.svg';

function renderPng({ size, svg }: AppIcon): Promise<Buffer> {
  return sharp(Buffer.from(svg), { density: (72 * size) / 32 })
    .resize(size, size)
    .png()
    .toBuffer();
}

/**
 * Draws the app icons from the mark with sharp: emitted into the build (where the service worker
 * precaches them) and served from memory by the dev server.
 */
export function appIconsPlugin(): Plugin {
  const files = async () => [
    { fileName: MARK_SVG_FILE, source: markSvg(), type: 'image/svg+xml' },
    ...(await Promise.all([...MANIFEST_ICONS, APPLE_TOUCH_ICON].map(async (icon) => ({ fileName: icon.file, source: await renderPng(icon), type: 'image/png' })))),
  ];
  return {
    name: 'gripline-app-icons',
    async generateBundle() {
      for (const { fileName, source } of await files()) this.emitFile({ type: 'asset', fileName, source });
    },
    configureServer(server) {
      const served = files();
      server.middlewares.use((req, res, next) => {
        void served.then((all) => {
          const file = all.find((f) => req.url === `/${f.fileName}`);
          if (!file) return next();
          res.setHeader('Content-Type', file.type);
          res.end(file.source);
        }, next);
      });
    },
  };
}
