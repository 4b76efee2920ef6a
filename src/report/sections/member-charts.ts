// The internal-force charts of each member for its governing combination, as vega-lite
// specifications rendered to SVG (src/report/charts): axial force, the two shears, torque, the two
// bending moments, the demand/capacity ratio of the member-strength check with its limit of 1, and
// the displacements along the member. Labels are axis and panel titles only (the extremes are in
// the titles), so no plotted line can cross a label. Async (vega renders asynchronously): the
// pipeline renders these before it builds the document.
import type { TopLevelSpec } from 'vega-lite';
import type { DesignAnalysis } from '../../analyse-design.ts';
import { envelope } from '../../analysis/index.ts';
import type { CheckResults } from '../../checks/check-types.ts';
import type { LoadedDesign } from '../../design/design.ts';
import { displayUnit, fromSI, prettyUnit, type Dim, type UnitSystem } from '../../units/units.ts';
import { renderChartSvg } from '../charts/index.ts';
import { display, memberText } from './display.ts';
import { withoutRoundOff } from './round-off.ts';

export interface MemberChart {
  readonly member: string;
  readonly combination: string;
  readonly title: string;
  readonly svg: string;
  readonly width_pt: number;
  readonly caption: string;
}

const WIDTH = 380;
const PANEL_HEIGHT = 46;
const COLORS = ['#24507a', '#b03a2e', '#4d7f2a'];
const LIMIT_COLOR = '#7a5a00';

const inUnits = (units: UnitSystem, dim: Dim) => (si: number) => fromSI(si, displayUnit(units, dim), dim);
const unitOf = (units: UnitSystem, dim: Dim) => prettyUnit(displayUnit(units, dim));

interface Series {
  readonly name: string;
  readonly values: readonly number[];
}

function panel(title: string, yTitle: string, s: readonly number[], series: readonly Series[], xTitle: string, showX: boolean, limit: number | null = null): unknown {
  const values = series.flatMap((q) => q.values.map((v, k) => ({ s: s[k], v, q: q.name })));
  const layers: unknown[] = [
    {
      mark: { type: 'line', strokeWidth: 1.3, interpolate: 'linear' },
      encoding: {
        x: { field: 's', type: 'quantitative', title: showX ? xTitle : null, axis: showX ? {} : { labels: false, ticks: true, title: null }, scale: { nice: false } },
        y: { field: 'v', type: 'quantitative', title: yTitle, axis: { tickCount: 4 } },
        color: { field: 'q', type: 'nominal', scale: { domain: series.map((q) => q.name), range: COLORS.slice(0, series.length) }, legend: series.length > 1 ? { title: null, orient: 'right' } : null },
      },
    },
  ];
  if (limit !== null) {
    layers.push({ data: { values: [{ y: limit }] }, mark: { type: 'rule', color: LIMIT_COLOR, strokeDash: [5, 3], strokeWidth: 1.1 }, encoding: { y: { field: 'y', type: 'quantitative' } } });
  }
  return { title: { text: title, fontSize: 8.5 }, width: WIDTH, height: PANEL_HEIGHT, data: { values }, layer: layers };
}

/** "max 99.35 kip·ft at 0 ft" for the largest magnitude of a series. */
function extremeText(values: readonly number[], s_m: readonly number[], fmt: (v: number) => string, at: (s: number) => string): string {
  let k = 0;
  for (let i = 1; i < values.length; i++) if (Math.abs(values[i]!) > Math.abs(values[k]!)) k = i;
  return `${fmt(values[k]!)} at ${at(s_m[k]!)}`;
}

/** Panels stacked on one distance axis, rendered; the width is that of the SVG, at most the text width. */
async function chartOf(panels: readonly unknown[]): Promise<{ svg: string; width: number }> {
  const spec = { vconcat: panels, spacing: 6, resolve: { scale: { color: 'independent', y: 'independent' }, legend: { color: 'independent' } } } as unknown as TopLevelSpec;
  const svg = await renderChartSvg(spec, { width: WIDTH, height: PANEL_HEIGHT });
  const width = Number(/width="([\d.]+)"/.exec(svg)?.[1] ?? WIDTH + 80);
  return { svg, width: Math.min(width, 480) };
}

