// The two rules for wind on a member inclined to the wind, against their closed forms for a
// prismatic arm of diameter D and length L rising at β above a horizontal wind along its plan
// direction (θ = β between the wind and the axis):
//   projected area (the area projected onto a plane normal to the wind, AASHTO LRFD-LTS practice,
//   from memory): F = p D L sin θ, in the wind direction;
//   cross-flow (normal component only, Hoerner, Fluid-Dynamic Drag, ch. 3, from memory):
//   F = p D L sin²θ, normal to the axis in the plane of wind and axis.
// For β = 10 deg the two differ by 1/sin 10° = 5.76 on the arm's wind load.
// The loads are summed from the elements (loadResultant); round-off only, so 1e-12 relative.
import { describe, expect, it } from 'vitest';
import { buildFrame } from '../../src/model/build-frame.ts';
import { windLoadCase } from '../../src/loads/wind-load.ts';
import { loadResultant } from '../../src/loads/load-resultant.ts';
import type { Design, MemberWindRule } from '../../src/design/design.ts';
import { makeDesign, roundSection, testArm } from '../model/design-factory.ts';

const D = 0.2;
const L = 6;
const p = 1000;
const beta = (10 * Math.PI) / 180;
const H = 6;
const D_POLE = 1e-9;

function armOnly(rule: MemberWindRule): { design: Design; force: readonly number[] } {
  const base = makeDesign({});
  const design = makeDesign({
    // A hair-thin pole: its own wind, p D_pole H along +X (normal to it under both rules), is taken off.
    pole: { height_m: H, section: roundSection(D_POLE, D_POLE, D_POLE / 10), base: { kind: 'fixed' } },
    arms: [testArm({ attachHeight_m: H, rise_rad: beta, length_m: L, direction_rad: 0, section: roundSection(D, D, 0.006) })],
    attachments: [],
    wind: { ...base.wind, membersPressure_Pa: p, memberRule: rule, directions: [{ angle_rad: 0, label: 'along the arm' }] },
  });
  const model = buildFrame(design, { segmentsPerMember: 6 });
  const lc = windLoadCase(design, model, design.wind.directions[0]!);
  const f = loadResultant(model, lc.loads).force_N;
  return { design, force: [f[0] - p * D_POLE * H, f[1], f[2]] };
}

describe('wind on an arm rising 10 deg, wind along the arm', () => {
  it('projected area: p D L sin θ, horizontal, along the wind', () => {
    const { force } = armOnly('projected-area');
    const F = p * D * L * Math.sin(beta);
    expect(Math.abs(force[0]! / F - 1)).toBeLessThan(1e-12);
    expect(Math.abs(force[1]!)).toBeLessThan(1e-9 * F);
    expect(Math.abs(force[2]!)).toBeLessThan(1e-9 * F);
  });
  it('cross-flow: p D L sin²θ, normal to the axis (downward component −F cos θ for a rising arm)', () => {
    const { force } = armOnly('cross-flow');
    const F = p * D * L * Math.sin(beta) ** 2;
    // The normal to the axis in the vertical plane of the arm: (sin β, 0, −cos β).
    expect(Math.abs(force[0]! / (F * Math.sin(beta)) - 1)).toBeLessThan(1e-12);
    expect(Math.abs(force[2]! / (-F * Math.cos(beta)) - 1)).toBeLessThan(1e-12);
  });
  it('the two differ by 1/sin 10° = 5.76 in magnitude', () => {
    const a = armOnly('projected-area').force;
    const b = armOnly('cross-flow').force;
    const ratio = Math.hypot(...a) / Math.hypot(...b);
    expect(Math.abs(ratio - 1 / Math.sin(beta))).toBeLessThan(1e-9);
    expect(ratio).toBeCloseTo(5.76, 2);
  });
});

describe("a member's own wind pressure", () => {
  // A horizontal arm along +X in a wind toward +Y: F = p D L with the arm's own p (2 kPa), not the
  // class pressure (1 kPa); the hair-thin pole's own load (class pressure) is taken off as above.
  it('overrides the members pressure for that member only', () => {
    const base = makeDesign({});
    const design = makeDesign({
      pole: { height_m: H, section: roundSection(D_POLE, D_POLE, D_POLE / 10), base: { kind: 'fixed' } },
      arms: [testArm({ attachHeight_m: H, rise_rad: 0, length_m: L, direction_rad: 0, section: roundSection(D, D, 0.006), wind: { pressure_Pa: 2 * p, drag: null } })],
      attachments: [],
      wind: { ...base.wind, membersPressure_Pa: p, memberRule: 'projected-area', directions: [{ angle_rad: Math.PI / 2, label: 'across the arm' }] },
    });
    const model = buildFrame(design, { segmentsPerMember: 6 });
    const f = loadResultant(model, windLoadCase(design, model, design.wind.directions[0]!).loads).force_N;
    const pole = p * D_POLE * H;
    expect(Math.abs((f[1] - pole) / (2 * p * D * L) - 1)).toBeLessThan(1e-12);
  });
});
