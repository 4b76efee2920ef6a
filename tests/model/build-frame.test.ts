import { describe, expect, it } from 'vitest';
import { attachmentWeight_N, buildFrame } from '../../src/model/build-frame.ts';
import { elementEnds, locateOnMember } from '../../src/model/locate.ts';
import { deg, makeDesign, polySection, testArm, testHead, testPanel, testPole } from './design-factory.ts';

// Expected values below come from the input geometry by hand formulas written in the test
// (linear taper, trigonometry of the arm direction), not from the model code.
const close = (a: number, b: number, tol = 1e-9) => expect(Math.abs(a - b)).toBeLessThan(tol);

describe('buildFrame: geometry and numbering', () => {
  const design = makeDesign({
    arms: [testArm(), testArm({ id: 'A2', attachHeight_m: 7.4, direction_rad: deg(150), length_m: 2.5, rise_rad: deg(10) })],
    attachments: [testPanel(), testHead(), testHead({ id: 'L1', kind: 'luminaire', member: 'A2', position_m: 2.5, offset: { vertical_m: -0.2, lateral_m: 0, direction_rad: 0 } }), testHead({ id: 'B1', kind: 'other', member: 'pole', position_m: 3.0, offset: { vertical_m: 0, lateral_m: 0.25, direction_rad: deg(270) } })],
  });
  const model = buildFrame(design, { segmentsPerMember: 8 });

  it('node and element ids equal their indices; nodes are numbered pole base to top, then each arm root to tip', () => {
    model.nodes.forEach((n, k) => expect(n.id).toBe(k));
    model.elements.forEach((e, k) => expect(e.id).toBe(k));
    const pole = model.members.find((m) => m.id === 'pole')!;
    expect(model.nodes[0].xyz_m).toEqual([0, 0, 0]);
    let lastZ = -1;
    for (const id of pole.elements) {
      const e = model.elements[id];
      expect(e.j).toBe(e.i + 1);
      expect(model.nodes[e.j].xyz_m[2]).toBeGreaterThan(lastZ);
      lastZ = model.nodes[e.j].xyz_m[2];
    }
    close(lastZ, design.pole.height_m);
    for (const arm of model.members.filter((m) => m.kind === 'arm')) {
      const els = arm.elements.map((id) => model.elements[id]);
      // Root element starts at a pole node; the rest follow each other.
      expect(els[0].i).toBeLessThan(model.elements[pole.elements.at(-1)!].j + 1);
      for (const e of els.slice(1)) expect(e.j).toBe(e.i + 1);
    }
  });

  it('arm roots reach the pole face by a horizontal rigid offset equal to the pole radius there', () => {
    for (const arm of design.arms) {
      const info = model.members.find((m) => m.id === arm.id)!;
      const first = model.elements[info.elements[0]];
      const s = design.pole.section;
      const r = (s.rootDiameter_m + ((s.tipDiameter_m - s.rootDiameter_m) * arm.attachHeight_m) / design.pole.height_m) / 2;
      close(model.nodes[first.i].xyz_m[2], arm.attachHeight_m);
      expect(model.nodes[first.i].tag).toContain(`arm-root:${arm.id}`);
      close(first.offsetI_m[0], r * Math.cos(arm.direction_rad));
      close(first.offsetI_m[1], r * Math.sin(arm.direction_rad));
      close(first.offsetI_m[2], 0);
      // Arm tip: horizontal reach r + L cos(rise) in the arm's plan direction, height h + L sin(rise).
      const tip = model.nodes[model.elements[info.elements.at(-1)!].j].xyz_m;
      close(tip[0], (r + arm.length_m * Math.cos(arm.rise_rad)) * Math.cos(arm.direction_rad));
      close(tip[1], (r + arm.length_m * Math.cos(arm.rise_rad)) * Math.sin(arm.direction_rad));
      close(tip[2], arm.attachHeight_m + arm.length_m * Math.sin(arm.rise_rad));
      // Clear lengths add up to the arm length; stations run 0 .. L.
      const L = info.elements.reduce((sum, id) => sum + elementEnds(model, model.elements[id]).length_m, 0);
      close(L, arm.length_m);
      close(first.sI_m, 0);
      close(model.elements[info.elements.at(-1)!].sJ_m, arm.length_m);
    }
  });

  it('reference vectors: global X for the pole; for arms the upward normal in the vertical plane of the arm (global Z when horizontal)', () => {
    for (const e of model.elements) {
      if (e.member === 'pole') {
        expect(e.refVector).toEqual([1, 0, 0]);
        continue;
      }
      const arm = design.arms.find((a) => a.id === e.member)!;
      // Expected from the geometry of the arm: the unit normal to its axis in its vertical plane, pointing up.
      const s = Math.sin(arm.rise_rad);
      const c = Math.cos(arm.rise_rad);
      const expected = [-s * Math.cos(arm.direction_rad), -s * Math.sin(arm.direction_rad), c];
      e.refVector.forEach((v, k) => close(v, expected[k]!));
      if (arm.rise_rad === 0) expect(e.refVector).toEqual([0, 0, 1]);
    }
  });

  it('builds an arm rising nearly vertically: its reference vector stays square to the axis (found by tests/fuzz)', () => {
    // Mutated input: rise 89.999999 deg made global Z parallel to the arm and stopped the build.
    const steep = makeDesign({ arms: [testArm({ rise_rad: deg(89.999999) })] });
    const m = buildFrame(steep, { segmentsPerMember: 4 });
    const arm = m.elements.filter((e) => e.member !== 'pole');
    expect(arm.length).toBeGreaterThan(0);
    for (const e of arm) {
      const a = m.nodes[e.i].xyz_m;
      const b = m.nodes[e.j].xyz_m;
      const axis = [0, 1, 2].map((k) => b[k]! + e.offsetJ_m[k]! - a[k]! - e.offsetI_m[k]!);
      const len = Math.hypot(axis[0]!, axis[1]!, axis[2]!);
      const dot = axis.reduce((sum, v, k) => sum + v * e.refVector[k]!, 0) / len;
      expect(Math.abs(dot)).toBeLessThan(1e-9);
      expect(Math.hypot(...e.refVector)).toBeCloseTo(1, 12);
    }
  });

  it('has a segment boundary at every attachment and arm connection, listed as a discontinuity', () => {
    const points = [
      ...design.attachments.map((a) => ({ member: a.member, s: a.position_m })),
      ...design.arms.map((a) => ({ member: 'pole', s: a.attachHeight_m })),
    ];
    for (const p of points) {
      const info = model.members.find((m) => m.id === p.member)!;
      const boundaries = info.elements.flatMap((id) => [model.elements[id].sI_m, model.elements[id].sJ_m]);
      expect(boundaries.some((b) => Math.abs(b - p.s) < 1e-9)).toBe(true);
      expect(info.discontinuities_m.some((d) => Math.abs(d - p.s) < 1e-9)).toBe(true);
    }
    for (const m of model.members) {
      expect(m.discontinuities_m[0]).toBe(0);
      expect(m.discontinuities_m.at(-1)).toBe(m.length_m);
    }
  });

  it('element end diameters follow the linear taper', () => {
    for (const e of model.elements) {
      const sec = e.member === 'pole' ? design.pole.section : design.arms.find((a) => a.id === e.member)!.section;
      const L = e.member === 'pole' ? design.pole.height_m : design.arms.find((a) => a.id === e.member)!.length_m;
      close(e.diameterI_m, sec.rootDiameter_m + ((sec.tipDiameter_m - sec.rootDiameter_m) * e.sI_m) / L);
      close(e.diameterJ_m, sec.rootDiameter_m + ((sec.tipDiameter_m - sec.rootDiameter_m) * e.sJ_m) / L);
    }
  });

  it('steel mass per length integrates to the frustum-of-tube mass', () => {
    // Frustum of a round tube, constant wall t, D linear from D1 to D2: A = π t (D − t),
    // so the mass is ρ π t L ((D1 + D2)/2 − t) (volume of a frustum shell, exact for a linear taper).
    const { height_m: L, section: s } = design.pole;
    const expected = design.material.density_kgm3 * Math.PI * s.wall_m * L * ((s.rootDiameter_m + s.tipDiameter_m) / 2 - s.wall_m);
    const pole = model.members.find((m) => m.id === 'pole')!;
    const mass = pole.elements.reduce((sum, id) => {
      const e = model.elements[id];
      return sum + e.massPerLength_kgm * (e.sJ_m - e.sI_m);
    }, 0);
    expect(Math.abs(mass / expected - 1)).toBeLessThan(1e-12);
  });

  it('lumps the attachment masses (weight / g, g = 9.80665 m/s², NIST SP 330) at their nodes', () => {
    expect(model.masses).toHaveLength(design.attachments.length);
    design.attachments.forEach((a, k) => {
      const m = model.masses[k];
      const W = a.kind === 'panel' ? a.weightPerArea_Pa * a.width_m * a.height_m : a.weight_N;
      close(m.mass_kg, W / 9.80665, 1e-12);
      expect(model.nodes[m.node].tag).toContain(`attachment:${a.id}`);
      expect(attachmentWeight_N(a)).toBe(W);
    });
  });

  it('locates member positions on elements', () => {
    const p = locateOnMember(model, 'A1', 6.0);
    const e = model.elements[p.element];
    close(e.sI_m + p.a_m, 6.0);
    expect(() => locateOnMember(model, 'A1', 9.5)).toThrow(RangeError);
  });
});

