// The alternatives of a comparison: every combination of the varied values (the first key
// varies slowest), each written out as a complete input: the original text with the varied
// values put in and the compare block taken out, comments and all. That text is what a
// single `polebook build` of the alternative reads.
import { parse, type Document } from 'yaml';
import type { VarySpec } from './vary-spec.ts';
import type { VaryValue } from './vary-values.ts';

/** polebook's own limit on the alternatives of one comparison (a grid grows fast). */
export const MAX_ALTERNATIVES = 400;

export interface Alternative {
  /** 1-based, in grid order. */
  readonly index: number;
  /** One value per varied key, in the order of the keys. */
  readonly values: readonly VaryValue[];
  /** The complete input of the alternative. */
  readonly text: string;
}

export function gridSize(specs: readonly VarySpec[]): number {
  return specs.reduce((n, s) => n * s.values.length, 1);
}

function* grid(specs: readonly VarySpec[], at = 0, chosen: VaryValue[] = []): Generator<VaryValue[]> {
  if (at === specs.length) {
    yield [...chosen];
    return;
  }
  for (const v of specs[at]!.values) yield* grid(specs, at + 1, [...chosen, v]);
}

/** The input text with the values set and the compare block removed. */
export function alternativeText(doc: Document, specs: readonly VarySpec[], values: readonly VaryValue[]): string {
  const copy = doc.clone();
  copy.delete('compare');
  specs.forEach((s, k) => s.paths.forEach((p) => copy.setIn(p.path, values[k]!.yaml)));
  return copy.toString({ lineWidth: 0 });
}

/** A stand-in value per varied key: a plain scalar that occurs nowhere else in the text. */
const placeholder = (k: number): string => `polebook-varied-value-${k}-placeholder`;

/**
 * How a value is written in place of its placeholder, when that is exactly what the YAML library
 * would write for it: a finite number, or a string of letters, digits, spaces and unit signs that
 * reads back as the same string (not true, null or a number). Else null.
 */
function plainText(v: VaryValue['yaml']): string | null {
  if (typeof v === 'number') return Number.isFinite(v) && !Object.is(v, -0) ? JSON.stringify(v) : null;
  if (typeof v !== 'string' || !/^[A-Za-z0-9][A-Za-z0-9 ._/°%·²³-]*[A-Za-z0-9.°%²³]$|^[A-Za-z0-9]$/.test(v)) return null;
  return parse(v) === v ? v : null;
}

/**
 * Every alternative's text. The whole document is written once with a placeholder for each
 * varied value and each alternative's values put in its place: one clone and one write instead
 * of one per alternative (0.14 s of a comparison of 50). Used when every value is plain text of
 * one kind per key and the first alternative's text equals the one written in full; else each
 * alternative is written in full.
 */
function alternativeTexts(doc: Document, specs: readonly VarySpec[], all: readonly (readonly VaryValue[])[]): string[] {
  const full = () => all.map((values) => alternativeText(doc, specs, values));
  const texts = all.map((values) => values.map((v) => plainText(v.yaml)));
  const sameKind = specs.every((_, k) => all.every((values) => typeof values[k]!.yaml === typeof all[0]![k]!.yaml));
  if (all.length < 2 || !sameKind || texts.some((t) => t.some((x) => x === null))) return full();
  const copy = doc.clone();
  copy.delete('compare');
  specs.forEach((s, k) => s.paths.forEach((p) => copy.setIn(p.path, placeholder(k))));
  const template = copy.toString({ lineWidth: 0 });
  const original = doc.toString({ lineWidth: 0 });
  if (specs.some((_, k) => original.includes(placeholder(k)))) return full();
  const fill = (t: readonly (string | null)[]) => specs.reduce((text, _, k) => text.split(placeholder(k)).join(t[k]!), template);
  if (fill(texts[0]!) !== alternativeText(doc, specs, all[0]!)) return full();
  return texts.map(fill);
}

export function alternativesOf(doc: Document, specs: readonly VarySpec[]): Alternative[] {
  const all = [...grid(specs)];
  const texts = alternativeTexts(doc, specs, all);
  return all.map((values, k) => ({ index: k + 1, values, text: texts[k]! }));
}

/** "A1.length = 32 ft, pole.section.wall = 0.375" */
export function alternativeLabel(specs: readonly VarySpec[], values: readonly VaryValue[]): string {
  return specs.map((s, k) => `${s.text} = ${values[k]!.label}`).join(', ');
}
