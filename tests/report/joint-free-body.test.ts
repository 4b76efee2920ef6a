// The drawing of a pole-arm joint's free body (src/report/figures/joint-free-body.ts, fed by
// jointFigureParts of the free-body section): statics of an L-shaped frame against its closed form,
// through jointFreeBody and through the labels the drawing prints; every component that is not
// round-off has a labelled arrow and round-off has none; labels overlap neither each other nor a
// drawn line; the SVG is well-formed; the same input gives the same bytes.
import { describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { analyseDesign } from '../../src/analyse-design.ts';
import { analyzeCombination, combinedLoads } from '../../src/analysis/analyze.ts';
import { jointFreeBody, type JointFreeBody } from '../../src/analysis/joint-forces.ts';
import { loadDesignFile } from '../../src/input/index.ts';
import type { LoadCase, Combination } from '../../src/loads/load-types.ts';
import type { FrameModel, Vec3 } from '../../src/model/frame.ts';
import { packageRoot } from '../../src/package-root.ts';
import { jointFreeBodyFigure, type JointFigure, type JointFigurePart } from '../../src/report/figures/joint-free-body.ts';
import type { Rect } from '../../src/report/figures/label-place.ts';
import { display } from '../../src/report/sections/display.ts';
import { freeBodySection, jointFigureParts } from '../../src/report/sections/free-body-section.ts';
import { analyseAndCheck } from '../../src/pipeline.ts';
import { ROUND_OFF, roundOffShare, withoutRoundOff } from '../../src/report/sections/round-off.ts';
import { FrameBuilder, nodal, roundTube, type Section } from '../analysis/frame-helpers.ts';
import { checkXml } from './xml-check.ts';

// Six decimals of kN: fine enough that a wrong value would print differently, far coarser than round-off.
const kN = (N: number) => `${(N / 1000).toFixed(6)} kN`;
const kNm = (Nm: number) => `${(Nm / 1000).toFixed(6)} kN·m`;

/** Does the segment a-b cross the rectangle? (Liang-Barsky clipping.) */
function segmentHits(a: readonly [number, number], b: readonly [number, number], r: Rect): boolean {
  let t0 = 0;
  let t1 = 1;
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  for (const [p, q] of [[-dx, a[0] - r[0]], [dx, r[2] - a[0]], [-dy, a[1] - r[1]], [dy, r[3] - a[1]]] as const) {
    if (p === 0) {
      if (q < 0) return false;
      continue;
    }
    const t = q / p;
    if (p < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    if (t0 > t1) return false;
  }
  return true;
}

/** The drawing is well-formed, its labels keep off each other and off every drawn line, inside the figure. */
function expectClean(fig: JointFigure, what: string): void {
  const xml = checkXml(fig.svg);
  const segments: [readonly [number, number], readonly [number, number]][] = [];
  for (const e of xml.elements) {
    if (e.name === 'line') segments.push([[Number(e.attrs.x1), Number(e.attrs.y1)], [Number(e.attrs.x2), Number(e.attrs.y2)]]);
    if (e.name === 'polyline') {
      const pts = e.attrs.points!.split(' ').map((p) => p.split(',').map(Number) as [number, number]);
      for (let k = 1; k < pts.length; k++) segments.push([pts[k - 1]!, pts[k]!]);
    }
  }
  expect(segments.length, what).toBeGreaterThan(3);
  // Every label is printed in the SVG.
  for (const l of fig.labels) expect(xml.texts, what).toContain(l.text);
  for (const [k, l] of fig.labels.entries()) {
    // The text itself: the box less the one-unit margin placeLabelNear keeps around it.
    const inner: Rect = [l.box[0] + 1, l.box[1], l.box[2] - 1, l.box[3]];
    expect(l.box[0] >= 0 && l.box[1] >= 0 && l.box[2] <= fig.width && l.box[3] <= fig.height, `${what}: ${l.text} inside`).toBe(true);
    for (const m of fig.labels.slice(k + 1)) {
      const apart = l.box[2] <= m.box[0] || m.box[2] <= l.box[0] || l.box[3] <= m.box[1] || m.box[3] <= l.box[1];
      expect(apart, `${what}: "${l.text}" and "${m.text}" overlap`).toBe(true);
    }
    for (const [a, b] of segments) expect(segmentHits(a, b, inner), `${what}: "${l.text}" on a line ${a} ${b}`).toBe(false);
  }
}

/** Each global component of each part that is not round-off has a label with its magnitude, in the
 * view that shows it (h along a global axis, as in the examples); round-off has none. */
function expectEveryComponentLabelled(j: JointFreeBody, parts: readonly JointFigurePart[], fig: JointFigure, share: number, fmt: { F: (N: number) => string; M: (Nm: number) => string }, what: string): void {
  const bigF = Math.max(...j.parts.map((p) => Math.hypot(...p.force_N)));
  const bigM = Math.max(...j.parts.map((p) => Math.hypot(...p.moment_Nm)));
  parts.forEach((part) => {
    const mine = fig.labels.filter((l) => l.part === part.name);
    'xyz'.split('').forEach((axis, k) => {
      const F = withoutRoundOff(part.force_N[k]!, bigF, share);
      const M = withoutRoundOff(part.moment_Nm[k]!, bigM, share);
      if (F !== 0) expect(mine.map((l) => l.text), `${what}: ${part.name} F${axis}`).toContain(`F${axis} ${fmt.F(Math.abs(F))}`);
      else expect(mine.some((l) => l.text.startsWith(`F${axis} `)), `${what}: ${part.name} F${axis} is round-off`).toBe(false);
      if (M !== 0) expect(mine.map((l) => l.text), `${what}: ${part.name} M${axis}`).toContain(`M${axis} ${fmt.M(Math.abs(M))}`);
      else expect(mine.some((l) => l.text.startsWith(`M${axis} `)), `${what}: ${part.name} M${axis} is round-off`).toBe(false);
    });
    // Each part's stub is named in every view drawn.
    for (const v of fig.views) expect(mine.some((l) => l.kind === 'name' && l.view === v), `${what}: ${part.name} named in ${v}`).toBe(true);
  });
}

describe('joint free body of an L-shaped frame (statics of a cantilever)', () => {
  // Vertical pole of height h fixed at its base, continuing 1.5 m above the joint; a horizontal arm
  // along +X of length L from the pole axis (no rigid offset), a tip load at its end. The arm is a
  // cantilever from the joint: by equilibrium of the arm (Hibbeler, Structural Analysis,
  // equilibrium of a cantilever: root shear P, root moment P L) it exerts on the joint the force of
  // the load and the moment P L; the pole below holds the joint with the opposite force and moment
  // (equilibrium of the joint); the unloaded pole above carries nothing (its end forces are
  // round-off of the solution). First order, no self-weight: exact to round-off, 1e-9 relative.
  const h = 7;
  const L = 9;
  const P = 5000;
  const sec: Section = roundTube(0.35, 0.008);
  const b = new FrameBuilder();
  const base = b.node([0, 0, 0], 'base');
  b.fix(base);
  const below = b.member('pole', 'pole', base, [0, 0, h], 7, () => sec);
  const joint = below[below.length - 1]!;
  b.member('pole', 'pole', joint, [0, 0, h + 1.5], 2, () => sec, { tipTag: 'pole-top' });
  const arm = b.member('A1', 'arm', joint, [L, 0, h], 9, () => sec, { tipTag: 'arm-tip:A1' });
  const tip = arm[arm.length - 1]!;
  const model: FrameModel = b.build();
  const opts = { secondOrder: false, tolerance: 1e-6, maxIterations: 1, stationSpacing_m: 1 };

  function solve(F: Vec3) {
    const lc: LoadCase = { id: 'tip', kind: 'dead', description: 'tip load', windAngle_rad: null, loads: [nodal(tip, F)], steps: [] };
    const combo: Combination = { id: 'T', specId: 'T', category: 'strength', description: 'tip load', factors: [{ caseId: 'tip', factor: 1 }], source: 'test' };
    const result = analyzeCombination(model, [lc], combo, opts);
    const j = jointFreeBody(model, result, 'A1', combinedLoads([lc], combo));
    const parts = jointFigureParts(model, j);
    const fig = jointFreeBodyFigure(parts, { arm: 'A1', horizontal: [1, 0, 0], force: kN, moment: kNm, roundOff: ROUND_OFF, maxHeight: 200 });
    const part = (name: string) => {
      const p = parts.find((x) => x.name === name);
      if (!p) throw new Error(`no part ${name}`);
      return p;
    };
    const labels = (name: string) => fig.labels.filter((l) => l.part === name && l.kind !== 'name').map((l) => l.text);
    return { j, parts, fig, part, labels };
  }
  const rel = (x: number, y: number) => Math.abs(x - y) / Math.abs(y);

  it('tip load down: the arm exerts P down and P L about +Y on the joint, the pole below P up and P L back; drawn in elevation only', () => {
    const { j, parts, fig, part, labels } = solve([0, 0, -P]);
    expect(parts.map((p) => p.name)).toEqual(['arm A1', 'pole below', 'pole above']);
    const a = part('arm A1');
    expect(rel(-a.force_N[2], P)).toBeLessThan(1e-9);
    // (L, 0, 0) x (0, 0, -P) = (0, P L, 0)
    expect(rel(a.moment_Nm[1], P * L)).toBeLessThan(1e-9);
    const pb = part('pole below');
    expect(rel(pb.force_N[2], P)).toBeLessThan(1e-9);
    expect(rel(-pb.moment_Nm[1], P * L)).toBeLessThan(1e-9);
    // The labels the drawing prints are the closed form's.
    expect(labels('arm A1')).toEqual(expect.arrayContaining([`Fz ${kN(P)}`, `My ${kNm(P * L)}`]));
    expect(labels('pole below')).toEqual(expect.arrayContaining([`Fz ${kN(P)}`, `My ${kNm(P * L)}`]));
    // Nothing else acts: no other arrow on the arm or the pole below, none on the pole above (round-off).
    expect(labels('arm A1')).toHaveLength(2);
    expect(labels('pole below')).toHaveLength(2);
    expect(labels('pole above')).toEqual([]);
    // In-plane loading: the elevation is the whole free body.
    expect(fig.views).toEqual(['elevation']);
    expectEveryComponentLabelled(j, parts, fig, ROUND_OFF, { F: kN, M: kNm }, 'tip load down');
    expectClean(fig, 'tip load down');
  });

  it('tip load along +Y: the arm exerts P along +Y and P L about +Z (torsion of the pole below); a plan is drawn', () => {
    const { j, parts, fig, part, labels } = solve([0, P, 0]);
    const a = part('arm A1');
    expect(rel(a.force_N[1], P)).toBeLessThan(1e-9);
    // (L, 0, 0) x (0, P, 0) = (0, 0, P L)
    expect(rel(a.moment_Nm[2], P * L)).toBeLessThan(1e-9);
    const pb = part('pole below');
    expect(rel(-pb.force_N[1], P)).toBeLessThan(1e-9);
    expect(rel(-pb.moment_Nm[2], P * L)).toBeLessThan(1e-9);
    expect(fig.views).toEqual(['elevation', 'plan']);
    // In the plan as an arrow and a curved arrow, in the elevation as a dot or cross.
    const plan = fig.labels.filter((l) => l.view === 'plan' && l.part === 'arm A1').map((l) => l.text);
    expect(plan).toEqual(expect.arrayContaining([`Fy ${kN(P)}`, `Mz ${kNm(P * L)}`]));
    const elevation = fig.labels.filter((l) => l.view === 'elevation' && l.part === 'arm A1').map((l) => l.text);
    expect(elevation).toContain(`Fy ${kN(P)}`);
    expect(labels('pole above')).toEqual([]);
    expectEveryComponentLabelled(j, parts, fig, ROUND_OFF, { F: kN, M: kNm }, 'tip load along +Y');
    expectClean(fig, 'tip load along +Y');
  });

  it('the same input gives the same SVG', () => {
    expect(solve([0, P, -P]).fig.svg).toBe(solve([0, P, -P]).fig.svg);
  });
});

describe('round-off is neither drawn nor printed', () => {
  const parts = (noise: number): JointFigurePart[] => [
    { name: 'arm A1', toward: [1, 0, 0], force_N: [0, 0, -1000], moment_Nm: [0, 9000, 0] },
    { name: 'pole below', toward: [0, 0, -1], force_N: [0, 0, 1000], moment_Nm: [0, -9000, noise * 9000] },
    { name: 'pole above', toward: [0, 0, 1], force_N: [noise * 1000, 0, 0], moment_Nm: [0, 0, 0] },
  ];
  const draw = (noise: number) => jointFreeBodyFigure(parts(noise), { arm: 'A1', horizontal: [1, 0, 0], force: kN, moment: kNm, roundOff: 1e-6, maxHeight: 200 });
  it('a component at the share given (1e-6 of the largest of its kind, as the P-delta tolerance) is left out, with no plan for it', () => {
    const fig = draw(1e-6);
    expect(fig.labels.filter((l) => l.part === 'pole above' && l.kind !== 'name')).toEqual([]);
    expect(fig.labels.some((l) => l.text.startsWith('Mz'))).toBe(false);
    expect(fig.views).toEqual(['elevation']);
  });
  it('ten times that share is a value: drawn and labelled, and its moment about the vertical brings the plan', () => {
    const fig = draw(1e-5);
    expect(fig.labels.map((l) => l.text)).toEqual(expect.arrayContaining([`Fx ${kN(1e-5 * 1000)}`, `Mz ${kNm(1e-5 * 9000)}`]));
    expect(fig.views).toEqual(['elevation', 'plan']);
    expectClean(fig, 'small values');
  });
});

for (const file of ['examples/signal-support.yaml', 'examples/cantilever-sign.yaml', 'examples/luminaire-twin.yaml']) {
  describe(`joint free bodies of ${file}`, () => {
    it('every combination and arm: well-formed, every component labelled, no label on another or on a line', () => {
      const { design } = loadDesignFile(join(packageRoot(), file));
      const a = analyseDesign(design, {});
      const d = display(design.units);
      const fmt = { F: (N: number) => d.q(N, 'force'), M: (Nm: number) => d.q(Nm, 'moment') };
      const share = roundOffShare(a.options);
      let plans = 0;
      for (const combo of a.combinations) {
        for (const arm of design.arms) {
          const j = jointFreeBody(a.model, a.results[combo.id]!, arm.id, combinedLoads(a.cases, combo));
          const parts = jointFigureParts(a.model, j);
          const fig = jointFreeBodyFigure(parts, { arm: arm.id, horizontal: [Math.cos(arm.direction_rad), Math.sin(arm.direction_rad), 0], force: fmt.F, moment: fmt.M, roundOff: share, maxHeight: 200 });
          const what = `${combo.id} ${arm.id}`;
          expect(fig.height, what).toBeLessThanOrEqual(200);
          expectEveryComponentLabelled(j, parts, fig, share, fmt, what);
          expectClean(fig, what);
          if (fig.views.length === 2) plans++;
        }
      }
      // The wind combinations load the joints out of the arm's plane.
      expect(plans).toBeGreaterThan(0);
    });
  });
}

describe('joints drawn from made-up parts', () => {
  it('an arm at 30° in plan, a second arm at right angles to it and loads at the node: components named h and n, the end-on arm and the loads drawn aside, all labelled and clear', () => {
    const c = Math.cos(Math.PI / 6);
    const s = Math.sin(Math.PI / 6);
    const parts: JointFigurePart[] = [
      { name: 'arm A1', toward: [c, s, 0], force_N: [300, -200, -4000], moment_Nm: [-150, 30000, 2500] },
      { name: 'arm A2', toward: [-s, c, 0], force_N: [100, 150, -1500], moment_Nm: [-9000, -4000, -700] },
      { name: 'pole below', toward: [0, 0, -1], force_N: [-500, 100, 6200], moment_Nm: [9300, -26500, -1900] },
      { name: 'loads at the joint', toward: null, force_N: [100, -50, -700], moment_Nm: [-150, 500, 100] },
    ];
    const fig = jointFreeBodyFigure(parts, { arm: 'A1', horizontal: [c, s, 0], force: kN, moment: kNm, roundOff: ROUND_OFF, maxHeight: 200 });
    expect(fig.obliqueNames).toBe(true);
    expect(fig.views).toEqual(['elevation', 'plan']);
    const texts = fig.labels.map((l) => l.text);
    // Along the arm in plan: F·h; normal to it: F·n with n = (h_y, -h_x, 0) (projection.ts); moment about n.
    const h: Vec3 = [c, s, 0];
    const n: Vec3 = [s, -c, 0];
    const a = parts[0]!;
    const along = (v: Vec3, u: Vec3) => Math.abs(v[0] * u[0] + v[1] * u[1] + v[2] * u[2]);
    expect(texts).toEqual(expect.arrayContaining([`Fh ${kN(along(a.force_N, h))}`, `Fn ${kN(along(a.force_N, n))}`, `Mn ${kNm(along(a.moment_Nm, n))}`, `Mh ${kNm(along(a.moment_Nm, h))}`]));
    // The plan keeps the global components.
    expect(texts).toEqual(expect.arrayContaining([`Fx ${kN(300)}`, `Fy ${kN(200)}`, `Mz ${kNm(2500)}`]));
    expect(texts).toContain('arm A2 (drawn aside)');
    expect(texts).toContain('loads at the joint');
    expect(fig.labels.filter((l) => l.part === 'loads at the joint' && l.kind === 'force').length).toBeGreaterThan(0);
    expectClean(fig, 'made-up joint');
  });
});

describe('the free-body section', () => {
  it('luminaire-twin (two arms at one node): each combination draws the joint once, before the first table; the second table says where it is drawn', () => {
    const loaded = { ...loadDesignFile(join(packageRoot(), 'examples/luminaire-twin.yaml')), file: 'examples/luminaire-twin.yaml' };
    const { analysis, checks } = analyseAndCheck(loaded);
    const blocks = freeBodySection(loaded, analysis, checks).blocks;
    const jointFigures = blocks.flatMap((b, k) => (b.kind === 'figure' && b.title.startsWith('Joint of arm') ? [k] : []));
    const tables = blocks.flatMap((b, k) => (b.kind === 'table' && b.title.startsWith('Free body of the joint') ? [k] : []));
    expect(tables.length).toBe(2 * jointFigures.length);
    expect(jointFigures.length).toBeGreaterThan(0);
    for (const k of jointFigures) {
      const fig = blocks[k]!;
      const table = blocks[k + 1]!;
      if (fig.kind !== 'figure' || table.kind !== 'table') throw new Error('a joint figure is followed by its table');
      expect(fig.title.replace('Joint of arm', '')).toBe(table.title.replace('Free body of the joint of arm', ''));
      expect(fig.title.startsWith('Joint of arm A1 ')).toBe(true);
      checkXml(fig.svg);
      const second = blocks[k + 2]!;
      expect(second.kind === 'table' && second.title.startsWith('Free body of the joint of arm A2') && second.note?.includes('drawn above with arm A1')).toBe(true);
    }
  });
});
