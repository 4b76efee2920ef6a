// The fonts the package prints with: DejaVu Sans, embedded, so Greek letters, ≤ ≥, ², ·
// and the Unicode minus print the same in every viewer (the standard 14 PDF fonts lack them).
import { createRequire } from 'node:module';
import path from 'node:path';

const require = createRequire(import.meta.url);

/** Family names used in the document definition. */
export const FONT_SANS = 'DejaVuSans';
export const FONT_MONO = 'DejaVuSansMono';

function fontFile(name: string): string {
  return require.resolve(`dejavu-fonts-ttf/ttf/${name}`);
}

export interface FontFiles {
  readonly regular: string;
  readonly bold: string;
  readonly oblique: string;
  readonly boldOblique: string;
  readonly mono: string;
  readonly monoBold: string;
}

let cached: FontFiles | null = null;

/** Absolute paths of the font files, resolved from node_modules. */
export function fontFiles(): FontFiles {
  cached ??= {
    regular: fontFile('DejaVuSans.ttf'),
    bold: fontFile('DejaVuSans-Bold.ttf'),
    oblique: fontFile('DejaVuSans-Oblique.ttf'),
    boldOblique: fontFile('DejaVuSans-BoldOblique.ttf'),
    mono: fontFile('DejaVuSansMono.ttf'),
    monoBold: fontFile('DejaVuSansMono-Bold.ttf'),
  };
  return cached;
}

/** pdfmake font dictionary (paths, so SVG text can use the same files). */
export function fontDictionary(): Record<string, { normal: string; bold: string; italics: string; bolditalics: string }> {
  const f = fontFiles();
  return {
    [FONT_SANS]: { normal: f.regular, bold: f.bold, italics: f.oblique, bolditalics: f.boldOblique },
    // The mono family has no oblique in use; italics fall back to the upright faces.
    [FONT_MONO]: { normal: f.mono, bold: f.monoBold, italics: f.mono, bolditalics: f.monoBold },
  };
}

/** The only local files the renderer may read: our font files. */
export function isAllowedLocalFile(p: string): boolean {
  const f = fontFiles();
  const resolved = path.resolve(p);
  return Object.values(f).includes(resolved);
}
