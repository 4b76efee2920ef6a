// Section properties of thin steel tubes: round, or regular multisided (n flat sides).
// All inputs and outputs in SI. Each call also returns the calculation steps so the
// package can print the formula with the substituted values.
import { qty, type CalcStep } from '../calc/step.ts';
import { StepCollector } from '../calc/step.ts';

export type TubeShape = 'round' | 'multisided';

export interface TubeProperties {
  readonly shape: TubeShape;
  /** Number of flat sides for multisided, null for round. */
  readonly sides: number | null;
  /** Outside diameter; across the flats for multisided. */
  readonly D_m: number;
  readonly t_m: number;
  readonly A_m2: number;
  /** Second moment of area, the same about every centroidal axis (round and regular polygon). */
  readonly I_m4: number;
  /** Saint-Venant torsion constant. */
  readonly J_m4: number;
  /** Distance from the centre to the extreme fibre: D/2, or the corner (D/2)/cos(pi/n). */
  readonly c_m: number;
  /** Elastic section modulus I / c. */
  readonly S_m3: number;
  /** Plastic section modulus (for a multisided tube, the smaller of bending toward a flat and toward a corner). */
  readonly Z_m3: number;
  /** Radius of gyration √(I/A). */
  readonly r_m: number;
  /** Shear area for transverse shear in either direction. */
  readonly shearArea_m2: number;
  /** Outside perimeter (surface area per length, for ice). */
  readonly perimeter_m: number;
  readonly steps: readonly CalcStep[];
}

const SHEAR_AREA_SOURCE =
  'common practice: shear area A/2 of a thin closed tube (Cowper 1966, J. Appl. Mech. 33:335, gives k = 2(1+ν)/(4+3ν) ≈ 0.53 for a thin round tube, from memory)';

function checkWall(D_m: number, t_m: number): void {
  if (!(D_m > 0) || !(t_m > 0) || !(2 * t_m < D_m)) {
    throw new RangeError(`tube needs 0 < 2t < D; got D = ${D_m} m, t = ${t_m} m`);
  }
}

/**
 * The properties with their calculation steps made only when read: a build makes the section at
 * every station of every member and prints the steps of a few. The steps come from the same
 * function run again with a collector, so they cannot differ from the values.
 */
function withLazySteps(values: Omit<TubeProperties, 'steps'>, collect: (c: StepCollector) => void): TubeProperties {
  let steps: readonly CalcStep[] | undefined;
  return {
    ...values,
    get steps(): readonly CalcStep[] {
      if (steps === undefined) {
        const c = new StepCollector();
        collect(c);
        steps = c.steps;
      }
      return steps;
    },
  };
}

/** Round tube: exact annulus formulas. */
export function roundTube(D_m: number, t_m: number): TubeProperties {
  checkWall(D_m, t_m);
  return withLazySteps(roundValues(D_m, t_m), (c) => roundValues(D_m, t_m, c));
}

