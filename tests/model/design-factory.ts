// Hand-built designs in SI for tests of the model and loads (until the input parser lands,
// and afterwards to keep these tests independent of it). Invented scenario: a cantilevered
// sign support for a fictional agency; the numbers are plausible, not from any real project.
import type { Arm, Attachment, CombinationSpec, Design, PanelAttachment, PointAttachment, Pole, TubeSection } from '../../src/design/design.ts';

export const deg = (d: number) => (d * Math.PI) / 180;

export const roundSection = (root_m: number, tip_m: number, wall_m: number): TubeSection => ({
  shape: 'round',
  sides: null,
  rootDiameter_m: root_m,
  tipDiameter_m: tip_m,
  wall_m,
});

export const polySection = (sides: number, root_m: number, tip_m: number, wall_m: number): TubeSection => ({
  shape: 'multisided',
  sides,
  rootDiameter_m: root_m,
  tipDiameter_m: tip_m,
  wall_m,
});

export const testPole = (over: Partial<Pole> = {}): Pole => ({
  height_m: 7.5,
  section: roundSection(0.4, 0.3, 0.00635),
  base: { kind: 'fixed' },
  ...over,
});

export const testArm = (over: Partial<Arm> = {}): Arm => ({
  id: 'A1',
  attachHeight_m: 7.0,
  direction_rad: 0,
  length_m: 9.0,
  rise_rad: deg(2),
  section: roundSection(0.28, 0.16, 0.0048),
  ...over,
});

export const testPanel = (over: Partial<PanelAttachment> = {}): PanelAttachment => ({
  kind: 'panel',
  id: 'S1',
  description: 'Guide sign, Harbor Loop exit',
  member: 'A1',
  position_m: 6.0,
  width_m: 3.6,
  height_m: 2.4,
  weightPerArea_Pa: 170,
  offset: { vertical_m: -0.6, lateral_m: 0.3, direction_rad: 0 },
  faceNormal_rad: deg(90),
  ...over,
});

export const testHead = (over: Partial<PointAttachment> = {}): PointAttachment => ({
  kind: 'signal-head',
  id: 'H1',
  description: 'Three-section signal head',
  member: 'A1',
  position_m: 8.5,
  weight_N: 250,
  windArea_m2: 0.8,
  sideArea_m2: null,
  faceNormal_rad: deg(90),
  offset: { vertical_m: -0.5, lateral_m: 0, direction_rad: 0 },
  ...over,
});

export const testCombinations: readonly CombinationSpec[] = [
  { id: 'strength-dead', category: 'strength', description: '1.25 D', factors: { dead: 1.25 }, source: 'test data' },
  { id: 'extreme-wind-max', category: 'extreme-wind', description: '1.1 D + W', factors: { dead: 1.1, wind: 1.0 }, source: 'test data' },
  { id: 'extreme-ice', category: 'extreme-ice', description: '1.1 D + I + Wi', factors: { dead: 1.1, ice: 1.0, 'ice-wind': 1.0 }, source: 'test data' },
  { id: 'service', category: 'service', description: 'D + W', factors: { dead: 1.0, wind: 1.0 }, source: 'test data' },
];

export function makeDesign(over: Partial<Design> = {}): Design {
  const attachments: Attachment[] = [testPanel(), testHead()];
  return {
    formatVersion: 1,
    units: 'si',
    project: {
      name: 'Test corridor signing',
      structureId: 'TS-001',
      location: 'Harbor Loop at Quarry Road (fictional)',
      owner: 'Fictional County Roads',
      revisions: [{ id: 'A', date: '2026-01-01', description: 'test', by: '', issued: null }],
      preparedBy: 'test',
      checkedBy: 'test',
      engineerOfRecord: 'test',
      date: '2026-01-01',
    },
    kind: 'cantilever-sign',
    description: 'Test cantilevered sign support',
    material: { E_Pa: 200e9, G_Pa: 77e9, Fy_Pa: 345e6, density_kgm3: 7850 },
    pole: testPole(),
    arms: [testArm()],
    attachments,
    wind: {
      membersPressure_Pa: 1200,
      panelsPressure_Pa: 1500,
      pointsPressure_Pa: 1300,
      memberRule: 'cross-flow',
      speed: null,
      directions: [
        { angle_rad: deg(90), label: 'normal to sign face' },
        { angle_rad: 0, label: 'along the arm' },
        { angle_rad: deg(45), label: 'oblique' },
      ],
    },
    ice: { weightPerArea_Pa: 144, windFactor: 0.35 },
    fatigue: null,
    combinations: testCombinations,
    criteria: {
      deflection: { armTipDeadRatio: 0.01, armTipServiceRatio: 0.025, poleTopServiceRatio: 0.025, armTipFatigue_m: 0.2032 },
      columnK: 2.1,
      phi: { flexure: 0.9, shear: 0.9, torsion: 0.95, axial: 0.9, tension: 0.9, boltTension: 0.75, boltShear: 0.75 },
      anchorBolts: null,
      basePlate: null,
      vortex: { speedThreshold_mps: 8.9408, exemptTaper: 0.011667, strouhalRound: 0.18, strouhalMultisided: 0.15 },
    },
    analysis: { segmentsPerMember: 10, secondOrder: false, pDeltaTolerance: 1e-6, pDeltaMaxIterations: 50, stationSpacing_m: 0.3 },
    assumptions: [],
    ...over,
  };
}
