// A plain-text summary of the normalised design in the user's units, for `polebook check`.
import { baseText } from './base-text.ts';
import type { LoadedDesign, TubeSection } from './design.ts';
import { formatQuantity, formatNumber } from '../units/units.ts';
import type { Dim } from '../units/units.ts';

export function summariseDesign(loaded: LoadedDesign): string {
  const d = loaded.design;
  const q = (si: number, dim: Dim) => formatQuantity(si, dim, d.units);
  const deg = (rad: number) => `${formatNumber((rad * 180) / Math.PI, 4)} deg`;
  const section = (s: TubeSection) =>
    `${s.shape === 'round' ? 'round' : `${s.sides}-sided (across flats)`} ${q(s.rootDiameter_m, 'section')} to ${q(s.tipDiameter_m, 'section')}, wall ${q(s.wall_m, 'section')}`;
  const lines: string[] = [];
  lines.push(`${loaded.file}: valid (input hash ${loaded.inputHash})`);
  lines.push(`project    ${d.project.name}; structure ${d.project.structureId} (${d.kind}); units ${d.units}`);
  lines.push(`pole       height ${q(d.pole.height_m, 'length')}; ${section(d.pole.section)}; base ${baseText(d.pole.base, (k) => q(k, 'rotStiffness'))}`);
  for (const a of d.arms) {
    lines.push(`arm ${a.id.padEnd(6)} at ${q(a.attachHeight_m, 'length')}, plan ${deg(a.direction_rad)}, rise ${deg(a.rise_rad)}, length ${q(a.length_m, 'length')}; ${section(a.section)}`);
  }
  for (const t of d.attachments) {
    const where = `${t.member === 'pole' ? 'pole' : `arm ${t.member}`} at ${q(t.position_m, 'length')}`;
    const what =
      t.kind === 'panel'
        ? `panel ${q(t.width_m, 'length')} x ${q(t.height_m, 'length')}, ${q(t.weightPerArea_Pa, 'pressure')}`
        : `${t.kind} ${q(t.weight_N, 'weight')}, wind area ${q(t.windArea_m2, 'area')}`;
    lines.push(`attachment ${t.id.padEnd(6)} ${what}; ${where}`);
  }
  const w = d.wind;
  const fromSpeed = 'from the wind speed';
  const pq = (p: number | null) => (p === null ? fromSpeed : q(p, 'pressure'));
  if (w.speed) lines.push(`wind speed ${q(w.speed.V_mps, 'speed')} (${w.speed.basis}), exposure ${w.speed.exposure}, Kd ${formatNumber(w.speed.Kd)}, G ${formatNumber(w.speed.G)}`);
  lines.push(`wind       members ${pq(w.membersPressure_Pa)}, panels ${pq(w.panelsPressure_Pa)}, point attachments ${pq(w.pointsPressure_Pa)}`);
  lines.push(`directions ${w.directions.map((x) => `${deg(x.angle_rad)} (${x.label})`).join('; ')}`);
  if (d.ice) lines.push(`ice        ${q(d.ice.weightPerArea_Pa, 'pressure')} on all surfaces, wind factor ${formatNumber(d.ice.windFactor)}`);
  for (const c of d.combinations) {
    const f = Object.entries(c.factors).map(([k, v]) => `${formatNumber(v ?? 0)} ${k}`).join(' + ');
    lines.push(`combination ${c.id}: ${f}  [${c.source}]`);
  }
  const defaulted = d.assumptions.filter((a) => a.defaulted);
  lines.push(`defaults taken (${defaulted.length}):`);
  for (const a of defaulted) {
    const v = typeof a.value === 'number' && a.dim ? q(a.value, a.dim) : String(a.value);
    lines.push(`  ${a.key} = ${v}  [${a.source}]`);
  }
  return `${lines.join('\n')}\n`;
}
