// CalculiX's beam section for a tube (*BEAM SECTION, SECTION=PIPE) is given by outer radius
// and wall thickness. A frame element carries A, I and J instead; for a round annulus
// A = pi (R^2 - Ri^2) and I = pi/4 (R^4 - Ri^4) = A/4 (R^2 + Ri^2) (area and second moment of an
// annulus, any strength-of-materials text), so R and Ri follow exactly from A and I. The annulus
// also fixes J = 2 I (polar moment of a circular tube): an element whose Iy, Iz, J do not fit one
// annulus cannot be represented by this section, and we say so instead of approximating.

export interface PipeSection {
  readonly outerRadius_m: number;
  readonly thickness_m: number;
}

/** Relative mismatch allowed between Iy, Iz and J/2 before the element is refused. */
const ANNULUS_MATCH_TOLERANCE = 1e-9;

export function pipeFromSection(A_m2: number, Iy_m4: number, Iz_m4: number, J_m4: number): PipeSection {
  const I = Iy_m4;
  const rel = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b));
  if (rel(Iy_m4, Iz_m4) > ANNULUS_MATCH_TOLERANCE || rel(J_m4, 2 * I) > ANNULUS_MATCH_TOLERANCE) {
    throw new Error(
      `CalculiX harness: section A=${A_m2}, Iy=${Iy_m4}, Iz=${Iz_m4}, J=${J_m4} is not a round annulus ` +
        '(needs Iy = Iz and J = 2 I); only round tubes are represented',
    );
  }
  const sumSq = (4 * I) / A_m2; // R^2 + Ri^2
  const diffSq = A_m2 / Math.PI; // R^2 - Ri^2
  const innerSq = (sumSq - diffSq) / 2;
  if (!(A_m2 > 0) || !(I > 0) || innerSq < 0) {
    throw new Error(`CalculiX harness: no annulus has A=${A_m2} and I=${I}`);
  }
  const outer = Math.sqrt((sumSq + diffSq) / 2);
  return { outerRadius_m: outer, thickness_m: outer - Math.sqrt(innerSq) };
}

/** Exact annulus properties from diameter and wall, for building test models. */
export function roundTubeSection(outerDiameter_m: number, wall_m: number): { A_m2: number; I_m4: number; J_m4: number } {
  const R = outerDiameter_m / 2;
  const Ri = R - wall_m;
  const A_m2 = Math.PI * (R * R - Ri * Ri);
  const I_m4 = (Math.PI / 4) * (R ** 4 - Ri ** 4);
  return { A_m2, I_m4, J_m4: 2 * I_m4 };
}

/**
 * A pipe for a tube whose torsion constant is not 2 I, e.g. a multisided (polygonal) tube: the
 * annulus with the same A and I, and the factor J / (2 I) by which the member's shear modulus is
 * scaled so that ccx's torsional stiffness G' J_pipe = G' 2 I equals the member's G J. The material
 * is orthotropic with axis 1 along the member, and torsion of a tube strains only the 1-2 and 1-3
 * shear planes, the same moduli that carry transverse shear: so the one side effect is that the
 * shear deformation (which Euler-Bernoulli leaves out, a few tenths of a percent of the bending
 * deflection) changes by the same factor, e.g. 1/0.977 for a 12-sided tube. Iy must still equal Iz.
 */
export function pipeWithTorsionFactor(
  A_m2: number,
  Iy_m4: number,
  Iz_m4: number,
  J_m4: number,
): { pipe: PipeSection; shearModulusFactor: number } {
  const shearModulusFactor = J_m4 / (2 * Iy_m4);
  if (!(shearModulusFactor > 0) || !Number.isFinite(shearModulusFactor)) {
    throw new Error(`CalculiX harness: torsion constant J=${J_m4} cannot be matched`);
  }
  return { pipe: pipeFromSection(A_m2, Iy_m4, Iz_m4, 2 * Iy_m4), shearModulusFactor };
}
