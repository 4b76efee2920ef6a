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
import { INTERACTION_EQUATION, resistancesAlong } from '../../checks/member-checks.ts';
import type { LoadedDesign } from '../../design/design.ts';
import { displayUnit, fromSI, prettyUnit, type Dim, type UnitSystem } from '../../units/units.ts';
import { renderChartSvg } from '../charts/index.ts';
import { display, memberText } from './display.ts';
import { roundOffShare, withoutRoundOff } from './round-off.ts';

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
/** Taller: four lines, the capacity well above the demands. */
const MOMENT_PANEL_HEIGHT = 80;
const COLORS = ['#24507a', '#b03a2e', '#4d7f2a'];
const LIMIT_COLOR = '#7a5a00';

const inUnits = (units: UnitSystem, dim: Dim) => (si: number) => fromSI(si, displayUnit(units, dim), dim);
const unitOf = (units: UnitSystem, dim: Dim) => prettyUnit(displayUnit(units, dim));

interface Series {
  readonly name: string;
  /** One per distance; null where the series has no value (a capacity that cannot be given). */
  readonly values: readonly (number | null)[];
  /** Drawn dashed: a capacity, not a demand. */
  readonly dashed?: boolean;
}

function panel(title: string | readonly string[], yTitle: string, s: readonly number[], series: readonly Series[], xTitle: string, showX: boolean, limit: number | null = null, height = PANEL_HEIGHT): unknown {
  const values = series.flatMap((q) => q.values.flatMap((v, k) => (v === null ? [] : [{ s: s[k], v, q: q.name }])));
  const legend = series.length > 1 ? { title: null, orient: 'right' } : null;
  const names = series.map((q) => q.name);
  const layers: unknown[] = [
    {
      mark: { type: 'line', strokeWidth: 1.3, interpolate: 'linear' },
      encoding: {
        x: { field: 's', type: 'quantitative', title: showX ? xTitle : null, axis: showX ? {} : { labels: false, ticks: true, title: null }, scale: { nice: false } },
        // A quantity that is zero all along (no axial force in a level arm) gets a plain -1..1 axis.
        y: { field: 'v', type: 'quantitative', title: yTitle, axis: { tickCount: 4 }, ...(values.every((p) => p.v === 0) ? { scale: { domain: [-1, 1] } } : {}) },
        color: { field: 'q', type: 'nominal', scale: { domain: names, range: series.map((q, k) => (q.dashed ? LIMIT_COLOR : COLORS[k % COLORS.length]!)) }, legend },
        strokeDash: { field: 'q', type: 'nominal', scale: { domain: names, range: series.map((q) => (q.dashed ? [5, 3] : [1, 0])) }, legend },
      },
    },
  ];
  if (limit !== null) {
    layers.push({ data: { values: [{ y: limit }] }, mark: { type: 'rule', color: LIMIT_COLOR, strokeDash: [5, 3], strokeWidth: 1.1 }, encoding: { y: { field: 'y', type: 'quantitative' } } });
  }
  return { title: { text: title, fontSize: 8.5 }, width: WIDTH, height, data: { values }, layer: layers };
}

/** "max 99.35 kip·ft at 0 ft" for the largest magnitude of a series. */
function extremeText(values: readonly number[], s_m: readonly number[], fmt: (v: number) => string, at: (s: number) => string): string {
  let k = 0;
  for (let i = 1; i < values.length; i++) if (Math.abs(values[i]!) > Math.abs(values[k]!)) k = i;
  return `${fmt(values[k]!)} at ${at(s_m[k]!)}`;
}

/** "AISC 360-16, Eq. F8-2 and Eq. F8-1" from equations of one publication (", Eq. ..." each). */
function sources(equations: readonly string[]): string {
  const parts = equations.map((e) => /^(.*), (Eq\. .*)$/.exec(e));
  const pub = parts[0]?.[1];
  if (equations.length > 1 && parts.every((p) => p !== null && p[1] === pub)) return `${pub}, ${parts.map((p) => p![2]).join(' and ')}`;
  return equations.join('; ');
}

