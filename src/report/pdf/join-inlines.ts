// pdfmake lays a line out word by word and then draws every word with its own pdfkit text call
// (its renderer notes the missing "optimizeInlines" step). After the layout, this joins each run of
// words that touch and look alike into one piece of text drawn from the first word's place: the
// glyphs land where they did (pdfkit lays a text out in pieces ending at a space, as pdfmake
// measured them). The largest package then draws 13 thousand pieces instead of 45 thousand, in
// about 0.3 s less, and its PDF is 29 % smaller. Words that carry anything else (a link, a page
// reference, a decoration, a background, font features, letter spacing) are drawn as laid out.
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);

/** The parts of a pdfmake inline (a laid-out word) that say how it is drawn. */
export interface LaidOutWord {
  text: string;
  x: number;
  width: number;
  height: number;
  readonly font: unknown;
  readonly fontSize: number;
  readonly color?: unknown;
  readonly opacity?: number;
  readonly characterSpacing?: number;
  readonly sup?: boolean;
  readonly sub?: boolean;
  readonly [other: string]: unknown;
}

export interface LaidOutLine {
  inlines: LaidOutWord[];
  readonly _pageNodeRef?: unknown;
}

/** Where a word ends and the next begins within this, they touch (pdfmake places them by adding widths). */
const TOUCH_PT = 1e-9;

/** pdfkit lays a text out in pieces that end at a space or tab, each on its own (no kerning across):
 * a word ending so is drawn the same alone or joined to the next. A word that ends where pdfmake
 * broke a line opportunity inside a word ("HV-" of "HV-TS") would be kerned to the next if joined. */
const endsWord = (text: string): boolean => text.endsWith(' ') || text.endsWith('\t');

const absent = (v: unknown): boolean => v === undefined || v === null || v === false;

/** Drawn as laid out, on its own: a link, a page reference, a decoration, a background, font
 * features, or letter spacing (pdfmake measures a word's spacing between its own letters only,
 * pdfkit would add it after each joined word as well). */
const plain = (w: LaidOutWord): boolean =>
  !w.characterSpacing && absent(w.link) && absent(w.linkToPage) && absent(w.linkToDestination) && absent(w.decoration) && absent(w.background) && absent(w.fontFeatures) && absent(w._pageNodeRef) && absent(w._tocItemRef) && absent(w._pageRef);

/** Drawn the same way (face, size, colour, opacity, baseline shift), and b starts where a ends. */
const joinable = (a: LaidOutWord, b: LaidOutWord): boolean =>
  endsWord(a.text) && a.font === b.font && a.fontSize === b.fontSize && a.color === b.color && a.opacity === b.opacity && a.sup === b.sup && a.sub === b.sub && Math.abs(b.x - (a.x + a.width)) < TOUCH_PT && plain(a) && plain(b);

/** Joins the touching look-alike words of a line (in place; the words themselves are not changed). */
export function joinLineWords(line: LaidOutLine): void {
  // pdfmake writes a line's page reference into its first word when it draws it.
  if (line._pageNodeRef !== undefined || line.inlines.length < 2) return;
  const words = line.inlines;
  const out: LaidOutWord[] = [words[0]!];
  // The copy of a run's first word that the run's words are joined into (one copy per run).
  let run: LaidOutWord | null = null;
  for (let k = 1; k < words.length; k++) {
    const a = out[out.length - 1]!;
    const b = words[k]!;
    if (!joinable(a, b)) {
      out.push(b);
      run = null;
      continue;
    }
    if (run === null) out[out.length - 1] = run = { ...a };
    run.text += b.text;
    run.width = b.x + b.width - run.x;
    run.height = Math.max(run.height, b.height);
  }
  line.inlines = out;
}

interface LayoutBuilderClass {
  prototype: { layoutDocument(...args: unknown[]): { items: { type: string; item: unknown }[] }[] };
}

let installed = false;

/** Runs joinLineWords on every text line of each laid-out document, before pdfmake draws it (once). */
export function joinWordsAfterLayout(): void {
  if (installed) return;
  const LayoutBuilder = (require('pdfmake/js/LayoutBuilder.js') as { default: LayoutBuilderClass }).default;
  const layoutDocument = LayoutBuilder.prototype.layoutDocument;
  LayoutBuilder.prototype.layoutDocument = function (...args) {
    const pages = layoutDocument.apply(this, args);
    for (const page of pages) for (const it of page.items) if (it.type === 'line') joinLineWords(it.item as LaidOutLine);
    return pages;
  };
  installed = true;
}
