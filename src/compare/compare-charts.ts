// The charts of a comparison: each quantity against the first varied value, limits dashed,
// failing alternatives drawn as red crosses. Specifications for src/report/charts.
import type { TopLevelSpec } from 'vega-lite';
import { renderChartSvg } from '../report/charts/index.ts';
import type { UnitSystem } from '../units/units.ts';
import { keyUnit } from './input-path.ts';
import { COLUMNS, inUnits, titleWithUnit, type Column } from './columns.ts';
import type { Comparison } from './run-compare.ts';

const PASS_COLOR = '#24507a';
const FAIL_COLOR = '#b3261e';
const LIMIT_COLOR = '#7a5a00';

export interface ChartFigure {
  readonly title: string;
  readonly svg: string;
  readonly width_pt: number;
  readonly caption: string;
}

/** The x axis: the first varied key, with its unit. */
export function xAxisOf(c: Comparison): { title: string; numeric: boolean } {
  const s = c.specs[0]!;
  const numeric = s.values.every((v) => v.number !== null);
  const unit = s.values[0]?.unit ?? keyUnit(s.resolved.description, c.base.design.units);
  return { title: unit ? `${s.text} (${unit})` : s.text, numeric };
}

function pointsOf(c: Comparison, col: Column, system: UnitSystem) {
  const series = (values: readonly { label: string }[]) => (c.specs.length > 1 ? values.slice(1).map((v, k) => `${c.specs[k + 1]!.text} = ${v.label}`).join(', ') : 'alternatives');
  const conv = (v: number) => (col.dim === 'ratio' ? v : inUnits(v, col.dim, system));
  const out: Record<string, unknown>[] = [];
  const limits: Record<string, unknown>[] = [];
  for (const r of c.rows) {
    const m = r.result.metrics;
    if (!m) continue;
    const v = col.value(m);
    const x = r.values[0]!.number ?? r.values[0]!.label;
    const s = series(r.values);
    if (v !== null) out.push({ x, y: conv(v), series: s, status: r.result.status === 'passes' ? 'passes' : 'fails', alt: r.index });
    const l = col.limit?.(m) ?? null;
    if (l !== null) limits.push({ x, y: conv(l), series: s });
  }
  return { out, limits };
}

function chartSpec(c: Comparison, col: Column): TopLevelSpec | null {
  const system = c.base.design.units;
  const { out, limits } = pointsOf(c, col, system);
  if (out.length === 0) return null;
  const x = xAxisOf(c);
  const xEnc = { field: 'x', type: x.numeric ? 'quantitative' : 'ordinal', title: x.title, scale: x.numeric ? { zero: false, nice: false, padding: 8 } : undefined };
  const yTitle = titleWithUnit(col, system);
  const layers: unknown[] = [
    {
      data: { values: out },
      mark: { type: 'line', color: '#9aa0a6', strokeWidth: 1 },
      // With a grid, one line per value of the other keys, told apart by their dashes.
      encoding: { x: xEnc, y: { field: 'y', type: 'quantitative', title: yTitle, scale: { zero: false } }, ...(c.specs.length > 1 ? { strokeDash: { field: 'series', type: 'nominal', legend: { title: null, orient: 'bottom', direction: 'vertical' } } } : { detail: { field: 'series' } }) },
    },
    {
      data: { values: out },
      mark: { type: 'point', filled: true, size: 36 },
      encoding: {
        x: xEnc,
        y: { field: 'y', type: 'quantitative' },
        color: { field: 'status', type: 'nominal', scale: { domain: ['passes', 'fails'], range: [PASS_COLOR, FAIL_COLOR] }, legend: { title: null, orient: 'bottom', direction: 'horizontal' } },
        shape: { field: 'status', type: 'nominal', scale: { domain: ['passes', 'fails'], range: ['circle', 'cross'] }, legend: { title: null, orient: 'bottom', direction: 'horizontal' } },
      },
    },
  ];
  if (limits.length > 0) {
    layers.push({ data: { values: limits }, mark: { type: 'line', color: LIMIT_COLOR, strokeDash: [5, 3], strokeWidth: 1.2 }, encoding: { x: xEnc, y: { field: 'y', type: 'quantitative' }, detail: { field: 'series' } } });
  }
  return { title: `${col.title}${col.limitTitle ? `, with the ${col.limitTitle} dashed` : ''}`, layer: layers } as unknown as TopLevelSpec;
}

/** One figure per quantity that has values. */
export async function comparisonCharts(c: Comparison): Promise<ChartFigure[]> {
  const figures: ChartFigure[] = [];
  const x = xAxisOf(c);
  for (const col of COLUMNS) {
    const spec = chartSpec(c, col);
    if (!spec) continue;
    const svg = await renderChartSvg(spec, { width: 330, height: 120 });
    const others = c.specs.length > 1 ? ` One line per value of ${c.specs.slice(1).map((s) => s.text).join(' and ')}.` : '';
    figures.push({ title: `${col.title} against ${x.title}`, svg, width_pt: 440, caption: `${col.meaning[0]!.toUpperCase()}${col.meaning.slice(1)}. Blue circles pass every check, red crosses fail at least one; unstable or refused alternatives have no point.${others}` });
  }
  return figures;
}
