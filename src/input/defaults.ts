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
  /** The round SI value taken for an input in SI units, with its own source (not the US number converted). */
  readonly si?: { readonly value: string; readonly source: string };
}

const VERIFY = 'verify against the governing code';
const LTS_MEMORY = 'default from memory of AASHTO LRFD Specifications for Structural Supports for Highway Signs, Luminaires, and Traffic Signals (LRFD-LTS)';

export const DEFAULTS = {
  materialE: {
    key: 'structure.material.E',
    label: 'Modulus of elasticity of steel, E',
    value: '29000 ksi',
    si: { value: '200000 MPa', source: `EN 1993-1-1 value for structural steel (E = 200 000 MPa), from memory; typical value, ${VERIFY}` },
    dim: 'stress',
    source: `AISC 360 value for structural steel (E = 29,000 ksi), from memory; typical value, ${VERIFY}`,
  },
  materialG: {
    key: 'structure.material.G',
    label: 'Shear modulus of steel, G',
    value: '11200 ksi',
    si: { value: '77000 MPa', source: `EN 1993-1-1 value for structural steel (G ≈ 77 000 MPa, rounded E/(2(1 + 0.3))), from memory; typical value, ${VERIFY}` },
    dim: 'stress',
    source: `AISC 360 value for structural steel (G = 11,200 ksi), from memory; typical value, ${VERIFY}`,
  },
  materialFy: {
    key: 'structure.material.yieldStrength',
    label: 'Minimum yield strength of the tube steel, Fy',
    value: '50 ksi',
    dim: 'stress',
    source: 'typical value (ASTM A572 Grade 50 plate formed into tubes, from memory); verify against the steel specified on the drawings',
    si: { value: '355 MPa', source: 'typical value (EN 10025 grade S355 steel, thickness up to 16 mm, from memory); verify against the steel specified on the drawings' },
  },
  materialDensity: {
    key: 'structure.material.density',
    label: 'Density of steel',
    value: '490 pcf',
    si: { value: '7850 kg/m3', source: 'density of steel, 7850 kg/m³ (EN 1991-1-1, from memory); typical value, verify' },
    dim: 'density',
    source: 'common practice (unit weight of steel 490 lb/ft3 as tabulated in the AISC Steel Construction Manual, from memory)',
  },
  baseFixity: {
    key: 'structure.pole.base.fixity',
    label: 'Pole base restraint',
    value: 'fixed',
    source: `common practice (base plate on anchor bolts taken as fully fixed); ${VERIFY} and the foundation design`,
  },
  armLengthFrom: {
    key: 'structure.arms[].lengthFrom',
    label: 'Arm length and the positions on the arm measured from',
    value: 'face',
    source: 'polebook default: from the pole face, where the arm meets the pole; give lengthFrom: axis for drawings dimensioned from the pole centreline',
  },
  armRise: {
    key: 'structure.arms[].rise',
    label: 'Arm rise angle above horizontal',
    value: '0 deg',
    dim: 'angle',
    source: 'polebook default: a horizontal arm when no rise is given',
  },
  // Deflection limits. structure.kind picks the default of each limit (criteria.deflection).
  armTipDeadDeflection: {
    key: 'criteria.deflection.armTipDead',
    label: 'Arm tip vertical deflection under the unfactored dead load, as a fraction of arm length',
    value: 'L/100',
    dim: 'ratio',
    source: `typical value (every structure kind), ${VERIFY}; often set by the owner together with the camber of the arm`,
  },
  armTipServiceDeflection: {
    key: 'criteria.deflection.armTipService',
    label: 'Arm tip horizontal deflection under the service combinations, as a fraction of arm length',
    value: 'L/40',
    dim: 'ratio',
    source: `typical value (every structure kind; the 2.5 percent of the pole-top limit applied to the arm), ${VERIFY}`,
  },
  poleTopServiceDeflectionSignal: {
    key: 'criteria.deflection.poleTopService',
    label: 'Pole top horizontal deflection under the service combinations, as a fraction of pole height (sign and signal supports)',
    value: 'L/40',
    dim: 'ratio',
    source: `from memory: 2.5 percent of the height for sign and traffic-signal supports (${LTS_MEMORY}, deflection provisions); ${VERIFY}`,
  },
  poleTopServiceDeflectionLuminaire: {
    key: 'criteria.deflection.poleTopService',
    label: 'Pole top horizontal deflection under the service combinations, as a fraction of pole height (luminaire poles)',
    value: 0.15,
    dim: 'ratio',
    source: `from memory: 15 percent of the height for luminaire supports (${LTS_MEMORY}, deflection provisions); ${VERIFY}`,
  },
  armTipFatigueDeflection: {
    key: 'criteria.deflection.armTipFatigue',
    label: 'Arm tip vertical deflection under the galloping and truck-gust fatigue loads (sign and signal cantilevers)',
    value: '8 in',
    dim: 'section',
    source: `from memory: 8 in (200 mm) for cantilevered sign and traffic-signal supports (${LTS_MEMORY}, fatigue deflection limit); ${VERIFY}`,
  },
  columnK: {
    key: 'criteria.columnEffectiveLengthFactor',
    label: 'Effective length factor K of the pole (and of each arm) as a free-standing cantilever column',
    value: 2.1,
    source: `from memory: AISC 360 Commentary Table C-A-7.1, case (e) fixed-free, recommended design value 2.1 (theoretical 2.0); ${VERIFY}`,
  },
  vortexThreshold: {
    key: 'criteria.vortex.speedThreshold',
    label: 'Critical vortex-shedding wind speed below which a member is reported as susceptible',
    value: '20 mph',
    dim: 'speed',
    source: `typical value, ${VERIFY}: steady winds below this speed are common enough for lock-in, while the turbulence of stronger winds tends to break up shedding`,
  },
  vortexExemptTaper: {
    key: 'criteria.vortex.exemptTaper',
    label: 'Taper at or above which a member is taken as not susceptible to vortex shedding',
    value: '0.14 in/ft',
    dim: 'taper',
    source: `from memory: members tapered by at least 0.14 in/ft (11.7 mm/m) need not be checked for vortex shedding (${LTS_MEMORY}, fatigue provisions, commentary); ${VERIFY}`,
  },
  strouhalRound: {
    key: 'criteria.vortex.strouhalRound',
    label: 'Strouhal number of a round tube',
    value: 0.18,
    source: 'from memory: St ≈ 0.18 to 0.2 for a circular cylinder over the subcritical range (Blevins, Flow-Induced Vibration, chapter 3); 0.18 as used for poles; verify',
  },
  strouhalMultisided: {
    key: 'criteria.vortex.strouhalMultisided',
    label: 'Strouhal number of a multisided tube',
    value: 0.15,
    source: 'from memory: St about 0.15 for 8- to 16-sided sections (lower than a circle); verify against the governing code',
  },
  boltStandOff: {
    key: 'criteria.anchorBolts.standOff',
    label: 'Clear stand-off of the anchor bolts, bottom of the leveling nut to the top of the concrete',
    value: '0 in',
    dim: 'section',
    source: 'polebook default: the base plate bears on grout or the stand-off is at most one bolt diameter; give standOff for a double-nut base with a clear gap, verify',
  },
  basePlateFy: {
    key: 'criteria.basePlate.yieldStrength',
    label: 'Minimum yield strength of the base plate steel',
    value: '50 ksi',
    dim: 'stress',
    source: 'typical value (ASTM A572 Grade 50 plate, from memory); verify against the steel specified on the drawings',
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
  phiTension: {
    key: 'criteria.resistanceFactors.tension',
    label: 'Resistance factor, axial tension (yielding of the gross section)',
    value: 0.9,
    source: `from memory: AISC 360-16 Section D2, φt = 0.90 for tensile yielding; ${VERIFY}`,
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
  fatigueCategory: {
    key: 'loads.fatigue.category',
    label: 'Fatigue importance category (I most critical, III least); sets the importance factors by structure kind',
    value: 'I',
    source: `typical value (the most critical category, ${LTS_MEMORY}); ${VERIFY}`,
  },
  fatigueMeanWind: {
    key: 'loads.fatigue.meanWindSpeed',
    label: 'Yearly mean wind speed at the site (scales the natural wind gust pressure by (V/11.2 mph)²)',
    value: '11.2 mph',
    dim: 'speed',
    source: `from memory: the natural wind gust pressure is given for a yearly mean wind speed of 11.2 mph (${LTS_MEMORY}, fatigue provisions); ${VERIFY}`,
  },
  gallopingPressure: {
    key: 'loads.fatigue.galloping.pressure',
    label: 'Galloping equivalent static pressure (before the importance factor), vertical, on panels and signal heads seen in elevation',
    value: '21 psf',
    dim: 'pressure',
    source: `from memory: 21 psf × I_F (${LTS_MEMORY}, fatigue provisions); ${VERIFY}`,
  },
  naturalGustPressure: {
    key: 'loads.fatigue.naturalGust.pressure',
    label: 'Natural wind gust equivalent static pressure (before Cd and the importance factor), horizontal, on every exposed area',
    value: '5.2 psf',
    dim: 'pressure',
    source: `from memory: 5.2 Cd I_F psf at a yearly mean wind speed of 11.2 mph (${LTS_MEMORY}, fatigue provisions); ${VERIFY}`,
  },
  truckGustPressure: {
    key: 'loads.fatigue.truckGust.pressure',
    label: 'Truck-induced gust equivalent static pressure (before Cd and the importance factor), vertical, on horizontal projections over the traffic lanes',
    value: '18.8 psf',
    dim: 'pressure',
    source: `from memory: 18.8 Cd I_F psf (${LTS_MEMORY}, fatigue provisions); ${VERIFY}`,
  },
  truckGustFullHeight: {
    key: 'loads.fatigue.truckGust.fullPressureHeight',
    label: 'Height above the road up to which the truck gust pressure acts in full',
    value: '19.7 ft',
    dim: 'length',
    source: `from memory: full pressure up to 19.7 ft (6 m) above the road, reduced linearly above (${LTS_MEMORY}); ${VERIFY}`,
  },
  truckGustZeroHeight: {
    key: 'loads.fatigue.truckGust.zeroPressureHeight',
    label: 'Height above the road at which the truck gust pressure has fallen to zero',
    value: '32.8 ft',
    dim: 'length',
    source: `from memory: zero at 32.8 ft (10 m) above the road (${LTS_MEMORY}); ${VERIFY}`,
  },
  roadLevel: {
    key: 'loads.fatigue.truckGust.roadLevel',
    label: 'Level of the road surface relative to the pole base (+ above)',
    value: '0 ft',
    dim: 'length',
    source: 'polebook default: the road surface is level with the pole base; verify from the site section',
  },
  truckLanes: {
    key: 'loads.fatigue.truckGust.lanes',
    label: 'Parts of each arm over the traffic lanes, where the truck gust acts',
    value: 'the whole length of every arm',
    source: 'polebook default (conservative: the whole arm is taken over traffic); give lanes to restrict it, verify',
  },
  dragPanels: {
    key: 'loads.fatigue.dragCoefficients.panels',
    label: 'Drag coefficient of sign panels for the fatigue pressures',
    value: 1.12,
    source: `from memory: Cd = 1.12 for sign panels of small aspect ratio (${LTS_MEMORY}, wind drag coefficient table); ${VERIFY}`,
  },
  dragRound: {
    key: 'loads.fatigue.dragCoefficients.roundMembers',
    label: 'Drag coefficient of round tubes for the fatigue pressures (low wind speeds: subcritical flow)',
    value: 1.1,
    source: `from memory: Cd = 1.10 for round members in subcritical flow (${LTS_MEMORY}, wind drag coefficient table); ${VERIFY}`,
  },
  dragMultisided: {
    key: 'loads.fatigue.dragCoefficients.multisidedMembers',
    label: 'Drag coefficient of multisided tubes for the fatigue pressures',
    value: 1.2,
    source: `from memory: Cd about 1.2 for 8- to 16-sided members at low wind speeds (${LTS_MEMORY}, wind drag coefficient table; the table gives values by side count); ${VERIFY}`,
  },
  dragPoints: {
    key: 'loads.fatigue.dragCoefficients.points',
    label: 'Drag coefficient of point attachments for the fatigue pressures, on their wind area',
    value: 1.2,
    source: `from memory: Cd = 1.2 for traffic signal heads (${LTS_MEMORY}, wind drag coefficient table); give 1.0 where the area is an effective projected area (it includes the drag); ${VERIFY}`,
  },
  windKd: {
    key: 'loads.wind.speed.Kd',
    label: 'Wind directionality factor Kd',
    value: 0.95,
    source: 'typical value for poles and sign supports (AASHTO LRFD-LTS, from memory); verify against the governing code',
  },
  windG: {
    key: 'loads.wind.speed.G',
    label: 'Wind gust effect factor G',
    value: 1.14,
    source: 'AASHTO LRFD-LTS gust effect factor for poles and sign supports, from memory; verify against the governing code',
  },
  windCv: {
    key: 'loads.wind.speed.Cv',
    label: 'Factor Cv on V d in the drag of round tubes',
    value: 0.8,
    source: 'AASHTO LRFD-LTS, from memory; verify against the governing code',
  },
  memberWindRule: {
    key: 'loads.wind.memberRule',
    label: 'Wind on members inclined to the wind: rule',
    value: 'projected-area',
    source: 'projected-area practice of the support specifications: the pressure acts on the member area projected onto a plane normal to the wind, in the wind direction (AASHTO LRFD-LTS, from memory; verify against the governing code)',
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
    source: 'polebook default: with 20 segments the tip deflection of tapered cantilevers is within 0.5 percent of the continuous taper, and the second-order base moment, its second-order increment and the tip movements of the bundled examples within 0.2 percent of a 160-segment model (segment convergence studies in tests/model); the package shows the convergence of every member',
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
  return d.si ? `Default: ${String(d.value)} with units: us (${d.source}); ${d.si.value} with units: si (${d.si.source})` : `Default: ${String(d.value)} (${d.source})`;
}

/** The default as taken for an input in the given unit system. */
export function defaultFor(d: DefaultDef, system: 'us' | 'si'): DefaultDef {
  return system === 'si' && d.si ? { ...d, value: d.si.value, source: d.si.source } : d;
}

export const COMBINATION_SOURCE = `default, ${VERIFY}; factors from memory of AASHTO LRFD-LTS Table 3.4.1-1 (load combinations and load factors)`;
