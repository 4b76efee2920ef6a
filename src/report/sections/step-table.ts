// Calculation steps as rows of a table, for runs of similar steps: each row keeps what a
// step block shows (what, symbol = formula, the values substituted, the result with its unit,
// the source), only more compactly.
import type { CalcStep, Expr } from '../../calc/step.ts';
import { formatQuantity, type UnitSystem } from '../../units/units.ts';
import type { Block } from '../document.ts';
import { cleanSteps } from './round-off.ts';

/** A formula with its values, quantities in the user's units (the same words the step block prints). */
export function exprText(expr: Expr, units: UnitSystem): string {
  return expr.map((piece) => (typeof piece === 'string' ? piece : formatQuantity(piece.si, piece.dim, units))).join('');
}

/** The formula with its symbol; formulas that already name their left-hand side print as they are. */
export function formulaText(s: CalcStep): string {
  return s.formula.includes('=') ? s.formula : `${s.symbol} = ${s.formula}`;
}

export interface StepsTableOptions {
  readonly note?: string;
  /** Leave out the source column and list (when the sources were printed with the same steps before). */
  readonly withoutSources?: boolean;
  /** Short references to a list of sources printed once elsewhere (the table then prints no source list). */
  readonly sourceRef?: (source: string) => string;
}

export function stepsTable(title: string, given: readonly CalcStep[], units: UnitSystem, opts: StepsTableOptions = {}): Block {
  // round-off next to the largest quantity of its kind in the table prints as 0 ("0 kip", not "3.951e-17 kip")
  const steps = cleanSteps(given);
  if (opts.withoutSources) {
    return {
      kind: 'table',
      title,
      header: ['Quantity', 'Formula', 'Values', 'Result'],
      widths: ['*', 82, '*', 62],
      rows: steps.map((s) => [s.description, formulaText(s), `= ${exprText(s.substituted, units)}`, formatQuantity(s.result.si, s.result.dim, units)]),
      ...(opts.note ? { note: opts.note } : {}),
    };
  }
  if (opts.sourceRef) {
    const ref = opts.sourceRef;
    return {
      kind: 'table',
      title,
      header: ['Quantity', 'Formula', 'Values', 'Result', 'Source'],
      widths: ['*', 82, '*', 62, 36],
      rows: steps.map((s) => [s.description, formulaText(s), `= ${exprText(s.substituted, units)}`, formatQuantity(s.result.si, s.result.dim, units), ref(s.source)]),
      ...(opts.note ? { note: opts.note } : {}),
    };
  }
  const sources = [...new Set(steps.map((s) => s.source))];
  const rows = steps.map((s) => [
    s.description,
    formulaText(s),
    `= ${exprText(s.substituted, units)}`,
    formatQuantity(s.result.si, s.result.dim, units),
    `[${sources.indexOf(s.source) + 1}]`,
  ]);
  const sourceNote = sources.map((s, k) => `[${k + 1}] ${s}`).join('  ');
  return {
    kind: 'table',
    title,
    header: ['Quantity', 'Formula', 'Values', 'Result', 'Source'],
    widths: ['*', 82, '*', 62, 36],
    rows,
    note: opts.note ? `${opts.note} Sources: ${sourceNote}` : `Sources: ${sourceNote}`,
  };
}
