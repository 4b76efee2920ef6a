// Reading a rendered PDF in-process with pdfjs-dist (Mozilla's PDF reader, a library outside the
// project), so text tests need nothing but Node: the page texts, the words with their positions,
// the outline (bookmarks), the info dictionary, the page sizes and the embedded fonts.
import type { PDFDocumentProxy } from 'pdfjs-dist/types/src/display/api.js';

/** One run of text as pdfjs reports it, in PDF points from the page's lower left corner. */
export interface PdfWord {
  readonly str: string;
  readonly x: number;
  readonly y: number;
  readonly width: number;
  /** Font size (the text matrix's vertical scale). */
  readonly size: number;
}

export interface OutlineEntry {
  readonly title: string;
  /** 0 for a top-level bookmark. */
  readonly depth: number;
  /** 1-based page the bookmark opens, null when it has no destination. */
  readonly page: number | null;
}

export interface PdfText {
  readonly pageCount: number;
  /**
   * Each page as lines top to bottom, words left to right; a wide gap prints as three spaces. Read
   * as a reader sees it: a no-break space as a space, a non-breaking hyphen (U+2011, in printed ids)
   * as '-', a zero-width space (a break opportunity in an id) as nothing; `words` keep the
   * characters as drawn.
   */
  readonly pages: readonly string[];
  /** Each page's text in content-stream order (table cells row by row), runs joined by line breaks where pdfjs ends a line. */
  readonly raw: readonly string[];
  readonly words: readonly (readonly PdfWord[])[];
  /** Width and height of each page in points. */
  readonly sizes: readonly (readonly [number, number])[];
  /** Null when the PDF has no bookmarks. */
  readonly outline: readonly OutlineEntry[] | null;
  /** The info dictionary (Title, Subject, Keywords, CreationDate as 'D:...', ...). */
  readonly info: Readonly<Record<string, unknown>>;
  /** Embedded fonts by their base name ('ABCDEF+DejaVuSans'), from the font descriptors. */
  readonly fonts: readonly { readonly name: string; readonly embedded: boolean }[];
}

interface RawItem {
  str: string;
  hasEOL?: boolean;
  transform: number[];
  width: number;
}

type PdfJs = typeof import('pdfjs-dist/legacy/build/pdf.mjs');
let pdfjs: Promise<PdfJs> | undefined;
const loadPdfJs = (): Promise<PdfJs> => (pdfjs ??= import('pdfjs-dist/legacy/build/pdf.mjs'));

export async function readPdfText(pdf: Uint8Array): Promise<PdfText> {
  const lib = await loadPdfJs();
  // pdfjs may take ownership of (detach) the buffer it is given: hand it a copy.
  const doc = await lib.getDocument({ data: new Uint8Array(pdf), disableFontFace: true, useSystemFonts: false, verbosity: 0 }).promise;
  try {
    const pages: string[] = [];
    const raw: string[] = [];
    const words: PdfWord[][] = [];
    const sizes: [number, number][] = [];
    for (let n = 1; n <= doc.numPages; n++) {
      const page = await doc.getPage(n);
      const [x0, y0, x1, y1] = page.view;
      sizes.push([x1 - x0, y1 - y0]);
      const items = ((await page.getTextContent()).items as unknown[]).filter((i): i is RawItem => typeof i === 'object' && i !== null && 'str' in i);
      raw.push(asRead(items.map((i) => i.str + (i.hasEOL ? '\n' : '')).join('')));
      const w = items
        .filter((i) => i.str.trim() !== '')
        .map((i) => ({ str: i.str, x: i.transform[4], y: i.transform[5], width: i.width, size: Math.abs(i.transform[3]) || Math.abs(i.transform[0]) }));
      words.push(w);
      pages.push(asRead(layoutLines(w).join('\n')));
      page.cleanup();
    }
    const meta = await doc.getMetadata();
    return { pageCount: doc.numPages, pages, raw, words, sizes, outline: await readOutline(doc), info: (meta.info ?? {}) as Record<string, unknown>, fonts: embeddedFonts(pdf) };
  } finally {
    await doc.destroy();
  }
}

