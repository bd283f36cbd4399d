// The few parts of fontkit (the font engine react-pdf itself uses) that the card layout reads.
declare module 'fontkit' {
  export type BBox = { minX: number; minY: number; maxX: number; maxY: number };
  export type Glyph = { bbox: BBox; advanceWidth: number };
  export type GlyphPosition = { xAdvance: number; xOffset: number; yOffset: number };
  export type GlyphRun = { glyphs: Glyph[]; positions: GlyphPosition[]; advanceWidth: number };
  export type Font = { unitsPerEm: number; ascent: number; descent: number; capHeight: number; postscriptName: string; layout(text: string): GlyphRun };
  export function openSync(path: string): Font;
}
