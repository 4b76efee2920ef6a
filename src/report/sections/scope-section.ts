// Section "Scope and cautions": what the package covers and what it does not (text in templates/scope.md).
import type { LoadedDesign } from '../../design/design.ts';
import type { DocSection } from '../document.ts';
import { KIND_LABEL, display } from './display.ts';
import { templateBlocks } from './templates.ts';
import { labelSections } from '../section-labels.ts';
import { INPUT_ECHO_ID } from './input-echo-section.ts';
import type { CheckResults } from '../../checks/check-types.ts';
import { CHECK_ORDER, CHECK_SCOPE, CHECK_TITLES, verdictByType } from '../../checks/verdict.ts';
import type { CheckType } from '../../checks/check-types.ts';
import { renderTemplate } from './templates.ts';
import { HAND_CHECK_TITLE } from './hand-check-section.ts';

export const SCOPE_TITLE = 'Scope and cautions';

/** `contents` is every section of the package in print order, this one included. */
export function scopeSection(loaded: LoadedDesign, contents: readonly DocSection[], checks: CheckResults | null): DocSection {
  const { design } = loaded;
  const p = design.project;
  const labelled = labelSections(contents);
  const sectionList = labelled.map((l) => `- ${l.name}: ${l.section.title}`).join('\n');
  const echo = labelled.find((l) => l.section.id === INPUT_ECHO_ID);
  const t = templateBlocks('scope', {
    structureId: p.structureId,
    structureKind: KIND_LABEL[design.kind].toLowerCase(),
    projectName: p.name,
    location: p.location,
    unitSystem: design.units === 'us' ? 'US customary' : 'SI',
    echoAppendix: echo ? echo.name : 'the input file',
    sectionList,
    checksMade: checksMade(checks),
    checksNotMade: checksNotMade(loaded, checks),
    assumptionsTable: '"Assumptions and defaults" of section "Design criteria and assumptions"',
    revision: loaded.design.project.revisions.at(-1)?.id ?? 'none given',
    inputHash: loaded.inputHash,
  });
  return { id: 'scope', title: SCOPE_TITLE, blocks: t.blocks };
}

function checksMade(checks: CheckResults | null): string {
  if (checks === null || checks.records.length === 0) return 'None: no design check was made for this document.';
  return verdictByType(checks.records)
    .map((v) => `- ${v.title}: ${CHECK_SCOPE[v.type]}.${v.failures > 0 && v.worst.ratio === Infinity ? ' It could not be made in full (see its reason in the checks section) and is reported as failed.' : ''}`)
    .join('\n');
}

/** The standing list (templates/scope-not-checked.md), then every check type this package does not make. */
function checksNotMade(loaded: LoadedDesign, checks: CheckResults | null): string {
  const made = new Set((checks?.records ?? []).map((r) => r.type));
  const bolts = loaded.design.criteria.anchorBolts;
  const d = display(loaded.design.units);
  const noBolts = 'no anchor bolts are given (criteria.anchorBolts); check them with the base reactions';
  const why: Partial<Record<CheckType, string>> = {
    fatigue: loaded.design.fatigue === null ? 'no fatigue loads are given (loads.fatigue)' : 'not made in this package',
    'deflection-fatigue': loaded.design.fatigue === null ? 'no fatigue loads are given' : 'no galloping or truck-gust load applies to this structure',
    'deflection-dead': 'there is no arm',
    'bolt-tension': noBolts,
    'bolt-shear': noBolts,
    'bolt-combined': noBolts,
    'bolt-bending': bolts === null ? noBolts : `the stand-off (${d.q(bolts.standOff_m, 'section')}) is not more than one bolt diameter, so bolt bending is neglected (from memory, verify)`,
    'base-plate': bolts === null ? noBolts : 'no base plate is given (criteria.basePlate)',
  };
  const absent = CHECK_ORDER.filter((t) => !made.has(t)).map((t) => `- ${CHECK_TITLES[t]}: not checked${why[t] ? ` (${why[t]})` : ''}.`);
  // The hand check works on an arm and the pole in its plane (src/report/sections/hand-check-section.ts).
  const noHandCheck = loaded.design.arms.length === 0 ? [`- ${HAND_CHECK_TITLE}: not made (the design has no arm; the method checks an arm and the pole in the arm's plane).`] : [];
  return [renderTemplate('scope-not-checked', {}).trim(), ...absent, ...noHandCheck].join('\n');
}
