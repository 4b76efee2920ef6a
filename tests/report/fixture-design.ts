// A small SI cantilevered sign support, built by hand for the report tests. The agency,
// road, people and ids are invented. Values are plausible, not a design.
import { createHash } from 'node:crypto';
import type { Assumption, Design, LoadedDesign } from '../../src/design/design.ts';

const DEG = Math.PI / 180;

/** The input file as the user wrote it; echoed verbatim in the appendix. */
export const FIXTURE_INPUT_TEXT = `# Overhead guide sign, Quarry Mill Road eastbound (invented example)
format: 1
units: si
project:
  name: Quarry Mill Road widening
  structureId: QM-CS-07
  location: Quarry Mill Road, station 4+380, eastbound shoulder
  owner: Larkspur Valley Transportation Authority
  date: 2026-03-15
  revisions:
    - { id: A, date: 2026-03-15, description: first issue for review }
  preparedBy: R. Okonkwo-Hale
  checkedBy: T. Vasquez-Lind
  engineerOfRecord: ""
structure:
  kind: cantilever-sign
  material: { E: 200000 MPa, G: 77000 MPa }
  pole:
    height: 7.6 m
    section: { shape: multisided, sides: 12, rootAcrossFlats: 406 mm, tipAcrossFlats: 300 mm, wall: 7.9 mm }
  arms:
    - id: A1
      height: 7.0 m
      direction: 0 deg
      length: 9.0 m
      section: { shape: round, rootDiameter: 273 mm, tipDiameter: 168 mm, wall: 6.4 mm }
attachments:
  panels:
    - { id: S1, description: "Guide sign, EXIT 14 Larkspur", arm: A1, position: 6.0 m, width: 3.6 m, height: 2.1 m, weightPerArea: 0.15 kPa, offset: { vertical: -0.45 m } }
loads:
  wind: { members: 1.10 kPa, panels: 1.35 kPa, points: 1.35 kPa }
  ice: {}
criteria:
  anchorBolts: { count: 8, circle: 560 mm, diameter: 38 mm, tensileStrength: 724 MPa }
# a deliberately long comment line to see that the echo wraps long lines instead of cutting them off at the right margin of the page: ${'x'.repeat(60)}
	tab-indented line (tabs print as four spaces)
`;

export const FIXTURE_HASH = createHash('sha256').update(FIXTURE_INPUT_TEXT, 'utf8').digest('hex').slice(0, 12);

const assumptions: Assumption[] = [
  { key: 'structure.material.E', label: 'Modulus of elasticity of steel, E', value: 200e9, dim: 'stress', source: 'given in the input', defaulted: false },
  { key: 'structure.material.G', label: 'Shear modulus of steel, G', value: 77e9, dim: 'stress', source: 'given in the input', defaulted: false },
  {
    key: 'structure.material.yieldStrength',
    label: 'Minimum yield strength of the tube steel, Fy',
    value: 345e6,
    dim: 'stress',
    source: 'typical value, verify against the steel specified on the drawings',
    defaulted: true,
  },
  { key: 'structure.material.density', label: 'Density of steel', value: 7850, dim: 'density', source: 'common practice', defaulted: true },
  { key: 'structure.pole.base.fixity', label: 'Pole base restraint', value: 'fixed', source: 'common practice; verify against the foundation design', defaulted: true },
  {
    key: 'criteria.armTipDeflectionLimit',
    label: 'Arm tip deflection limit (service), as a fraction of arm length',
    value: 0.01,
    dim: 'ratio',
    source: 'typical value, verify against the governing code',
    defaulted: true,
  },
  { key: 'criteria.resistanceFactors.flexure', label: 'Resistance factor φ, flexure', value: 0.9, source: 'typical value, verify against the governing code', defaulted: true },
  { key: 'loads.ice.weightPerArea', label: 'Ice load per surface area', value: 144, dim: 'pressure', source: 'typical value, verify against the governing code', defaulted: true },
  { key: 'analysis.secondOrder', label: 'Second-order (P-delta) analysis', value: true, source: 'common practice', defaulted: true },
];

