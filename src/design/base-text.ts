// The base restraint in words, for the terminal summary and the package; fmt prints a rotational
// stiffness in the user's units.
import type { BaseFixity } from './design.ts';

export function baseText(base: BaseFixity, fmt: (k: number) => string): string {
  if (base.kind === 'fixed') return 'fixed';
  const ky = base.stiffnessY_Nm_per_rad;
  const bending = ky === undefined ? `rotational spring ${fmt(base.stiffness_Nm_per_rad)}` : `rotational springs ${fmt(base.stiffness_Nm_per_rad)} about X, ${fmt(ky)} about Y`;
  return `${bending}, ${base.torsion_Nm_per_rad === undefined ? 'fixed in torsion' : `torsion ${fmt(base.torsion_Nm_per_rad)}`}`;
}
