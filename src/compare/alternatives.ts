// The alternatives of a comparison: every combination of the varied values (the first key
// varies slowest), each written out as a complete input: the original text with the varied
// values put in and the compare block taken out, comments and all. That text is what a
// single `polebook build` of the alternative reads.
import type { Document } from 'yaml';
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

export function alternativesOf(doc: Document, specs: readonly VarySpec[]): Alternative[] {
  return [...grid(specs)].map((values, k) => ({ index: k + 1, values, text: alternativeText(doc, specs, values) }));
}

/** "A1.length = 32 ft, pole.section.wall = 0.375" */
export function alternativeLabel(specs: readonly VarySpec[], values: readonly VaryValue[]): string {
  return specs.map((s, k) => `${s.text} = ${values[k]!.label}`).join(', ');
}