export const FIXTURE_DESIGN: Design = {
  formatVersion: 1,
  units: 'si',
  project: {
    name: 'Quarry Mill Road widening',
    structureId: 'QM-CS-07',
    location: 'Quarry Mill Road, station 4+380, eastbound shoulder',
    owner: 'Larkspur Valley Transportation Authority',
    revisions: [{ id: 'A', date: '2026-03-15', description: 'first issue for review', by: 'R. O.-H.', issued: null }],
    preparedBy: 'R. Okonkwo-Hale',
    checkedBy: 'T. Vasquez-Lind',
    engineerOfRecord: '',
    date: '2026-03-15',
  },
  kind: 'cantilever-sign',
  description: 'Overhead guide sign on a single mast arm',
  material: { E_Pa: 200e9, G_Pa: 77e9, Fy_Pa: 345e6, density_kgm3: 7850 },
  pole: {
    height_m: 7.6,
    section: { shape: 'multisided', sides: 12, rootDiameter_m: 0.406, tipDiameter_m: 0.3, wall_m: 0.0079 },
    base: { kind: 'fixed' },
  },
  arms: [
    {
      id: 'A1',
      attachHeight_m: 7.0,
      direction_rad: 0,
      length_m: 9.0,
      rise_rad: 0,
      section: { shape: 'round', sides: null, rootDiameter_m: 0.273, tipDiameter_m: 0.168, wall_m: 0.0064 },
    },
  ],
  attachments: [
    {
      kind: 'panel',
      id: 'S1',
      description: 'Guide sign, EXIT 14 Larkspur',
      member: 'A1',
      position_m: 6.0,
      width_m: 3.6,
      height_m: 2.1,
      weightPerArea_Pa: 150,
      offset: { vertical_m: -0.45, lateral_m: 0, direction_rad: 0 },
      faceNormal_rad: 90 * DEG,
    },
  ],
  wind: {
    membersPressure_Pa: 1100,
    panelsPressure_Pa: 1350,
    pointsPressure_Pa: 1350,
    memberRule: 'projected-area',
    speed: null,
    directions: [
      { angle_rad: 90 * DEG, label: 'normal to sign face' },
      { angle_rad: 270 * DEG, label: 'normal to sign face, reversed' },
      { angle_rad: 0, label: 'along arm A1' },
    ],
  },
  ice: { weightPerArea_Pa: 144, windFactor: 0.25 },
  fatigue: null,
  combinations: [
    { id: 'STR-1', category: 'strength', description: 'Dead load alone', factors: { dead: 1.25 }, source: 'default, verify against the governing code' },
    { id: 'EXW-1', category: 'extreme-wind', description: 'Dead and wind', factors: { dead: 1.1, wind: 1.0 }, source: 'default, verify against the governing code' },
    { id: 'EXI-1', category: 'extreme-ice', description: 'Dead, ice and wind on ice', factors: { dead: 1.1, ice: 1.0, 'ice-wind': 1.0 }, source: 'default, verify against the governing code' },
    { id: 'SVC-1', category: 'service', description: 'Dead and service wind', factors: { dead: 1.0, wind: 1.0 }, source: 'given in the input' },
  ],
  criteria: {
    deflection: { armTipDeadRatio: 0.01, armTipServiceRatio: 0.025, poleTopServiceRatio: 0.025, armTipFatigue_m: 0.2032 },
    columnK: 2.1,
    phi: { flexure: 0.9, shear: 0.9, torsion: 0.95, axial: 0.9, tension: 0.9, boltTension: 0.75, boltShear: 0.75 },
    anchorBolts: { count: 8, circleDiameter_m: 0.56, boltDiameter_m: 0.038, grade: '105', Fu_Pa: 861.8e6, Fy_Pa: 723.95e6, thread: null, standOff_m: 0 },
    basePlate: { thickness_m: 0.05, Fy_Pa: 345e6 },
    vortex: { speedThreshold_mps: 8.9408, exemptTaper: 0.011667, strouhalRound: 0.18, strouhalMultisided: 0.15 },
  },
  analysis: { segmentsPerMember: 10, secondOrder: true, pDeltaTolerance: 1e-6, pDeltaMaxIterations: 50, stationSpacing_m: 0.3 },
  assumptions,
};

export const FIXTURE_LOADED: LoadedDesign = {
  design: FIXTURE_DESIGN,
  file: 'examples/quarry-mill-qm-cs-07.yaml',
  text: FIXTURE_INPUT_TEXT,
  inputHash: FIXTURE_HASH,
  warnings: [],
};

/** The same design entered in US customary units (only the unit system differs). */
export const FIXTURE_LOADED_US: LoadedDesign = { ...FIXTURE_LOADED, design: { ...FIXTURE_DESIGN, units: 'us' } };
