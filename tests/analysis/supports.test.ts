// Supports: mechanisms and missing supports are detected and named; base springs.
import { describe, expect, it } from 'vitest';
import { solveLoads } from '../../src/analysis/analyze.ts';
import { modalAnalysis } from '../../src/analysis/modal.ts';
import { UnstableStructureError } from '../../src/errors.ts';
import type { FrameModel } from '../../src/model/frame.ts';
import { cantilever, FrameBuilder, nodal, roundTube } from './frame-helpers.ts';

const sec = roundTube(0.3, 0.008);
const EI = sec.E_Pa * sec.Iz_m4;

function catchUnstable(f: () => unknown): UnstableStructureError {
  try {
    f();
  } catch (e) {
    if (e instanceof UnstableStructureError) return e;
    throw e;
  }
  throw new Error('expected UnstableStructureError, nothing was thrown');
}

const dofPattern = /node \d+ \([^)]*\) (ux|uy|uz|rx|ry|rz)/;

describe('mechanism detection', () => {
  it('a frame with no support at all throws, naming a node and a dof', () => {
    const { model, nodes } = cantilever(6, 4, [0, 0, 1], sec);
    const free: FrameModel = { ...model, supports: [] };
    const err = catchUnstable(() => solveLoads(free, [nodal(nodes[4], [1e3, 0, 0])]));
    expect(err.message).toMatch(dofPattern);
    expect(err.detail.node).toBeTypeOf('number');
    expect(err.detail.dof).toMatch(/^(ux|uy|uz|rx|ry|rz)$/);
    expect(err.exitCode).toBe(3);
  });

  it('a pole base that is pinned (rotations free) is a mechanism: the error names a rotation', () => {
    const { model, nodes } = cantilever(6, 4, [0, 0, 1], sec);
    const pinned: FrameModel = {
      ...model,
      supports: [{ node: 0, fixed: [true, true, true, false, false, false], springs: [0, 0, 0, 0, 0, 0] }],
    };
    const err = catchUnstable(() => solveLoads(pinned, [nodal(nodes[4], [1e3, 0, 0])]));
    expect(err.message).toMatch(dofPattern);
    expect(err.message).toContain('mechanism');
  });

  it('a base free to spin about the pole axis names rz', () => {
    const { model, nodes } = cantilever(6, 4, [0, 0, 1], sec);
    const spin: FrameModel = {
      ...model,
      supports: [{ node: 0, fixed: [true, true, true, true, true, false], springs: [0, 0, 0, 0, 0, 0] }],
    };
    const err = catchUnstable(() => solveLoads(spin, [nodal(nodes[4], [1e3, 0, 0])]));
    expect(err.detail.dof).toBe('rz');
    expect(err.message).toMatch(/node \d+ \([^)]*\) rz/);
  });

  it('a node attached to nothing is named', () => {
    const b = new FrameBuilder();
    const base = b.node([0, 0, 0], 'base');
    b.fix(base);
    b.member('pole', 'pole', base, [0, 0, 5], 3, () => sec);
    const lost = b.node([3, 0, 5], 'attachment:P9');
    const err = catchUnstable(() => solveLoads(b.build(), [nodal(lost, [0, 0, -100])]));
    expect(err.message).toContain(`node ${lost} (attachment:P9)`);
  });

  it('modal analysis of an unsupported frame throws the same error', () => {
    const { model } = cantilever(6, 4, [0, 0, 1], sec);
    expect(() => modalAnalysis({ ...model, supports: [] }, 2)).toThrow(UnstableStructureError);
  });
});

describe('base with a rotational spring', () => {
  it('tip deflection P L^3/(3EI) + P L^2/k (rigid rotation of the base spring, statics)', () => {
    const L = 6;
    const P = 5e3;
    const k = 2e7; // N*m/rad
    const { model, nodes } = cantilever(L, 4, [0, 0, 1], sec);
    const sprung: FrameModel = {
      ...model,
      supports: [{ node: 0, fixed: [true, true, true, false, false, true], springs: [0, 0, 0, k, k, 0] }],
    };
    const r = solveLoads(sprung, [nodal(nodes[4], [P, 0, 0])]);
    // AISC Table 3-23 cantilever tip load P L^3/(3EI) plus the base rotation P L / k times L
    const expected = (P * L ** 3) / (3 * EI) + (P * L * L) / k;
    expect(Math.abs(r.displacements[nodes[4]][0] - expected) / expected).toBeLessThan(1e-9);
    // the spring's reaction moment is P L (statics) and equals -k * rotation
    const R = r.reactions[0].force;
    expect(Math.abs(R[4] + P * L) / (P * L)).toBeLessThan(1e-9);
    expect(Math.abs(R[4] + k * r.displacements[0][4]) / (P * L)).toBeLessThan(1e-12);
    expect(r.statics.relativeResidual).toBeLessThan(1e-12);
  });
});
