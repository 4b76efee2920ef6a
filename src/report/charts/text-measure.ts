// Text widths for chart layout, measured with the same DejaVu Sans files the PDF embeds.
// Without a canvas, vega guesses widths (0.8 em a character, far too wide for DejaVu Sans),
// hiding labels and shrinking charts; these widths are the ones the PDF will draw.
import { createRequire } from 'node:module';
import { fontFiles } from '../pdf/fonts.ts';

const require = createRequire(import.meta.url);

interface FontkitFont {
  readonly unitsPerEm: number;
  layout(text: string): { readonly advanceWidth: number };
}
const fontkit = require('fontkit') as { openSync(path: string): FontkitFont };

/** What vega passes for a text item (only the parts that change its width). */
export interface TextStyle {
  readonly fontSize?: number | string;
  readonly fontWeight?: number | string;
  readonly fontStyle?: string;
}

const opened = new Map<string, FontkitFont>();

function faceFile(style: TextStyle): string {
  const f = fontFiles();
  const w = style.fontWeight;
  const bold = w === 'bold' || w === 'bolder' || (typeof w === 'number' && w >= 600) || (typeof w === 'string' && Number(w) >= 600);
  const oblique = style.fontStyle === 'italic' || style.fontStyle === 'oblique';
  if (bold) return oblique ? f.boldOblique : f.bold;
  return oblique ? f.oblique : f.regular;
}

function face(style: TextStyle): FontkitFont {
  const file = faceFile(style);
  let font = opened.get(file);
  if (!font) {
    font = fontkit.openSync(file);
    opened.set(file, font);
  }
  return font;
}

/** Width in points (px in the SVG) of `text` in DejaVu Sans of the style; vega's default size 11. */
export function measureText(style: TextStyle, text: string): number {
  const size = style.fontSize != null ? Number(style.fontSize) || 0 : 11;
  if (size <= 0 || text === '') return 0;
  const font = face(style);
  return (font.layout(text).advanceWidth / font.unitsPerEm) * size;
}
