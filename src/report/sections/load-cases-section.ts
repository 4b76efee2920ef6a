// Section "Loads": the load rules once, then every load case with its calculation steps
// (the first case of each kind in full, later cases of the same kind as tables), and the
// resultant of each case from its loads.
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { CalcStep } from '../../calc/step.ts';
import type { LoadedDesign } from '../../design/design.ts';
import { LOAD_RULES, loadResultant } from '../../loads/index.ts';
import type { LoadCase } from '../../loads/load-types.ts';
import type { Block, DocSection } from '../document.ts';
import { display } from './display.ts';
import { stepsTable } from './step-table.ts';
import { templateBlocks } from './templates.ts';
import { vecText } from './vector-text.ts';

export const LOAD_CASES_TITLE = 'Loads';

const RULE_LABEL: Readonly<Record<keyof typeof LOAD_RULES, string>> = {
  memberWind: 'Wind on members',
  memberWindDiameter: 'Projected width of members',
  panelWind: 'Wind on sign panels',
  pointWind: 'Wind on point attachments',
  offsetMoment: 'Loads off the member axis',
  selfWeight: 'Self-weight of members',
  iceMembers: 'Ice on members',
  icePanels: 'Ice on sign panels',
  icePoints: 'Ice on point attachments',
  iceWind: 'Wind acting with ice',
};

const KIND_TEXT: Readonly<Record<LoadCase['kind'], string>> = {
  dead: 'dead load',
  wind: 'wind',
  ice: 'ice',
  'ice-wind': 'wind with ice',
};

/** Runs of this many steps or more with one formula inside a case are tabled after the first. */
const RUN_TO_TABLE = 4;

/** A case worked in full: each step as a block, except long runs of one formula (first in full, rest tabled). */
function fullSteps(lc: LoadCase, units: LoadedDesign['design']['units']): Block[] {
  const byFormula = new Map<string, CalcStep[]>();
  for (const s of lc.steps) byFormula.set(s.formula, [...(byFormula.get(s.formula) ?? []), s]);
  const tabled = new Set<CalcStep>();
  const out: Block[] = [];
  for (const s of lc.steps) {
    if (tabled.has(s)) continue;
    out.push({ kind: 'step', step: s });
    const run = byFormula.get(s.formula) ?? [];
    if (run.length >= RUN_TO_TABLE && run[0] === s) {
      const rest = run.slice(1);
      rest.forEach((r) => tabled.add(r));
      out.push(stepsTable(`${lc.id}: the other ${rest.length} steps of the form ${s.formula}`, rest, units));
    }
  }
  return out;
}

export function loadCasesSection(loaded: LoadedDesign, analysis: DesignAnalysis): DocSection {
  const { design } = loaded;
  const d = display(design.units);
  const blocks: Block[] = [...templateBlocks('load-cases', {}).blocks];
  blocks.push({
    kind: 'table',
    title: 'Rules by which the loads are found',
    header: ['Rule', 'Statement and source'],
    widths: [110, '*'],
    rows: (Object.keys(RULE_LABEL) as (keyof typeof LOAD_RULES)[]).map((k) => [RULE_LABEL[k], LOAD_RULES[k]]),
  });
  const seen = new Map<LoadCase['kind'], string>();
  for (const lc of analysis.cases) {
    blocks.push({ kind: 'heading', level: 2, text: `Load case ${lc.id}` });
    blocks.push({ kind: 'paragraph', text: lc.description });
    const first = seen.get(lc.kind);
    if (first === undefined) {
      seen.set(lc.kind, lc.id);
      blocks.push(...fullSteps(lc, design.units));
    } else {
      blocks.push(
        stepsTable(`Calculation steps of load case ${lc.id}`, lc.steps, design.units, {
          withoutSources: true,
          note: `The same kind of steps as load case ${first}, worked in full above with their sources, here with the values of this case.`,
        }),
      );
    }
  }
  blocks.push({ kind: 'heading', level: 2, text: 'Resultants of the load cases' });
  blocks.push({
    kind: 'table',
    title: 'Sum of the loads of each case (unfactored)',
    header: ['Load case', 'Kind', 'ΣFx', 'ΣFy', 'ΣFz', 'ΣMx', 'ΣMy', 'ΣMz'],
    widths: [62, 50, '*', '*', '*', '*', '*', '*'],
    rows: analysis.cases.map((lc) => {
      const r = loadResultant(analysis.model, lc.loads);
      return [lc.id, KIND_TEXT[lc.kind], ...vecText(r.force_N, 'force', d), ...vecText(r.moment_Nm, 'moment', d)];
    }),
    note: 'Forces along the global axes; moments about the global axes through the centre of the pole base (Z = 0), on the undeformed structure. Summed from the loads as applied to the frame model.',
  });
  return { id: 'load-cases', title: LOAD_CASES_TITLE, blocks };
}