export async function memberCharts(loaded: LoadedDesign, analysis: DesignAnalysis, checks: CheckResults): Promise<MemberChart[]> {
  const { units } = loaded.design;
  const d = display(units);
  const out: MemberChart[] = [];
  for (const m of analysis.model.members) {
    const gov = envelope(analysis.results, m.id, 'Mres').max.combination;
    const st = analysis.results[gov]!.members[m.id]!.stations;
    const s_m = st.map((x) => x.s_m);
    const x = inUnits(units, 'length');
    const s = s_m.map(x);
    const F = inUnits(units, 'force');
    const M = inUnits(units, 'moment');
    const U = inUnits(units, 'section');
    const bigF = Math.max(...st.flatMap((q) => [q.N_N, q.Vy_N, q.Vz_N].map(Math.abs)));
    const bigM = Math.max(...st.flatMap((q) => [q.T_Nm, q.My_Nm, q.Mz_Nm].map(Math.abs)));
    const bigU = Math.max(...st.flatMap((q) => [q.ux_m, q.uy_m, q.uz_m].map(Math.abs)));
    const f = (v: number) => F(withoutRoundOff(v, bigF));
    const mo = (v: number) => M(withoutRoundOff(v, bigM));
    const u = (v: number) => U(withoutRoundOff(v, bigU));
    const at = (v: number) => d.q(v, 'length');
    const xTitle = `distance along the ${m.kind === 'pole' ? 'pole from the base' : 'arm from the pole face'} (${unitOf(units, 'length')})`;
    const ratioRecords = checks.records.filter((r) => r.type === 'member-strength' && r.member === m.id && r.combination === gov && r.s_m !== null && Number.isFinite(r.ratio));
    const panels: unknown[] = [
      panel(`Axial force N, tension + (largest ${extremeText(st.map((q) => q.N_N), s_m, (v) => d.q(v, 'force'), at)})`, unitOf(units, 'force'), s, [{ name: 'N', values: st.map((q) => f(q.N_N)) }], xTitle, false),
      panel('Shear forces Vy and Vz (local axes)', unitOf(units, 'force'), s, [{ name: 'Vy', values: st.map((q) => f(q.Vy_N)) }, { name: 'Vz', values: st.map((q) => f(q.Vz_N)) }], xTitle, false),
      panel(`Torque T (largest ${extremeText(st.map((q) => q.T_Nm), s_m, (v) => d.q(v, 'moment'), at)})`, unitOf(units, 'moment'), s, [{ name: 'T', values: st.map((q) => mo(q.T_Nm)) }], xTitle, false),
      panel(`Bending moments My, Mz and the resultant Mres (largest My ${extremeText(st.map((q) => q.My_Nm), s_m, (v) => d.q(v, 'moment'), at)}, Mz ${extremeText(st.map((q) => q.Mz_Nm), s_m, (v) => d.q(v, 'moment'), at)})`, unitOf(units, 'moment'), s, [{ name: 'My', values: st.map((q) => mo(q.My_Nm)) }, { name: 'Mz', values: st.map((q) => mo(q.Mz_Nm)) }, { name: 'Mres', values: st.map((q) => mo(Math.hypot(q.My_Nm, q.Mz_Nm))) }], xTitle, true),
    ];
    const lower: unknown[] = [];
    if (ratioRecords.length > 1) {
      const rs = ratioRecords.map((r) => x(r.s_m!));
      lower.push(panel(`Demand/capacity of the member-strength check (largest ${Math.max(...ratioRecords.map((r) => r.ratio)).toFixed(3)}; limit 1 dashed)`, 'ratio', rs, [{ name: 'ratio', values: ratioRecords.map((r) => r.ratio) }], xTitle, true, 1));
    }
    lower.push(panel('Displacements ux, uy, uz of the member axis (global axes)', unitOf(units, 'section'), s, [{ name: 'ux', values: st.map((q) => u(q.ux_m)) }, { name: 'uy', values: st.map((q) => u(q.uy_m)) }, { name: 'uz', values: st.map((q) => u(q.uz_m)) }], xTitle, true));
    const forces = await chartOf(panels);
    const rest = await chartOf(lower);
    const name = memberText(m.id);
    out.push({
      member: m.id,
      combination: gov,
      title: `Internal forces in the ${name}, combination ${gov}`,
      svg: forces.svg,
      width_pt: forces.width,
      caption: `Combination ${gov} gives the ${name} its largest resultant moment. Forces and moments in the member's local axes, sign convention as in the section "Structural model".`,
    });
    out.push({
      member: m.id,
      combination: gov,
      title: `Check ratio and displacements of the ${name}, combination ${gov}`,
      svg: rest.svg,
      width_pt: rest.width,
      caption: 'The ratio is that of the member-strength check at each station of this combination (limit 1). Displacements true, not magnified, in global axes.',
    });
  }
  return out;
}
