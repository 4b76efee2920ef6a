// Section "Loads": the load rules once, then every load case with its calculation steps
// (each form of step worked in full where it first occurs, every case's steps as a table),
// and the resultant of each case from its loads.
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { CalcStep } from '../../calc/step.ts';
import type { LoadedDesign } from '../../design/design.ts';
import { LOAD_RULES, loadResultant } from '../../loads/index.ts';
import type { LoadCase } from '../../loads/load-types.ts';
import { FATIGUE_RULES } from '../../loads/fatigue-load.ts';
import type { Block, DocSection } from '../document.ts';
import { display } from './display.ts';
import { stepsTable } from './step-table.ts';
import { templateBlocks } from './templates.ts';
import { vecText } from './vector-text.ts';

export const LOAD_CASES_TITLE = 'Loads';

const RULE_LABEL: Readonly<Record<keyof typeof LOAD_RULES, string>> = {
  memberWind: 'Wind on members (cross-flow rule, loads.wind.memberRule)',
  memberWindProjected: 'Wind on members (projected-area rule, loads.wind.memberRule)',
  memberWindDiameter: 'Projected width of members',
  panelWind: 'Wind on sign panels',
  pointWind: 'Wind on point attachments',
  pointWindSides: 'Wind on point attachments with a side area',
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
  fatigue: 'fatigue',
};

const FATIGUE_RULE_LABEL: Readonly<Record<keyof typeof FATIGUE_RULES, string>> = {
  galloping: 'Fatigue: galloping',
  naturalGust: 'Fatigue: natural wind gust',
  truckGust: 'Fatigue: truck-induced gust',
};

/** A step's form: steps of one form differ only in their values. */
const formOf = (s: CalcStep): string => `${s.formula}\u0000${s.source}`;

export const LOAD_STEPS_TITLE = 'Load calculation steps, case by case';

/** The loads section (rules, resultants) and its appendix with every calculation step by load case:
 * the checker meets the loads first and finds each derivation in the appendix. */
export function loadCasesSections(loaded: LoadedDesign, analysis: DesignAnalysis): { main: DocSection; steps: DocSection } {
  const { design } = loaded;
  const d = display(design.units);
  const blocks: Block[] = [...templateBlocks('load-cases', {}).blocks];
  const stepBlocks: Block[] = [...templateBlocks('load-steps', {}).blocks];
  blocks.push({
    kind: 'table',
    title: 'Rules by which the loads are found',
    header: ['Rule', 'Statement and source'],
    widths: [110, '*'],
    rows: [
      // Only the member wind rule in use is printed.
      ...(Object.keys(RULE_LABEL) as (keyof typeof LOAD_RULES)[])
        .filter((k) => k !== (design.wind.memberRule === 'projected-area' ? 'memberWind' : 'memberWindProjected'))
        .map((k) => [RULE_LABEL[k], LOAD_RULES[k]]),
      ...(design.fatigue ? (Object.keys(FATIGUE_RULE_LABEL) as (keyof typeof FATIGUE_RULES)[]).map((k) => [FATIGUE_RULE_LABEL[k], FATIGUE_RULES[k]]) : []),
    ],
  });
  // The sources the steps cite, listed once and referred to by number in the tables.
  const sources = [...new Set(analysis.cases.flatMap((lc) => lc.steps.map((st) => st.source)))];
  const sourceRef = (src: string) => `[${sources.indexOf(src) + 1}]`;
  stepBlocks.push({
    kind: 'table',
    title: 'Sources cited by the load calculation steps',
    header: ['Ref.', 'Source'],
    widths: [36, '*'],
    rows: sources.map((src, k) => [`[${k + 1}]`, src]),
  });
  // Each form of step is worked in full once, where it first occurs; every case then lists all
  // its steps, in order, as a table with their values.
  const worked = new Set<string>();
  for (const lc of analysis.cases) {
    stepBlocks.push({ kind: 'heading', level: 2, text: `Load case ${lc.id}` });
    stepBlocks.push({ kind: 'paragraph', text: lc.description });
    const fresh: CalcStep[] = [];
    for (const st of lc.steps) {
      if (worked.has(formOf(st))) continue;
      worked.add(formOf(st));
      fresh.push(st);
    }
    for (const st of fresh) stepBlocks.push({ kind: 'step', step: st });
    if (fresh.length < lc.steps.length) {
      stepBlocks.push(
        stepsTable(`Calculation steps of load case ${lc.id}`, lc.steps, design.units, {
          sourceRef,
          note: fresh.length > 0 ? 'The steps worked in full above are repeated here in order with the others of this case. Sources: the numbered list at the start of this appendix.' : 'Each form of step is worked in full where it first occurs in this appendix. Sources: the numbered list at its start.',
        }),
      );
    }
  }
  blocks.push({ kind: 'heading', level: 2, text: 'Resultants of the load cases' });
  blocks.push({ kind: 'paragraph', text: `The sum of the loads of each case, unfactored: a check on the calculation steps (appendix "${LOAD_STEPS_TITLE}"), and the loads the reactions of each combination must balance.` });
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
  return {
    main: { id: 'load-cases', title: LOAD_CASES_TITLE, blocks },
    steps: { id: 'load-steps', title: LOAD_STEPS_TITLE, blocks: stepBlocks, appendix: true },
  };
}
