// The largest magnitude an input quantity of each kind can have on any pole-and-arm support.
// These are not design limits: they lie far beyond every real structure (a 1000 m pole, a 10 m
// tube, a 100 kPa wind pressure), so a value past one is a slip of digits or units, and it is
// refused at its key before it can overflow the arithmetic (a 1e300 ft offset gave Infinity
// moments; a 1e9 ft pole asked for a billion result stations). polebook limits, not code limits.
import type { Dim } from '../units/units.ts';

export const PHYSICAL_LIMIT_SI: Readonly<Record<Dim, number>> = {
  length: 1000, // m: heights, arm lengths, positions, offsets, station spacing
  section: 10, // m: tube diameters, walls, bolt circles
  area: 1000, // m2: projected area of one point attachment
  force: 1e8, // N
  weight: 1e7, // N: about 1000 t for one attachment
  moment: 1e9, // N*m
  pressure: 1e5, // Pa: 100 kPa (about 2090 psf), beyond any wind pressure or weight per area
  stress: 1e12, // Pa: five times the modulus of steel
  density: 1e5, // kg/m3: over four times the densest metal
  unitWeight: 1e6, // N/m3: the same, times g
  lineLoad: 1e8, // N/m
  rotStiffness: 1e13, // N*m/rad: stiffer than the pole itself by orders of magnitude
  angle: Infinity, // rad: any finite angle is a direction
  taper: 1, // m/m: a diameter change of 1 m per m of length
  speed: 1000, // m/s
  frequency: 1e6, // Hz
  sectionArea: 100, // m2
  inertia: 1e3, // m4
  modulus: 1e3, // m3
  mass: 1e6, // kg
  ratio: 1e6,
};

/** The smallest magnitude, for the few kinds where a tiny positive value is as impossible as a
 * huge one: a tube lighter than water is no metal (and a weightless tube beside a heavy
 * attachment leaves the natural modes without a solution). polebook limits. */
export const PHYSICAL_FLOOR_SI: Readonly<Partial<Record<Dim, number>>> = {
  density: 1000, // kg/m3: water; steel is about 7850, aluminium about 2700
};
