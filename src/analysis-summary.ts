// A few lines for the terminal after `polebook build`: what was analysed and the governing values.
import type { Design } from './design/design.ts';
import type { DesignAnalysis } from './analyse-design.ts';
import { envelope, resultsOf } from './analysis/envelope.ts';
import { isFactored } from './design/combination-use.ts';
import { formatQuantity, formatNumber } from './units/units.ts';
import { largeMovements, SMALL_DISPLACEMENT_LIMIT, worstPerMember } from './analysis/displacement-range.ts';
import { memberName } from './design/member-names.ts';

export function analysisSummaryLines(design: Design, a: DesignAnalysis): string[] {
  const q = (si: number, dim: Parameters<typeof formatQuantity>[1]) => formatQuantity(si, dim, design.units);
  const results = Object.values(a.results);
  const lines = [
    `${design.project.structureId}: ${a.model.nodes.length} nodes, ${a.model.elements.length} elements, ${a.cases.length} load cases, ${results.length} combinations, ${a.options.secondOrder ? 'second order (P-delta)' : 'first order'}`,
  ];
  const factored = a.combinations.filter((c) => isFactored(c.category)).map((c) => c.id);
  if (factored.length > 0) {
    const base = envelope(resultsOf(a.results, factored), 'pole', 'Mres');
    lines.push(`  largest pole moment (factored) ${q(base.max.value, 'moment')} at ${q(base.max.s_m, 'length')} under ${base.max.combination}`);
  }
  const amplified = results.filter((r) => r.baseMoment?.amplification != null);
  if (a.options.secondOrder && amplified.length > 0) {
    const worst = amplified.reduce((x, y) => ((y.baseMoment!.amplification ?? 0) > (x.baseMoment!.amplification ?? 0) ? y : x));
    lines.push(`  largest P-delta amplification of the base moment ${formatNumber(worst.baseMoment!.amplification!, 4)} under ${worst.combination}`);
  }
  const worstForce = Math.max(...results.map((r) => r.statics.relativeForceResidual));
  const worstMoment = Math.max(...results.map((r) => r.statics.relativeMomentResidual));
  lines.push(`  statics check: largest relative residual, forces ${worstForce.toExponential(1)}, moments ${worstMoment.toExponential(1)}${a.options.secondOrder ? ' (deformed configuration; see the package for the moment residual of the P-delta method)' : ''}`);
  if (a.modes.length > 0) lines.push(`  first natural frequency ${formatNumber(a.modes[0]!.frequency_Hz, 3)} Hz`);
  return lines;
}

/** One warning per member whose tip moves beyond the small-displacement range, at its worst combination. */
export function movementWarningLines(design: Design, a: DesignAnalysis): string[] {
  const q = (si: number, dim: Parameters<typeof formatQuantity>[1]) => formatQuantity(si, dim, design.units);
  return worstPerMember(a.model, largeMovements(a.model, a.results)).map((x) => {
    const tip = x.member === 'pole' ? 'pole top' : `${memberName(x.member)} tip`;
    // An arm's length in the model runs from the pole face, whatever the input measured it from.
    const from = x.member === 'pole' ? '' : ' from the pole face';
    return (
      `warning: ${tip} moves ${q(x.movement_m, 'length')} under ${x.combination}, ${formatNumber(x.ratio, 3)} of its length ${q(x.length_m, 'length')}${from}, ` +
      `beyond our limit of L/${formatNumber(1 / SMALL_DISPLACEMENT_LIMIT)} for a small-displacement analysis: its results are outside the method`
    );
  });
}
