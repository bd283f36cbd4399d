import { createRequire } from 'node:module';
import { Font } from '@react-pdf/renderer';

const require = createRequire(import.meta.url);
// The .woff files, not .woff2: fontkit's woff2 path breaks on accented text.
const file = (pkg: string, name: string) => require.resolve(`${pkg}/files/${name}.woff`);

export const DISPLAY = 'Oswald';
export const TEXT = 'Source Sans 3';

/** Every face a card prints with: react-pdf draws them and measure.ts measures the same files. */
export const FACES = {
  'display-400': { family: DISPLAY, weight: 400, style: 'normal', src: file('@fontsource/oswald', 'oswald-latin-400-normal') },
  'display-500': { family: DISPLAY, weight: 500, style: 'normal', src: file('@fontsource/oswald', 'oswald-latin-500-normal') },
  'display-600': { family: DISPLAY, weight: 600, style: 'normal', src: file('@fontsource/oswald', 'oswald-latin-600-normal') },
  'display-700': { family: DISPLAY, weight: 700, style: 'normal', src: file('@fontsource/oswald', 'oswald-latin-700-normal') },
  'text-400': { family: TEXT, weight: 400, style: 'normal', src: file('@fontsource/source-sans-3', 'source-sans-3-latin-400-normal') },
  'text-400i': { family: TEXT, weight: 400, style: 'italic', src: file('@fontsource/source-sans-3', 'source-sans-3-latin-400-italic') },
  'text-600': { family: TEXT, weight: 600, style: 'normal', src: file('@fontsource/source-sans-3', 'source-sans-3-latin-600-normal') },
  'text-700': { family: TEXT, weight: 700, style: 'normal', src: file('@fontsource/source-sans-3', 'source-sans-3-latin-700-normal') },
} as const;
export type Face = keyof typeof FACES;

let registered = false;

/** Registers the card faces from the installed packages, once per process; nothing is fetched. */
export function registerCardFonts(): void {
  if (registered) return;
  for (const family of [DISPLAY, TEXT]) {
    const faces = Object.values(FACES).filter((f) => f.family === family);
    Font.register({ family, fonts: faces.map((f) => ({ src: f.src, fontWeight: f.weight, fontStyle: f.style })) });
  }
  // Words stay whole: a hyphen in the middle of a part name reads as part of the name.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