/** Panels stacked on one distance axis, rendered; the width is that of the SVG, at most the text width. */
async function chartOf(panels: readonly unknown[]): Promise<{ svg: string; width: number }> {
  const spec = { vconcat: panels, spacing: 6, resolve: { scale: { color: 'independent', strokeDash: 'independent', y: 'independent' }, legend: { color: 'independent', strokeDash: 'independent' } } } as unknown as TopLevelSpec;
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
    // Noise of the solution is drawn and stated as 0 (in second order, below the P-delta tolerance).
    const share = roundOffShare(analysis.options);
    const cleanF = (v: number) => withoutRoundOff(v, bigF, share);
    const cleanM = (v: number) => withoutRoundOff(v, bigM, share);
    const f = (v: number) => F(cleanF(v));
    const mo = (v: number) => M(cleanM(v));
    const u = (v: number) => U(withoutRoundOff(v, bigU, share));
    const at = (v: number) => d.q(v, 'length');
    const xTitle = `distance along the ${m.kind === 'pole' ? 'pole from the base' : 'arm from the pole face'} (${unitOf(units, 'length')})`;
    // The capacity line: φMn of the section at each station, as the member-strength check takes it.
    const resistance = resistancesAlong(loaded.design, m.id);
    const phiMn = s_m.map((sq) => {
      const v = resistance(sq).r.phiMn_Nm;
      return Number.isFinite(v) ? v : null;
    });
    const flexureSource = sources([...new Set(s_m.map((sq) => resistance(sq).r.flexure.equation))]);
    const ratioRecords = checks.records.filter((r) => r.type === 'member-strength' && r.member === m.id && r.combination === gov && r.s_m !== null && Number.isFinite(r.ratio));
    const panels: unknown[] = [
      panel(`Axial force N, tension + (largest ${extremeText(st.map((q) => cleanF(q.N_N)), s_m, (v) => d.q(v, 'force'), at)})`, unitOf(units, 'force'), s, [{ name: 'N', values: st.map((q) => f(q.N_N)) }], xTitle, false),
      panel('Shear forces Vy and Vz (local axes)', unitOf(units, 'force'), s, [{ name: 'Vy', values: st.map((q) => f(q.Vy_N)) }, { name: 'Vz', values: st.map((q) => f(q.Vz_N)) }], xTitle, false),
      panel(`Torque T (largest ${extremeText(st.map((q) => cleanM(q.T_Nm)), s_m, (v) => d.q(v, 'moment'), at)})`, unitOf(units, 'moment'), s, [{ name: 'T', values: st.map((q) => mo(q.T_Nm)) }], xTitle, false),
      panel(['Bending moments My, Mz, their resultant Mres and the flexural capacity φMn (dashed)', `largest My ${extremeText(st.map((q) => cleanM(q.My_Nm)), s_m, (v) => d.q(v, 'moment'), at)}, Mz ${extremeText(st.map((q) => cleanM(q.Mz_Nm)), s_m, (v) => d.q(v, 'moment'), at)}`], unitOf(units, 'moment'), s, [{ name: 'My', values: st.map((q) => mo(q.My_Nm)) }, { name: 'Mz', values: st.map((q) => mo(q.Mz_Nm)) }, { name: 'Mres', values: st.map((q) => mo(Math.hypot(q.My_Nm, q.Mz_Nm))) }, { name: 'φMn', values: phiMn.map((v) => (v === null ? null : M(v))), dashed: true }], xTitle, true, null, MOMENT_PANEL_HEIGHT),
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
      caption: `Combination ${gov} gives the ${name} its largest resultant moment. Forces and moments in the member's local axes, sign convention as in the section "Structural model". φMn (dashed) is the design flexural strength of the section at each station (${flexureSource}), the capacity the resultant moment Mres is set against; the member-strength check adds the axial, shear and torsion terms to it (${INTERACTION_EQUATION}), and its ratio is charted next.`,
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
