// Values that are round-off of the solution (a few units in the last digits of the largest
// value they are computed with) print as 0, not as "3.4e-13 kip". The threshold is stated
// here once; the tables that use it say so in their notes.
import type { Qty } from '../../calc/step.ts';
import type { Dim } from '../../units/units.ts';
import type { Block, DocSection } from '../document.ts';

/** A value at or below this fraction of its reference scale is round-off. */
export const ROUND_OFF = 1e-9;

export function withoutRoundOff(v: number, scale: number): number {
  return Math.abs(v) <= ROUND_OFF * Math.abs(scale) ? 0 : v;
}

/**
 * Every quantity of a calculation step that is round-off next to the largest quantity of the
 * same kind in its section (at or below ROUND_OFF of it) becomes 0, so steps print "0 in", not
 * "3.4e-13 in". Tables apply withoutRoundOff with their own scales.
 */
export function cleanRoundOff(sections: readonly DocSection[]): DocSection[] {
  return sections.map((sec) => {
    const scale = new Map<Dim, number>();
    const see = (q: Qty) => scale.set(q.dim, Math.max(scale.get(q.dim) ?? 0, Math.abs(q.si)));
    for (const b of sec.blocks) {
      if (b.kind !== 'step') continue;
      see(b.step.result);
      for (const p of b.step.substituted) if (typeof p !== 'string') see(p);
    }
    const clean = (q: Qty): Qty => (q.si !== 0 && Math.abs(q.si) <= ROUND_OFF * (scale.get(q.dim) ?? 0) ? { si: 0, dim: q.dim } : q);
    const blocks: Block[] = sec.blocks.map((b) =>
      b.kind !== 'step' ? b : { kind: 'step', step: { ...b.step, result: clean(b.step.result), substituted: b.step.substituted.map((p) => (typeof p === 'string' ? p : clean(p))) } },
    );
    return { ...sec, blocks };
  });
}
