// The reaction at the pole base support under one combination, global [Fx, Fy, Fz, Mx, My, Mz]
// by the support on the structure.
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { Vec6 } from '../../model/frame.ts';

export function baseReaction(analysis: DesignAnalysis, combination: string): Vec6 {
  const node = analysis.model.supports[0]!.node;
  const r = analysis.results[combination]?.reactions.find((x) => x.node === node);
  if (!r) throw new Error(`combination ${combination} has no reaction at the base node ${node}`);
  return r.force;
}