/** A no-break space reads as a space, a non-breaking hyphen as a hyphen. */
export function asRead(text: string): string {
  return text.replace(/\u00a0/g, ' ').replace(/\u2011/g, '-').replace(/\u200b/g, '');
}

/** Words on (about) the same baseline form a line; lines run top to bottom. */
export function layoutLines(words: readonly PdfWord[]): string[] {
  const sorted = [...words].sort((a, b) => b.y - a.y || a.x - b.x);
  const lines: PdfWord[][] = [];
  for (const w of sorted) {
    const line = lines.at(-1);
    // superscripts and subscripts sit a little off the baseline: a third of the size still counts
    if (line && Math.abs(line[0].y - w.y) <= Math.max(1, 0.35 * Math.min(line[0].size, w.size))) line.push(w);
    else lines.push([w]);
  }
  return lines.map((line) => {
    line.sort((a, b) => a.x - b.x);
    let text = '';
    let end = -Infinity;
    for (const w of line) {
      const gap = w.x - end;
      if (text !== '') text += gap > 1.2 * w.size ? '   ' : gap > 0.15 * w.size ? ' ' : '';
      text += w.str;
      end = Math.max(end, w.x + w.width);
    }
    return text;
  });
}

async function readOutline(doc: PDFDocumentProxy): Promise<OutlineEntry[] | null> {
  const top = await doc.getOutline();
  if (!top) return null;
  const out: OutlineEntry[] = [];
  const walk = async (items: typeof top, depth: number) => {
    for (const item of items) {
      let page: number | null = null;
      const dest = typeof item.dest === 'string' ? await doc.getDestination(item.dest) : item.dest;
      if (Array.isArray(dest) && dest[0] && typeof dest[0] === 'object') page = (await doc.getPageIndex(dest[0] as { num: number; gen: number })) + 1;
      else if (Array.isArray(dest) && typeof dest[0] === 'number') page = dest[0] + 1;
      out.push({ title: item.title, depth, page });
      await walk(item.items ?? [], depth + 1);
    }
  };
  await walk(top, 0);
  return out;
}

/**
 * The fonts the PDF names, from its font descriptors: a descriptor with a FontFile, FontFile2 or
 * FontFile3 entry carries the font program (embedded). The renderer (pdfkit) writes descriptors as
 * plain, uncompressed objects, so they can be read from the bytes.
 */
export function embeddedFonts(pdf: Uint8Array): { name: string; embedded: boolean }[] {
  const text = Buffer.from(pdf).toString('latin1');
  const out: { name: string; embedded: boolean }[] = [];
  for (const m of text.matchAll(/<<((?:(?!>>)[\s\S])*?\/Type\s*\/FontDescriptor[\s\S]*?)>>/g)) {
    const name = /\/FontName\s*\/([^\s/<>[\]()]+)/.exec(m[1])?.[1];
    if (name) out.push({ name, embedded: /\/FontFile[23]?\s/.test(m[1]) });
  }
  // a standard-14 font used without a descriptor is not embedded
  for (const m of text.matchAll(/\/Type\s*\/Font\b[\s\S]{0,200}?\/Subtype\s*\/Type1[\s\S]{0,200}?\/BaseFont\s*\/([^\s/<>[\]()]+)/g)) {
    if (!out.some((f) => f.name === m[1])) out.push({ name: m[1], embedded: false });
  }
  return out;
}

/** Text with all white space removed, to find runs that the layout wrapped over lines. */
export function squeeze(text: string): string {
  return text.replace(/\s+/g, '');
}

/** An info-dictionary date 'D:20260315000000Z' (PDF 32000-1, 7.9.4) as an ISO string. */
export function pdfDate(value: unknown): string | null {
  const m = typeof value === 'string' ? /^D:(\d{4})(\d{2})(\d{2})(\d{2})(\d{2})(\d{2})(Z|[+-]\d{2}'?\d{2}'?)?/.exec(value) : null;
  if (!m) return null;
  const zone = !m[7] || m[7] === 'Z' ? 'Z' : `${m[7].slice(0, 3)}:${m[7].replace(/'/g, '').slice(3, 5)}`;
  return `${m[1]}-${m[2]}-${m[3]}T${m[4]}:${m[5]}:${m[6]}${zone}`;
}
