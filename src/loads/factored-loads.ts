// The loads of a combination as applied: each case's loads scaled by its factor.
import type { AppliedLoad, Combination, LoadCase } from './load-types.ts';

export function scaleLoad(load: AppliedLoad, factor: number): AppliedLoad {
  switch (load.kind) {
    case 'nodal':
      return { ...load, F_N: [load.F_N[0] * factor, load.F_N[1] * factor, load.F_N[2] * factor], M_Nm: [load.M_Nm[0] * factor, load.M_Nm[1] * factor, load.M_Nm[2] * factor] };
    case 'distributed':
      return { ...load, wA_Npm: load.wA_Npm * factor, wB_Npm: load.wB_Npm * factor };
    case 'point-force':
    case 'point-moment':
      return { ...load, value: load.value * factor };
  }
}

export function factoredLoads(cases: readonly LoadCase[], combo: Combination): AppliedLoad[] {
  const out: AppliedLoad[] = [];
  for (const { caseId, factor } of combo.factors) {
    const c = cases.find((x) => x.id === caseId);
    if (!c) throw new Error(`combination ${combo.id} names a missing load case ${caseId}`);
    for (const load of c.loads) out.push(scaleLoad(load, factor));
  }
  return out;
}