describe('buildFrame: supports, segments and errors', () => {
  it('fixed base restrains all six dofs', () => {
    const m = buildFrame(makeDesign());
    expect(m.supports).toEqual([{ node: 0, fixed: [true, true, true, true, true, true], springs: [0, 0, 0, 0, 0, 0] }]);
  });
  it('spring base: translations and torsion fixed, springs on rx and ry', () => {
    const m = buildFrame(makeDesign({ pole: testPole({ base: { kind: 'spring', stiffness_Nm_per_rad: 5e7 } }) }));
    expect(m.supports[0].fixed).toEqual([true, true, true, false, false, true]);
    expect(m.supports[0].springs).toEqual([0, 0, 0, 5e7, 5e7, 0]);
  });
  it('a bare pole gets exactly the requested number of elements', () => {
    const m = buildFrame(makeDesign({ arms: [], attachments: [] }), { segmentsPerMember: 7 });
    expect(m.elements).toHaveLength(7);
    expect(m.nodes).toHaveLength(8);
  });
  it('multisided members get properties between those at their ends', () => {
    const m = buildFrame(makeDesign({ pole: testPole({ section: polySection(12, 0.45, 0.25, 0.006) }) }), { segmentsPerMember: 4 });
    const pole = m.elements.filter((e) => e.member === 'pole');
    for (let k = 1; k < pole.length; k++) expect(pole[k].Iz_m4).toBeLessThan(pole[k - 1].Iz_m4);
  });
  it('rejects attachments on unknown members or beyond the member end', () => {
    expect(() => buildFrame(makeDesign({ attachments: [testPanel({ member: 'A9' })] }))).toThrow(/A9/);
    expect(() => buildFrame(makeDesign({ attachments: [testPanel({ position_m: 9.6 })] }))).toThrow(/outside/);
    expect(() => buildFrame(makeDesign(), { segmentsPerMember: 0 })).toThrow(RangeError);
  });
});
