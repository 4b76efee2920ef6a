// Evidence for the package that the segment count has converged: for each member taken
// as a cantilever from its root, the tip deflection under a tip load for the chain of
// prismatic segments of the frame model, against the continuous taper.
//   chain (exact for prismatic pieces): δ = Σ P [(L − s_k)³ − (L − s_k+1)³] / (3 E I_k)
//   continuous (unit-load integral):    δ = ∫ P (L − s)² / (E I(s)) ds
// Both are Euler-Bernoulli; only the segment idealisation differs.
import { qty, StepCollector, type CalcStep } from '../calc/step.ts';
import type { Design } from '../design/design.ts';
import type { FrameModel } from './frame.ts';
import { memberAxes } from './member-axes.ts';
import { sectionAt } from './taper.ts';

export interface MemberConvergence {
  readonly member: string;
  readonly elements: number;
  /** Tip deflection per unit tip load (m/N) of the chain and of the continuous taper. */
  readonly chainFlexibility_mPerN: number;
  readonly continuousFlexibility_mPerN: number;
  /** chain / continuous − 1. */
  readonly relativeDifference: number;
}

// Gauss-Legendre 4-point rule on [-1, 1] (Abramowitz & Stegun, Table 25.4).
const G4: readonly (readonly [number, number])[] = [
  [-0.8611363115940526, 0.3478548451374538],
  [-0.3399810435848563, 0.6521451548625461],
  [0.3399810435848563, 0.6521451548625461],
  [0.8611363115940526, 0.3478548451374538],
];

/** Panels of the composite rule: the integrand is smooth, 400 panels give about 1e-12. */
const PANELS = 400;

export function segmentConvergence(design: Design, model: FrameModel): { readonly members: readonly MemberConvergence[]; readonly steps: readonly CalcStep[] } {
  const steps = new StepCollector();
  const E = design.material.E_Pa;
  const members: MemberConvergence[] = [];
  for (const ax of memberAxes(design)) {
    const info = model.members.find((m) => m.id === ax.id);
    if (!info) throw new RangeError(`member ${ax.id} is missing from the frame model`);
    const L = ax.length_m;
    let chain = 0;
    for (const id of info.elements) {
      const e = model.elements[id];
      chain += ((L - e.sI_m) ** 3 - (L - e.sJ_m) ** 3) / (3 * E * e.Iz_m4);
    }
    let cont = 0;
    const h = L / PANELS;
    for (let k = 0; k < PANELS; k++) {
      const mid = (k + 0.5) * h;
      for (const [x, w] of G4) {
        const s = mid + (x * h) / 2;
        cont += (w * h * (L - s) ** 2) / (2 * E * sectionAt(ax.section, L, s).I_m4);
      }
    }
    const rel = chain / cont - 1;
    members.push({ member: ax.id, elements: info.elements.length, chainFlexibility_mPerN: chain, continuousFlexibility_mPerN: cont, relativeDifference: rel });
    const name = ax.kind === 'pole' ? 'pole' : `arm ${ax.id}`;
    steps.add({
      description: `Segment convergence, ${name}: tip deflection under a tip load, ${info.elements.length} prismatic segments against the continuous taper`,
      symbol: `ε_${ax.id}`,
      formula: 'ε = δ_segments / δ_taper − 1',
      substituted: [`${chain.toExponential(5)} / ${cont.toExponential(5)} − 1 (m/N)`],
      result: qty(rel, 'ratio'),
      source: 'unit-load integral of M m / EI along the member (Euler-Bernoulli), exact per prismatic segment',
    });
  }
  return { members, steps: steps.steps };
}
