// A load scaled by a factor, e.g. to print a combination's loads as applied.
import type { AppliedLoad } from './load-types.ts';

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
