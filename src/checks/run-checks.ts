// The checks stage: reads the design and the analysis results, never the renderer, and
// returns plain records (see check-types.ts) in a stable order.
import type { CalcStep } from '../calc/step.ts';
import type { Design } from '../design/design.ts';
import type { DesignAnalysis } from '../analyse-design.ts';
import type { CheckResults } from './check-types.ts';
import { governingOf, type CheckedRecords } from './check-record.ts';
import { deflectionChecks } from './deflection-checks.ts';
import { vortexChecks } from './vortex-checks.ts';
import { fatigueChecks } from './fatigue-checks.ts';
import { memberChecks } from './member-checks.ts';
import { anchorageChecks } from './anchorage-checks.ts';
import { anchorBoltFatigue } from './anchor-bolt-fatigue.ts';

export function runChecks(design: Design, analysis: DesignAnalysis): CheckResults {
  const parts: CheckedRecords[] = [memberChecks(design, analysis), deflectionChecks(design, analysis), anchorageChecks(design, analysis), fatigueChecks(design, analysis), anchorBoltFatigue(design, analysis), vortexChecks(design, analysis)];
  const records = parts.flatMap((p) => p.records);
  const steps = new Map(parts.flatMap((p) => [...p.steps]));
  const governing = governingOf(records, (r) => (steps.get(r) ?? ((): CalcStep[] => []))());
  return { records, governing, fails: records.some((r) => r.status === 'fail') };
}
