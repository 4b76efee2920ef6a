// A calculation step is a plain record: what it is, its symbol, formula,
// the formula with values substituted, the result and its source. Quantities
// stay in SI with their dimension; the report prints them in the user's units.
import type { Dim } from '../units/units.ts';

export interface Qty {
  readonly si: number;
  readonly dim: Dim;
}

export const qty = (si: number, dim: Dim): Qty => ({ si, dim });

/** A formula with values: text pieces and quantities, printed in order. */
export type Expr = ReadonlyArray<string | Qty>;

/** A total printed with its addends: "a + b + c" (a checker adds them up by hand). */
export function sumExpr(addends: readonly Qty[]): Expr {
  return addends.flatMap((q, k) => (k === 0 ? [q] : [' + ', q]));
}

export type StepStatus = 'info' | 'ok' | 'fail' | 'warn';

export interface CalcStep {
  readonly description: string;
  readonly symbol: string;
  /** The formula, either as a right-hand side ("π/4 (D² − d²)") or as a whole equation
   * ("A = π/4 (D² − d²)"); the report prints the symbol only once. */
  readonly formula: string;
  readonly substituted: Expr;
  readonly result: Qty;
  readonly source: string;
  readonly status: StepStatus;
}

/** An explicit collector passed to the code that makes steps (never a global registry). */
export class StepCollector {
  private readonly list: CalcStep[] = [];
  add(step: Omit<CalcStep, 'status'> & { status?: StepStatus }): Qty {
    this.list.push({ status: 'info', ...step });
    return step.result;
  }
  get steps(): readonly CalcStep[] {
    return this.list;
  }
}
