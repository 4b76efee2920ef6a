// A combination's loads as plain AppliedLoads: polebook hands them over as (load, factor) pairs
// (combinedLoads in src/analysis/analyze.ts); the harness writes each load times its factor.
import type { AppliedLoad } from '../../../src/loads/load-types.ts';
import type { Vec3 } from '../../../src/model/frame.ts';

const times = (v: Vec3, k: number): Vec3 => [v[0] * k, v[1] * k, v[2] * k];

export function applyFactors(loads: readonly { readonly load: AppliedLoad; readonly factor: number }[]): AppliedLoad[] {
  return loads.map(({ load, factor }): AppliedLoad => {
    switch (load.kind) {
      case 'nodal':
        return { ...load, F_N: times(load.F_N, factor), M_Nm: times(load.M_Nm, factor) };
      case 'distributed':
        return { ...load, wA_Npm: load.wA_Npm * factor, wB_Npm: load.wB_Npm * factor };
      default:
        return { ...load, value: load.value * factor };
    }
  });
}
