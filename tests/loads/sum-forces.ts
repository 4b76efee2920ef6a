// Independent sum of the force vectors of a list of global-axes loads (test helper; it does
// not use src/loads/load-resultant.ts): distributed (wA + wB)/2 × (b − a) along the
// direction, point forces value × direction.
import type { AppliedLoad } from '../../src/loads/load-types.ts';

export function sumForces(loads: readonly AppliedLoad[]): [number, number, number] {
  const s: [number, number, number] = [0, 0, 0];
  for (const l of loads) {
    if (l.kind === 'nodal') {
      for (let k = 0; k < 3; k++) s[k] += l.F_N[k];
    } else if (l.kind === 'distributed' || l.kind === 'point-force') {
      if (l.axes !== 'global') throw new Error('test helper handles global loads only');
      const mag = l.kind === 'distributed' ? ((l.wA_Npm + l.wB_Npm) / 2) * (l.b_m - l.a_m) : l.value;
      for (let k = 0; k < 3; k++) s[k] += mag * l.direction[k];
    }
  }
  return s;
}
