// Every default polebook takes when the input leaves a value out, defined once, each with
// its source. The schema's descriptions, the normaliser and Design.assumptions all read
// this table, so the package can print what was assumed and why.
import type { Dim } from '../units/units.ts';

export interface DefaultDef {
  /** Input key path, as printed in the assumptions table. */
  readonly key: string;
  readonly label: string;
  /** The default as it would be typed in the input (a quantity with its unit, or a plain value). */
  readonly value: string | number | boolean;
  /** Dimension of a quantity default; absent for plain numbers, booleans and text. */
  readonly dim?: Dim;
  readonly source: string;
}

const VERIFY = 'verify against the governing code';
const LTS_MEMORY = 'default from memory of AASHTO LRFD Specifications for Structural Supports for Highway Signs, Luminaires, and Traffic Signals (LRFD-LTS)';

export const DEFAULTS = {
  materialE: {
    key: 'structure.material.E',
    label: 'Modulus of elasticity of steel, E',
    value: '29000 ksi',
    dim: 'stress',
    source: `AISC 360 value for structural steel (E = 29,000 ksi), from memory; typical value, ${VERIFY}`,
  },
  materialG: {
    key: 'structure.material.G',
    label: 'Shear modulus of steel, G',
    value: '11200 ksi',
    dim: 'stress',
    source: `AISC 360 value for structural steel (G = 11,200 ksi), from memory; typical value, ${VERIFY}`,
  },
  materialFy: {
    key: 'structure.material.yieldStrength',
    label: 'Minimum yield strength of the tube steel, Fy',
    value: '50 ksi',
    dim: 'stress',
    source: 'typical value (ASTM A572 Grade 50 plate formed into tubes, from memory); verify against the steel specified on the drawings',
  },
  materialDensity: {
    key: 'structure.material.density',
    label: 'Density of steel',
    value: '490 pcf',
    dim: 'density',
    source: 'common practice (unit weight of steel 490 lb/ft3 as tabulated in the AISC Steel Construction Manual, from memory)',
  },
  baseFixity: {
    key: 'structure.pole.base.fixity',
    label: 'Pole base restraint',
    value: 'fixed',
    source: `common practice (base plate on anchor bolts taken as fully fixed); ${VERIFY} and the foundation design`,
  },
  armRise: {
    key: 'structure.arms[].rise',
    label: 'Arm rise angle above horizontal',
    value: '0 deg',
    dim: 'angle',
    source: 'polebook default: a horizontal arm when no rise is given',
  },
  armTipDeflection: {
    key: 'criteria.armTipDeflectionLimit',
    label: 'Arm tip deflection limit (service), as a fraction of arm length',
    value: 'L/100',
    dim: 'ratio',
    source: `typical value (${LTS_MEMORY}, deflection provisions), ${VERIFY}`,
  },
  poleTopDeflection: {
    key: 'criteria.poleTopDeflectionLimit',
    label: 'Pole top horizontal deflection limit (service), as a fraction of pole height',
    value: 'L/40',
    dim: 'ratio',
    source: `typical value (2.5 percent of the height, ${LTS_MEMORY}, deflection provisions), ${VERIFY}`,
  },
  serviceWindFactor: {
    key: 'criteria.serviceWindFactor',
    label: 'Factor on the design wind pressures for the service (deflection) combination',
    value: 1.0,
    source: `typical value, ${VERIFY} (a service wind of a shorter return period gives a factor below 1)`,
  },
  phiFlexure: {
    key: 'criteria.resistanceFactors.flexure',
    label: 'Resistance factor, flexure',
    value: 0.9,
    source: `${LTS_MEMORY}, steel members; ${VERIFY}`,
  },
  phiShear: {
    key: 'criteria.resistanceFactors.shear',
    label: 'Resistance factor, shear',
    value: 0.9,
    source: `${LTS_MEMORY}, steel members; ${VERIFY}`,
  },
  phiTorsion: {
    key: 'criteria.resistanceFactors.torsion',
    label: 'Resistance factor, torsion',
    value: 0.95,
    source: `${LTS_MEMORY}, steel members; ${VERIFY}`,
  },
  phiAxial: {
    key: 'criteria.resistanceFactors.axial',
    label: 'Resistance factor, axial compression',
    value: 0.9,
    source: `${LTS_MEMORY}, steel members; ${VERIFY}`,
  },
  phiBoltTension: {
    key: 'criteria.resistanceFactors.boltTension',
    label: 'Resistance factor, anchor bolt tension',
    value: 0.75,
    source: `typical value (anchor rod steel, from memory), ${VERIFY}`,
  },
  phiBoltShear: {
    key: 'criteria.resistanceFactors.boltShear',
    label: 'Resistance factor, anchor bolt shear',
    value: 0.75,
    source: `typical value (anchor rod steel, from memory), ${VERIFY}`,
  },
  iceWeight: {
    key: 'loads.ice.weightPerArea',
    label: 'Ice load per surface area',
    value: '3 psf',
    dim: 'pressure',
    source: `${LTS_MEMORY} (3 psf on all surfaces, one face of sign panels); ${VERIFY}`,
  },
  fatigueImportance: {
    key: 'loads.fatigue.importance',
    label: 'Fatigue importance factor',
    value: 1.0,
    source: `typical value (most critical fatigue category, ${LTS_MEMORY}), ${VERIFY}`,
  },
  windAuto: {
    key: 'loads.wind.directions.auto',
    label: 'Wind directions found from the geometry (normals to the panel faces and to the main arm, both ways; along the main arm)',
    value: true,
    source: 'polebook default (the input may add plan angles)',
  },
  segments: {
    key: 'analysis.segmentsPerMember',
    label: 'Prismatic segments per tapered member',
    value: 20,
    source: 'polebook default: with 20 segments the tip deflection of tapered cantilevers is within 0.5 percent of the continuous taper (segment convergence study in tests/model); the package shows the convergence',
  },
  secondOrder: {
    key: 'analysis.secondOrder',
    label: 'Second-order (P-delta) analysis',
    value: true,
    source: 'common practice',
  },
  pDeltaTolerance: {
    key: 'analysis.pDeltaTolerance',
    label: 'P-delta convergence tolerance (relative change of displacements)',
    value: 1e-6,
    source: 'common practice',
  },
  pDeltaMaxIterations: {
    key: 'analysis.pDeltaMaxIterations',
    label: 'P-delta iteration cap',
    value: 50,
    source: 'common practice',
  },
  stationSpacing: {
    key: 'analysis.stationSpacing',
    label: 'Regular spacing of result stations along members',
    value: '1 ft',
    dim: 'length',
    source: 'common practice (stations are added at every discontinuity as well)',
  },
} as const satisfies Record<string, DefaultDef>;

export type DefaultName = keyof typeof DEFAULTS;

/** "default: 29000 ksi (source)" for the JSON Schema description of a key. */
export function defaultNote(name: DefaultName): string {
  const d: DefaultDef = DEFAULTS[name];
  return `Default: ${String(d.value)} (${d.source})`;
}

export const COMBINATION_SOURCE = `default, ${VERIFY}; factors from memory of AASHTO LRFD-LTS Table 3.4.1-1 (load combinations and load factors)`;
