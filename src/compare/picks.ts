// What the engineer looks for first: the lightest alternative that passes every check, and
// the longest arm among those that pass (only when an arm's length is varied).
import type { CompareRow } from './run-compare.ts';
import type { VarySpec } from './vary-spec.ts';

export interface Picks {
  /** Lightest passing alternative by steel weight (lowest index on a tie); null: none passes. */
  readonly lightest: CompareRow | null;
  /** Longest passing arm: the arm whose length is varied, the passing row where it is longest. */
  readonly longestArm: { readonly row: CompareRow; readonly arm: string; readonly length_m: number } | null;
  /** The ids of arms whose length is varied. */
  readonly variedArms: readonly string[];
}

export function variedArmIds(specs: readonly VarySpec[], armIds: readonly string[]): string[] {
  return specs
    .flatMap((s) => s.paths.map((p) => p.path))
    .filter((p) => p.length === 4 && p[0] === 'structure' && p[1] === 'arms' && p[3] === 'length' && typeof p[2] === 'number')
    .map((p) => armIds[p[2] as number]!)
    .filter((id) => id !== undefined);
}

export function picksOf(rows: readonly CompareRow[], specs: readonly VarySpec[], armIds: readonly string[]): Picks {
  const passing = rows.filter((r) => r.result.status === 'passes' && r.result.metrics !== null);
  const lightest = passing.reduce<CompareRow | null>((a, r) => (a === null || r.result.metrics!.steelWeight_N < a.result.metrics!.steelWeight_N ? r : a), null);
  const variedArms = variedArmIds(specs, armIds);
  let longestArm: Picks['longestArm'] = null;
  for (const arm of variedArms) {
    for (const row of passing) {
      const L = row.result.metrics!.armLengths_m[arm];
      if (L !== undefined && (longestArm === null || L > longestArm.length_m)) longestArm = { row, arm, length_m: L };
    }
  }
  return { lightest, longestArm, variedArms };
}
