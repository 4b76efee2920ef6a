// The comparison as CSV: one row per alternative, quantities in the input's units (each header
// names its unit), plain numbers with six significant figures.
import { formatNumber, type UnitSystem } from '../units/units.ts';
import { COLUMNS, inUnits, titleWithUnit } from './columns.ts';
import type { Comparison } from './run-compare.ts';
import { statusText } from './status-text.ts';

function cell(s: string): string {
  return /[",\n\r]/.test(s) || /^\s|\s$/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function compareCsv(c: Comparison): string {
  const system: UnitSystem = c.base.design.units;
  const header = ['alternative', ...c.specs.map((s) => s.text), 'status', ...COLUMNS.map((col) => titleWithUnit(col, system)), 'governing check', 'governing place', 'limits (same order: sway, arm tip, bolt)', 'input file', 'input hash', 'note'];
  const lines = [header.map(cell).join(',')];
  for (const r of c.rows) {
    const m = r.result.metrics;
    const nums = COLUMNS.map((col) => {
      const v = m ? col.value(m) : null;
      return v === null ? '' : formatNumber(col.dim === 'ratio' ? v : inUnits(v, col.dim, system), 6);
    });
    const limits = m ? COLUMNS.filter((col) => col.limit && col.dim !== 'ratio').map((col) => { const l = col.limit!(m); return l === null ? '-' : formatNumber(inUnits(l, col.dim, system), 6); }).join(' / ') : '';
    const g = m?.governing;
    const place = g ? `${g.member}${g.s_m !== null ? ` at ${formatNumber(inUnits(g.s_m, 'length', system), 4)}` : ''}${g.combination ? `, ${g.combination}` : ''}` : '';
    const row = [String(r.index), ...r.values.map((v) => v.label), statusText(r.result.status), ...nums, g?.title ?? '', place, limits, r.file, r.result.inputHash, r.result.message ?? ''];
    lines.push(row.map(cell).join(','));
  }
  return `${lines.join('\n')}\n`;
}
