// The comparison as JSON for other tools: SI base units, each key with its unit suffix.
import { toolVersion } from '../version.ts';
import type { Comparison } from './run-compare.ts';

export function compareJson(c: Comparison): string {
  const out = {
    format: 'polebook-comparison',
    formatVersion: 1,
    tool: `polebook ${toolVersion()}`,
    caution: 'Draft results for comparison only, for review by a licensed professional engineer; the governing codes and the owner\u2019s standards govern.',
    input: { file: c.base.file.split(/[\\/]/).pop(), inputHash: c.base.inputHash, structureId: c.base.design.project.structureId },
    varied: c.specs.map((s) => ({ path: s.text, inputPaths: s.paths.map((p) => p.path), values: s.values.map((v) => v.label) })),
    variedFrom: c.source,
    alternatives: c.rows.map((r) => ({
      index: r.index,
      values: Object.fromEntries(c.specs.map((s, k) => [s.text, r.values[k]!.label])),
      file: r.file,
      inputHash: r.result.inputHash,
      status: r.result.status,
      message: r.result.message,
      results: r.result.metrics && {
        governing: r.result.metrics.governing,
        failingChecks: r.result.metrics.failing,
        warnings: r.result.metrics.warnings,
        baseMoment_Nm: r.result.metrics.baseMoment,
        baseShear_N: r.result.metrics.baseShear,
        baseTorque_Nm: r.result.metrics.baseTorque,
        poleTopSway_m: r.result.metrics.poleTopSway,
        armTipDeflection_m: r.result.metrics.armTipDeflection,
        boltForce_N: r.result.metrics.boltForce,
        steelWeight_N: r.result.metrics.steelWeight_N,
        armLengths_m: r.result.metrics.armLengths_m,
      },
    })),
    lightestPassing: c.picks.lightest?.index ?? null,
    longestPassingArm: c.picks.longestArm && { alternative: c.picks.longestArm.row.index, arm: c.picks.longestArm.arm, length_m: c.picks.longestArm.length_m },
  };
  return `${JSON.stringify(out, (_k, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2)}\n`;
}
