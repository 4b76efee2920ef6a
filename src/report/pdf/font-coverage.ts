// Which characters the package's embedded fonts can draw. Text from the input is printed in the
// sans faces (names, descriptions) and in the mono face (the echo of the input file), so a
// character must be in all of them, or the page would show an empty box in its place.
import { createRequire } from 'node:module';
import { fontFiles } from './fonts.ts';

const require = createRequire(import.meta.url);
const fontkit = require('fontkit') as { openSync(path: string): { readonly characterSet: readonly number[] } };

let drawable: Set<number> | null = null;

function drawableSet(): Set<number> {
  if (drawable) return drawable;
  const f = fontFiles();
  const sets = [f.regular, f.bold, f.mono].map((p) => new Set(fontkit.openSync(p).characterSet));
  drawable = new Set([...sets[0]!].filter((cp) => sets.every((s) => s.has(cp))));
  return drawable;
}

/** The first character of the text the fonts cannot draw (line breaks and tabs aside), with its UTF-16 offset. */
export function firstUndrawable(text: string): { readonly offset: number; readonly codePoint: number } | undefined {
  const set = drawableSet();
  let offset = 0;
  for (const ch of text) {
    const cp = ch.codePointAt(0)!;
    if (cp !== 0x0a && cp !== 0x0d && cp !== 0x09 && !set.has(cp)) return { offset, codePoint: cp };
    offset += ch.length;
  }
  return undefined;
}

/** What the fonts cover, in words, for the message. */
export const FONT_COVERAGE = 'DejaVu Sans and DejaVu Sans Mono: Latin, Greek and Cyrillic letters and common symbols';
