import { createRequire } from 'node:module';
import { Font } from '@react-pdf/renderer';

const require = createRequire(import.meta.url);
// The .woff files, not .woff2: fontkit's woff2 path breaks on accented text.
const file = (pkg: string, name: string) => require.resolve(`${pkg}/files/${name}.woff`);

export const DISPLAY = 'Oswald';
export const TEXT = 'Source Sans 3';

let registered = false;

/** Registers the card faces from the installed packages, once per process; nothing is fetched. */
export function registerCardFonts(): void {
  if (registered) return;
  Font.register({
    family: DISPLAY,
    fonts: [
      { src: file('@fontsource/oswald', 'oswald-latin-400-normal'), fontWeight: 400 },
      { src: file('@fontsource/oswald', 'oswald-latin-500-normal'), fontWeight: 500 },
      { src: file('@fontsource/oswald', 'oswald-latin-600-normal'), fontWeight: 600 },
      { src: file('@fontsource/oswald', 'oswald-latin-700-normal'), fontWeight: 700 },
    ],
  });
  Font.register({
    family: TEXT,
    fonts: [
      { src: file('@fontsource/source-sans-3', 'source-sans-3-latin-400-normal'), fontWeight: 400 },
      { src: file('@fontsource/source-sans-3', 'source-sans-3-latin-400-italic'), fontWeight: 400, fontStyle: 'italic' },
      { src: file('@fontsource/source-sans-3', 'source-sans-3-latin-600-normal'), fontWeight: 600 },
      { src: file('@fontsource/source-sans-3', 'source-sans-3-latin-700-normal'), fontWeight: 700 },
    ],
  });
  // Words stay whole: a hyphen in the middle of a part name reads as part of the name.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
