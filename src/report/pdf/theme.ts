// The look of the package: one accent colour on black and greys, sizes in points.
import type { UnitSystem } from '../../units/units.ts';
import { FONT_SANS } from './fonts.ts';

export const COLOR = {
  text: '#1a1a1a',
  muted: '#5c6166',
  rule: '#9aa0a6',
  hairline: '#c9ced3',
  fillHeader: '#e8eaed',
  fillBand: '#f4f5f6',
  /** The one accent: a deep slate blue, for headings, the status line and the caution frame. */
  accent: '#24507a',
  accentTint: '#eaf0f6',
  /** A failed check must not be missed: dark red, used only for "NOT OK". */
  fail: '#a3161b',
} as const;

/** US customary packages print on US Letter, SI packages on ISO A4. */
export function pageSizeFor(units: UnitSystem): 'LETTER' | 'A4' {
  return units === 'us' ? 'LETTER' : 'A4';
}

/** Left, top, right, bottom, in points. Top and bottom leave room for header and footer. */
export const PAGE_MARGINS: [number, number, number, number] = [56, 62, 56, 58];

export const BASE_FONT_SIZE = 9.5;

export const STYLES = {
  h1: { fontSize: 15, bold: true, color: COLOR.accent, margin: [0, 0, 0, 10] },
  h2: { fontSize: 11.5, bold: true, color: COLOR.text, margin: [0, 12, 0, 5] },
  h3: { fontSize: 10, bold: true, color: COLOR.text, margin: [0, 8, 0, 3] },
  paragraph: { margin: [0, 0, 0, 6], lineHeight: 1.25 },
  caption: { fontSize: 9, bold: true, color: COLOR.text },
  note: { fontSize: 8, color: COLOR.muted },
  tableHeader: { fontSize: 8.5, bold: true, color: COLOR.text },
  tableCell: { fontSize: 8.5 },
  small: { fontSize: 8, color: COLOR.muted },
  code: { fontSize: 7.5 },
  frame: { fontSize: 7.5, color: COLOR.muted },
} as const;

export const DEFAULT_STYLE = { font: FONT_SANS, fontSize: BASE_FONT_SIZE, color: COLOR.text, lineHeight: 1.15 };
