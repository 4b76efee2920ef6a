// Values that are round-off of the solution (a few units in the last digits of the largest
// value they are computed with) print as 0, not as "3.4e-13 kip". The threshold is stated
// here once; the tables that use it say so in their notes.
import type { CalcStep, Qty } from '../../calc/step.ts';
import type { Dim } from '../../units/units.ts';
import type { Block, DocSection } from '../document.ts';

/** A value at or below this fraction of its reference scale is round-off. */
export const ROUND_OFF = 1e-9;

export function withoutRoundOff(v: number, scale: number, share = ROUND_OFF): number {
  return Math.abs(v) <= share * Math.abs(scale) ? 0 : v;
}

/**
 * The share of its scale below which a result is noise. A first-order solution is exact to
 * arithmetic round-off (ROUND_OFF). A second-order solution is iterated until the displacements
 * change by less than the tolerance relative to the largest: it is known to about that share of
 * the largest value, and what lies below is the iteration's noise (a moment that symmetry makes
 * zero, printed as 27 × 10⁻⁶ kN·m beside 21 kN·m).
 */
export function roundOffShare(options: { readonly secondOrder: boolean; readonly tolerance: number }): number {
  return options.secondOrder ? Math.max(ROUND_OFF, options.tolerance) : ROUND_OFF;
}

/**
 * Every quantity of the steps that is round-off next to the largest quantity of the same kind
 * among them (at or below ROUND_OFF of it) becomes 0, so steps print "0 in", not "3.4e-13 in".
 * Steps printed as rows of a table are cleaned against the table's own steps (step-table.ts).
 */
export function cleanSteps(steps: readonly CalcStep[]): CalcStep[] {
  const scale = new Map<Dim, number>();
  const see = (q: Qty) => scale.set(q.dim, Math.max(scale.get(q.dim) ?? 0, Math.abs(q.si)));
  for (const s of steps) {
    see(s.result);
    for (const p of s.substituted) if (typeof p !== 'string') see(p);
  }
  const clean = (q: Qty): Qty => (q.si !== 0 && Math.abs(q.si) <= ROUND_OFF * (scale.get(q.dim) ?? 0) ? { si: 0, dim: q.dim } : q);
  return steps.map((s) => ({ ...s, result: clean(s.result), substituted: s.substituted.map((p) => (typeof p === 'string' ? p : clean(p))) }));
}

/** The step blocks of each section cleaned against the largest quantity of each kind in that section. Tables apply withoutRoundOff with their own scales. */
export function cleanRoundOff(sections: readonly DocSection[]): DocSection[] {
  return sections.map((sec) => {
    const cleaned = cleanSteps(sec.blocks.flatMap((b) => (b.kind === 'step' ? [b.step] : [])));
    let k = 0;
    const blocks: Block[] = sec.blocks.map((b) => (b.kind !== 'step' ? b : { kind: 'step', step: cleaned[k++]! }));
    return { ...sec, blocks };
  });
}