function roundValues(D_m: number, t_m: number, c?: StepCollector): Omit<TubeProperties, 'steps'> {
  const src = 'geometry of the annulus (exact)';
  const d = D_m - 2 * t_m;
  c?.add({ description: 'Inside diameter', symbol: 'd', formula: 'd = D − 2t', substituted: [qty(D_m, 'section'), ' − 2 × ', qty(t_m, 'section')], result: qty(d, 'section'), source: src });
  const A = (Math.PI / 4) * (D_m ** 2 - d ** 2);
  c?.add({ description: 'Steel area', symbol: 'A', formula: 'A = π/4 (D² − d²)', substituted: ['π/4 × ((', qty(D_m, 'section'), ')² − (', qty(d, 'section'), ')²)'], result: qty(A, 'sectionArea'), source: src });
  const I = (Math.PI / 64) * (D_m ** 4 - d ** 4);
  c?.add({ description: 'Moment of inertia', symbol: 'I', formula: 'I = π/64 (D⁴ − d⁴)', substituted: ['π/64 × ((', qty(D_m, 'section'), ')⁴ − (', qty(d, 'section'), ')⁴)'], result: qty(I, 'inertia'), source: src });
  const J = 2 * I;
  c?.add({ description: 'Torsion constant (polar moment of a circular tube)', symbol: 'J', formula: 'J = 2 I', substituted: ['2 × ', qty(I, 'inertia')], result: qty(J, 'inertia'), source: src });
  const cm = D_m / 2;
  c?.add({ description: 'Extreme fibre distance', symbol: 'c', formula: 'c = D/2', substituted: [qty(D_m, 'section'), ' / 2'], result: qty(cm, 'section'), source: src });
  const S = I / cm;
  c?.add({ description: 'Section modulus', symbol: 'S', formula: 'S = 2I/D', substituted: ['2 × ', qty(I, 'inertia'), ' / ', qty(D_m, 'section')], result: qty(S, 'modulus'), source: src });
  const Z = (D_m ** 3 - d ** 3) / 6;
  c?.add({ description: 'Plastic section modulus', symbol: 'Z', formula: 'Z = (D³ − d³) / 6', substituted: ['((', qty(D_m, 'section'), ')³ − (', qty(d, 'section'), ')³) / 6'], result: qty(Z, 'modulus'), source: src });
  const r = Math.sqrt(I / A);
  c?.add({ description: 'Radius of gyration', symbol: 'r', formula: 'r = √(I / A)', substituted: ['√(', qty(I, 'inertia'), ' / ', qty(A, 'sectionArea'), ')'], result: qty(r, 'section'), source: 'definition' });
  const Av = A / 2;
  c?.add({ description: 'Shear area', symbol: 'Av', formula: 'Av = A/2', substituted: [qty(A, 'sectionArea'), ' / 2'], result: qty(Av, 'sectionArea'), source: SHEAR_AREA_SOURCE });
  return { shape: 'round', sides: null, D_m, t_m, A_m2: A, I_m4: I, J_m4: J, c_m: cm, S_m3: S, Z_m3: Z, r_m: r, shearArea_m2: Av, perimeter_m: Math.PI * D_m };
}

/** Regular n-sided tube, D across the flats outside, thin-walled formulas on the mid-wall line. */
export function multisidedTube(sides: number, D_m: number, t_m: number): TubeProperties {
  checkWall(D_m, t_m);
  if (!Number.isInteger(sides) || sides < 3) throw new RangeError(`a multisided tube needs an integer number of sides >= 3; got ${sides}`);
  return withLazySteps(multisidedValues(sides, D_m, t_m), (c) => multisidedValues(sides, D_m, t_m, c));
}

