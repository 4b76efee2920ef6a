// A calculation step as a reviewer reads it by hand: what it is, symbol = formula,
// = the formula with values, = the result with its unit, the source, and a status mark.
import type { Content } from 'pdfmake/interfaces.js';
import type { CalcStep, Expr, Qty, StepStatus } from '../../calc/step.ts';
import { formatQuantity, type UnitSystem } from '../../units/units.ts';
import { COLOR, STYLES } from './theme.ts';

function formatQty(q: Qty, units: UnitSystem): string {
  return formatQuantity(q.si, q.dim, units);
}

/** Text pieces and quantities in order; quantities print in the user's units. */
export function formatExpr(expr: Expr, units: UnitSystem): string {
  return expr.map((piece) => (typeof piece === 'string' ? piece : formatQty(piece, units))).join('');
}

const STATUS_MARK: Readonly<Record<StepStatus, { text: string; color: string }>> = {
  info: { text: '', color: COLOR.muted },
  ok: { text: '✓ OK', color: COLOR.accent },
  warn: { text: '⚠ REVIEW', color: COLOR.text },
  fail: { text: '✗ NOT OK', color: COLOR.fail },
};

/** The formula without a leading "symbol =" that would print the symbol twice ("d = d = D − 2t"). */
export function formulaBody(step: CalcStep): string {
  const lead = `${step.symbol} = `;
  return step.formula.startsWith(lead) ? step.formula.slice(lead.length) : step.formula;
}

/** The step as one unbreakable block with a thin accent rule on its left. */
export function stepContent(step: CalcStep, units: UnitSystem): Content {
  const mark = STATUS_MARK[step.status];
  const lines: Content[] = [
    { text: step.description, bold: true, margin: [0, 0, 0, 2] },
    { text: [{ text: step.symbol, italics: true }, ' = ', formulaBody(step)] },
    { text: `= ${formatExpr(step.substituted, units)}`, margin: [10, 1, 0, 0] },
    { text: [`= `, { text: formatQty(step.result, units), bold: true }], margin: [10, 1, 0, 0] },
    { text: `Source: ${step.source}`, style: 'small', margin: [0, 3, 0, 0] },
  ];
  return {
    unbreakable: true,
    margin: [0, 2, 0, 8],
    table: {
      widths: ['*', 62],
      body: [[{ stack: lines }, { text: mark.text, bold: true, color: mark.color, alignment: 'right', fontSize: STYLES.tableCell.fontSize }]],
    },
    layout: {
      hLineWidth: () => 0,
      vLineWidth: (i: number) => (i === 0 ? 1.5 : 0),
      vLineColor: () => COLOR.accent,
      paddingLeft: (i: number) => (i === 0 ? 8 : 4),
      paddingRight: () => 0,
      paddingTop: () => 2,
      paddingBottom: () => 2,
    },
  };
}
