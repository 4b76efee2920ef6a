// A point attachment with a face area and a side area meets the wind on
// A(α) = A_face |cos α| + A_side |sin α|, α the plan angle between the wind and the face normal
// (a projection of the two areas, common practice). Hand values for A_face 0.8 m², A_side 0.4 m²:
// α 0: 0.8; α 90°: 0.4; α 45°: 1.2 × 0.70711 = 0.84853 m². Without a side area, 0.8 from every side.
import { describe, expect, it } from 'vitest';
import { buildFrame } from '../../src/model/build-frame.ts';
import { windLoadCase } from '../../src/loads/wind-load.ts';
import { loadResultant } from '../../src/loads/load-resultant.ts';
import { makeDesign, testHead } from '../model/design-factory.ts';

const p = 1300;

function force(sideArea: number | null, windAngleDeg: number): number {
  const base = makeDesign({});
  // Members take no wind here (pressure 0), so the load case is the head's force alone.
  const design = makeDesign({
    attachments: [testHead({ windArea_m2: 0.8, sideArea_m2: sideArea })],
    wind: { ...base.wind, membersPressure_Pa: 0, pointsPressure_Pa: p, directions: [{ angle_rad: (windAngleDeg * Math.PI) / 180, label: 'test' }] },
  });
  const model = buildFrame(design, { segmentsPerMember: 4 });
  const f = loadResultant(model, windLoadCase(design, model, design.wind.directions[0]!).loads).force_N;
  return Math.hypot(f[0], f[1]);
}

describe('face and side areas of a point attachment (face normal square to the arm, +Y)', () => {
  it('wind on the face (90 deg): the face area', () => expect(force(0.4, 90) / p).toBeCloseTo(0.8, 10));
  it('wind along the arm (0 deg): the side area', () => expect(force(0.4, 0) / p).toBeCloseTo(0.4, 10));
  it('wind at 45 deg: 0.84853 m²', () => expect(force(0.4, 45) / p).toBeCloseTo(0.84853, 5));
  it('no side area: the face area from every direction', () => {
    for (const a of [0, 45, 90, 200]) expect(force(null, a) / p).toBeCloseTo(0.8, 10);
  });
});