function multisidedValues(n: number, D_m: number, t_m: number, c?: StepCollector): Omit<TubeProperties, 'steps'> {
  const src = 'thin-walled regular polygon: sum of n flat plates on the mid-wall line';
  const tanPn = Math.tan(Math.PI / n);
  const Dm = D_m - t_m;
  c?.add({ description: 'Mid-wall flat-to-flat width', symbol: 'Dm', formula: 'Dm = D − t', substituted: [qty(D_m, 'section'), ' − ', qty(t_m, 'section')], result: qty(Dm, 'section'), source: src });
  const b = Dm * tanPn;
  c?.add({ description: `Mid-wall side width (${n} sides)`, symbol: 'b', formula: 'b = Dm tan(π/n)', substituted: [qty(Dm, 'section'), ` × tan(π/${n})`], result: qty(b, 'section'), source: src });
  const A = n * b * t_m;
  c?.add({ description: 'Steel area', symbol: 'A', formula: 'A = n b t', substituted: [`${n} × `, qty(b, 'section'), ' × ', qty(t_m, 'section')], result: qty(A, 'sectionArea'), source: src });
  const I = n * b * t_m * (Dm ** 2 / 8 + b ** 2 / 24);
  c?.add({ description: 'Moment of inertia (any centroidal axis)', symbol: 'I', formula: 'I = n b t (Dm²/8 + b²/24)', substituted: [`${n} × `, qty(b, 'section'), ' × ', qty(t_m, 'section'), ' × ((', qty(Dm, 'section'), ')²/8 + (', qty(b, 'section'), ')²/24)'], result: qty(I, 'inertia'), source: src });
  const J = (n * b * Dm ** 2 * t_m) / 4;
  c?.add({ description: 'Torsion constant (Bredt, thin closed section: 4 A0² t / perimeter)', symbol: 'J', formula: 'J = n b Dm² t / 4', substituted: [`${n} × `, qty(b, 'section'), ' × (', qty(Dm, 'section'), ')² × ', qty(t_m, 'section'), ' / 4'], result: qty(J, 'inertia'), source: 'Bredt thin-walled closed-section torsion, J = 4 A0² t / s (e.g. Roark, Formulas for Stress and Strain, torsion of thin-walled closed sections; from memory)' });
  const cm = D_m / 2 / Math.cos(Math.PI / n);
  c?.add({ description: 'Extreme fibre distance (outside corner)', symbol: 'c', formula: 'c = (D/2) / cos(π/n)', substituted: ['(', qty(D_m, 'section'), `/2) / cos(π/${n})`], result: qty(cm, 'section'), source: 'geometry of the regular polygon' });
  const S = I / cm;
  c?.add({ description: 'Section modulus at the corner', symbol: 'S', formula: 'S = I / c', substituted: [qty(I, 'inertia'), ' / ', qty(cm, 'section')], result: qty(S, 'modulus'), source: 'definition' });
  const Z = Math.min(polygonPlasticModulus(n, Dm, t_m, 0), polygonPlasticModulus(n, Dm, t_m, Math.PI / n));
  c?.add({ description: 'Plastic section modulus (smaller of bending toward a flat and toward a corner)', symbol: 'Z', formula: 'Z = Σ t ∫ |y| ds over the n flats on the mid-wall line', substituted: [`${n} flats of `, qty(b, 'section'), ' × ', qty(t_m, 'section'), ' at Dm = ', qty(Dm, 'section')], result: qty(Z, 'modulus'), source: src });
  const r = Math.sqrt(I / A);
  c?.add({ description: 'Radius of gyration', symbol: 'r', formula: 'r = √(I / A)', substituted: ['√(', qty(I, 'inertia'), ' / ', qty(A, 'sectionArea'), ')'], result: qty(r, 'section'), source: 'definition' });
  const Av = A / 2;
  c?.add({ description: 'Shear area', symbol: 'Av', formula: 'Av = A/2', substituted: [qty(A, 'sectionArea'), ' / 2'], result: qty(Av, 'sectionArea'), source: SHEAR_AREA_SOURCE });
  return { shape: 'multisided', sides: n, D_m, t_m, A_m2: A, I_m4: I, J_m4: J, c_m: cm, S_m3: S, Z_m3: Z, r_m: r, shearArea_m2: Av, perimeter_m: n * D_m * tanPn };
}

/**
 * Plastic modulus of a thin regular polygon (mid-wall flat-to-flat Dm, wall t) about a
 * centroidal axis: t × Σ ∫|y| ds along each flat, y measured from the axis. rot = 0 puts the
 * axis parallel to a pair of flats; rot = π/n through a pair of corners.
 */
export function polygonPlasticModulus(n: number, Dm_m: number, t_m: number, rot: number): number {
  const R = Dm_m / 2 / Math.cos(Math.PI / n);
  let sum = 0;
  for (let k = 0; k < n; k++) {
    const a1 = rot + Math.PI / n + (2 * Math.PI * k) / n;
    const a2 = a1 + (2 * Math.PI) / n;
    const y1 = R * Math.sin(a1);
    const y2 = R * Math.sin(a2);
    const len = Math.hypot(R * Math.cos(a2) - R * Math.cos(a1), y2 - y1);
    // ∫|y| ds of a straight flat with y linear from y1 to y2.
    const absInt = y1 * y2 >= 0 ? (Math.abs(y1 + y2) / 2) * len : ((y1 * y1 + y2 * y2) / (2 * Math.abs(y2 - y1))) * len;
    sum += absInt;
  }
  return t_m * sum;
}

/** Properties of a round or multisided tube of outside diameter D (across flats) and wall t. */
export function tubeProperties(shape: TubeShape, sides: number | null, D_m: number, t_m: number): TubeProperties {
  if (shape === 'round') return roundTube(D_m, t_m);
  if (sides === null) throw new RangeError('a multisided tube needs its number of sides');
  return multisidedTube(sides, D_m, t_m);
}
