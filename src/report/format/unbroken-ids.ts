// Combination and load-case ids ("ext-1@wind-270", "fatigue-natural-wind") are names a checker
// looks up: a line break after one of their hyphens ("extreme-wind-" / "max@wind-000") reads as
// two words. Inside printed text their hyphens become U+2011 NON-BREAKING HYPHEN, which DejaVu
// Sans (the embedded font) draws with the same glyph as '-' and across which the line breaking
// (Unicode line-breaking class GL, UAX #14) never breaks. A long id may still break after its
// '@', before the wind direction ("extreme-wind-max@" / "wind-090"): a zero-width space (U+200B,
// class ZW, a break opportunity that draws nothing) follows the '@'. The JSON keeps the plain ids.
import type { Block, DocSection } from '../document.ts';

/** The ids of an analysis that print: its combinations and its load cases. */
export function printedIds(analysis: { readonly combinations: readonly { readonly id: string }[]; readonly cases: readonly { readonly id: string }[] }): string[] {
  return [...analysis.combinations.map((c) => c.id), ...analysis.cases.map((c) => c.id)];
}

export const NON_BREAKING_HYPHEN = '\u2011';
export const ZERO_WIDTH_SPACE = '\u200b';

/** The id as printed: its hyphens non-breaking, a break allowed after its '@'. */
export function unbrokenId(id: string): string {
  return id.replace(/-/g, NON_BREAKING_HYPHEN).replace(/@/g, `@${ZERO_WIDTH_SPACE}`);
}

function escapeRegExp(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/** Rewrites every occurrence of the ids in a text (longest first, so no id is cut by a shorter one). */
export function textWithUnbrokenIds(ids: readonly string[]): (text: string) => string {
  const hyphenated = [...new Set(ids.filter((id) => id.includes('-')))].sort((a, b) => b.length - a.length);
  if (hyphenated.length === 0) return (t) => t;
  // an id is a whole word: not preceded or followed by a letter, digit, '-' or '@' that would make it part of another name
  const re = new RegExp(`(?<![\\w@-])(?:${hyphenated.map(escapeRegExp).join('|')})(?![\\w@-])`, 'g');
  return (text) => text.replace(re, (m) => unbrokenId(m));
}

/** The sections with the ids unbroken in their text (paragraphs, lists, cautions, tables, figure titles, steps). */
export function withUnbrokenIds(sections: readonly DocSection[], ids: readonly string[]): DocSection[] {
  const t = textWithUnbrokenIds(ids);
  const block = (b: Block): Block => {
    switch (b.kind) {
      case 'paragraph':
        return { ...b, text: t(b.text) };
      case 'bullets':
        return { ...b, items: b.items.map(t) };
      case 'caution':
        return { ...b, text: t(b.text) };
      case 'table':
        return { ...b, title: t(b.title), rows: b.rows.map((r) => r.map(t)), ...(b.note !== undefined ? { note: t(b.note) } : {}) };
      case 'figure':
        return { ...b, title: t(b.title), caption: t(b.caption) };
      case 'step':
        return { ...b, step: { ...b.step, description: t(b.step.description) } };
      default:
        return b;
    }
  };
  return sections.map((s) => ({ ...s, blocks: s.blocks.map(block) }));
}
