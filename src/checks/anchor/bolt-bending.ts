// Bending of an anchor bolt over a clear stand-off between the leveling nut and the concrete.
// The bolt is taken as held against rotation at both ends (the leveling nut under a stiff plate,
// and the concrete), so the shear per bolt bends it in double curvature, M = V_b ℓ/2, and the
// largest stress on the stress-area section is F_b/At + M/S. A first-yield check, from memory.
import { qty, type StepCollector } from '../../calc/step.ts';
import type { AnchorBolts } from '../../design/design.ts';
import type { BoltAreas } from './bolt-resistance.ts';

export const BOLT_BENDING_SOURCE = 'double-nut base with a clear stand-off: bolt fixed at the leveling nut and at the concrete, M = V_b ℓ/2, f = F_b/At + M/S ≤ φ Fy (from memory, verify against the governing code)';

/** Bending is checked only over a stand-off of more than one bolt diameter (from memory, verify). */
export const bendingApplies = (b: AnchorBolts): boolean => b.standOff_m > b.boltDiameter_m;

export interface BoltBending {
  readonly M_Nm: number;
  readonly S_m3: number;
  readonly stress_Pa: number;
}

export function boltBending(b: AnchorBolts, a: BoltAreas, Fb_N: number, Vb_N: number, c?: StepCollector): BoltBending {
  const l = b.standOff_m;
  const M_Nm = (Vb_N * l) / 2;
  const de = Math.sqrt((4 * a.At_m2) / Math.PI);
  const S_m3 = (Math.PI * de ** 3) / 32;
  const stress_Pa = Fb_N / a.At_m2 + M_Nm / S_m3;
  if (c) {
    c.add({ description: 'Bending moment in a bolt over the stand-off, double curvature', symbol: 'M_b', formula: 'M_b = V_b ℓ / 2', substituted: [qty(Vb_N, 'force'), ' × ', qty(l, 'section'), ' / 2'], result: qty(M_Nm, 'moment'), source: BOLT_BENDING_SOURCE });
    c.add({ description: 'Diameter of the stress area', symbol: 'd_e', formula: 'd_e = √(4 At / π)', substituted: ['√(4 × ', qty(a.At_m2, 'sectionArea'), ' / π)'], result: qty(de, 'section'), source: 'geometry' });
    c.add({ description: 'Elastic section modulus of the bolt on the stress area', symbol: 'S', formula: 'S = π d_e³ / 32', substituted: ['π × (', qty(de, 'section'), ')³ / 32'], result: qty(S_m3, 'modulus'), source: 'geometry' });
    c.add({ description: 'Largest stress in the bolt, axial force and bending', symbol: 'f', formula: 'f = F_b/At + M_b/S', substituted: [qty(Fb_N, 'force'), ' / ', qty(a.At_m2, 'sectionArea'), ' + ', qty(M_Nm, 'moment'), ' / ', qty(S_m3, 'modulus')], result: qty(stress_Pa, 'stress'), source: BOLT_BENDING_SOURCE });
  }
  return { M_Nm, S_m3, stress_Pa };
}
