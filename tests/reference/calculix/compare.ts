// polebook's first-order solution (solveLoads, src/analysis/analyze.ts) against a ccx run of the
// same model and loads, reduced to the numbers the reference tests hold to tolerances.
import type { FrameModel, Vec3, Vec6 } from '../../../src/model/frame.ts';
import type { AppliedLoad } from '../../../src/loads/load-types.ts';
import { solveLoads } from '../../../src/analysis/analyze.ts';
import { runCalculix, type RunOptions } from './run-calculix.ts';
import { norm, sub } from './vec3.ts';

export interface Comparison {
  readonly worstNode: number;
  /** max over nodes of |u_polebook - u_ccx| / max over nodes of |u_ccx|. */
  readonly worstOfFrame: number;
  /**
   * |u_polebook - u_ccx| / |u_ccx| at each key node, for translations and for rotations; and the same
   * differences over max(|u_ccx| at the node, a tenth of the largest |u_ccx| among the key nodes)
   * ("floored"), so that a node that hardly moves (the top of a balanced twin pole under dead load
   * turns 0.4 % as much as the arm tips) is not held to a fraction of nearly nothing.
   */
  readonly keyNodes: readonly { node: number; error: number; rotationError: number; errorFloored: number; rotationErrorFloored: number }[];
  readonly reactionForceError: number;
  readonly reactionMomentError: number;
  /** Largest translation in the frame by ccx (m), and the ccx process wall time (ms). */
  readonly largestTranslation_m: number;
  readonly ccxWall_ms: number;
}

const translation = (u: Vec6): Vec3 => [u[0], u[1], u[2]];
const part = (v: Vec6, k: number): Vec3 => [v[k], v[k + 1], v[k + 2]];
const relErr = (a: Vec3, b: Vec3): number => norm(sub(a, b)) / norm(b);
export const pct = (x: number): string => `${(100 * x).toFixed(3)} %`;

export async function compareWithCalculix(
  name: string,
  model: FrameModel,
  loads: readonly AppliedLoad[],
  keyNodes: readonly number[],
  options: RunOptions = {},
): Promise<Comparison> {
  const ccx = await runCalculix(model, loads, { ...options, rotationProbes: keyNodes });
  const pb = solveLoads(model, loads);
  const biggest = Math.max(...ccx.translations_m.map(norm));
  let worstOfFrame = 0;
  let worstNode = -1;
  model.nodes.forEach((n) => {
    const e = norm(sub(translation(pb.displacements[n.id]!), ccx.translations_m[n.id]!)) / biggest;
    if (e > worstOfFrame) {
      worstOfFrame = e;
      worstNode = n.id;
    }
  });
  const largestKeyTranslation = Math.max(...keyNodes.map((n) => norm(ccx.translations_m[n]!)));
  const largestKeyRotation = Math.max(...keyNodes.map((n) => norm(ccx.rotations_rad.get(n)!)));
  const key = keyNodes.map((node) => {
    const rot = ccx.rotations_rad.get(node)!;
    const u = pb.displacements[node]!;
    const dt = norm(sub(translation(u), ccx.translations_m[node]!));
    const dr = norm(sub(part(u, 3), rot));
    return {
      node,
      error: relErr(translation(u), ccx.translations_m[node]!),
      rotationError: relErr(part(u, 3), rot),
      errorFloored: dt / Math.max(norm(ccx.translations_m[node]!), largestKeyTranslation / 10),
      rotationErrorFloored: dr / Math.max(norm(rot), largestKeyRotation / 10),
    };
  });
  const expected = ccx.reactions[0]!;
  const got = pb.reactions.find((r) => r.node === expected.node);
  if (got === undefined) throw new Error(`${name}: polebook gives no reaction at node ${expected.node}`);
  const result: Comparison = {
    worstNode,
    worstOfFrame,
    keyNodes: key,
    reactionForceError: relErr(part(got.force, 0), part(expected.force, 0)),
    reactionMomentError: relErr(part(got.force, 3), part(expected.force, 3)),
    largestTranslation_m: biggest,
    ccxWall_ms: ccx.ccxWall_ms,
  };
  console.info(
    `[CalculiX] ${name}: frame worst ${pct(result.worstOfFrame)} (node ${worstNode}); key nodes ` +
      key.map((k) => `${k.node}: ${pct(k.error)} (rotation ${pct(k.rotationError)}; floored ${pct(k.errorFloored)}, ${pct(k.rotationErrorFloored)})`).join(', ') +
      `; reaction force ${pct(result.reactionForceError)}, moment ${pct(result.reactionMomentError)}`,
  );
  return result;
}
