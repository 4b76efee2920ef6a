// A word wider than a whole line (a table cell, mostly) must be cut, and pdfmake cuts it between the
// letters that happen to fill the line: a quantity written with no-break spaces, "50.89 × 10⁻⁶"
// (src/units/number-format.ts), came out as "50.89 × 10⁻" over "⁶ kip·ft" in a narrow column.
// Before pdfmake builds a line, a first word that is too wide and has no-break spaces is split
// after them, so it breaks there ("50.89 ×" over "10⁻⁶ kip·ft"); a part still too wide is cut by
// pdfmake as before. A word that fits is not touched.
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);

/** The parts of a measured pdfmake word read and written here (the rest is copied). */
export interface MeasuredWord {
  text: string;
  width: number;
  leadingCut?: number;
  trailingCut?: number;
  lineEnd?: boolean;
  readonly [other: string]: unknown;
}

const NO_BREAK_SPACES = /[\u00a0\u202f]/;
/** After each run of no-break spaces. */
const AFTER_NO_BREAK_SPACES = /(?<=[\u00a0\u202f])(?![\u00a0\u202f])/;
const TRAILING_SPACE = /\s+$/;

/** The parts of `word`, split after its no-break spaces, each measured with `width`; the word
 * itself if it fits in `lineWidth` (without its trailing space) or has no no-break space. */
export function splitTooWide(word: MeasuredWord, lineWidth: number, width: (text: string) => number): MeasuredWord[] {
  if (word.width - (word.trailingCut ?? 0) <= lineWidth || !NO_BREAK_SPACES.test(word.text)) return [word];
  const parts = word.text.split(AFTER_NO_BREAK_SPACES);
  return parts.map((text, k) => {
    const trailing = TRAILING_SPACE.exec(text)?.[0];
    const part: MeasuredWord = { ...word, text, width: width(text), trailingCut: trailing === undefined ? 0 : width(trailing) };
    if (k > 0) part.leadingCut = 0;
    if (k < parts.length - 1) delete part.lineEnd;
    return part;
  });
}

interface LayoutBuilderClass {
  prototype: {
    buildNextLine(this: { writer: { context(): { availableWidth: number } } }, textNode: { _inlines?: MeasuredWord[] }): unknown;
  };
}

interface TextInlinesClass {
  new (pdfDocument: null): { widthOfText(text: string, inline: MeasuredWord): number };
}

let installed = false;

/** Runs splitTooWide on the first word of each line before pdfmake builds the line (once). A too
 * wide word always starts a line: it does not fit after another. */
export function breakTooWideWordsAtNoBreakSpaces(): void {
  if (installed) return;
  const LayoutBuilder = (require('pdfmake/js/LayoutBuilder.js') as { default: LayoutBuilderClass }).default;
  const TextInlines = (require('pdfmake/js/TextInlines.js') as { default: TextInlinesClass }).default;
  const measure = new TextInlines(null);
  const buildNextLine = LayoutBuilder.prototype.buildNextLine;
  LayoutBuilder.prototype.buildNextLine = function (textNode) {
    const first = textNode._inlines?.[0];
    if (first !== undefined) {
      const parts = splitTooWide(first, this.writer.context().availableWidth, (text) => measure.widthOfText(text, first));
      if (parts.length > 1) textNode._inlines!.splice(0, 1, ...parts);
    }
    return buildNextLine.call(this, textNode);
  };
  installed = true;
}
