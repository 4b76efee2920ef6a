// Wind load cases from the user's design pressures, one per wind direction.
// Members: the projected-area rule or the cross-flow principle, as the input chooses (see
// load-rules.ts); panels: cosine rule, force normal to
// the face at the panel centroid; point attachments: pressure × effective projected area
// in the wind direction. Offsets put their moments r × F on the members.
import { qty, StepCollector } from '../calc/step.ts';
import { formatNumber } from '../units/units.ts';
import type { Design, WindDirection } from '../design/design.ts';
import type { FrameModel, Vec3 } from '../model/frame.ts';
import { elementEnds } from '../model/locate.ts';
import { memberAxes } from '../model/member-axes.ts';
import { diameterAt } from '../model/taper.ts';
import { dot, norm, scale, sub } from '../model/vec3.ts';
import { attachmentLoads, planUnit } from './attachment-loads.ts';
import { iceWindCaseId, windCaseId } from './case-ids.ts';
import type { AppliedLoad, LoadCase } from './load-types.ts';
import { RULES } from './load-rules.ts';
import { memberPressure, memberPressureIsTyped, panelPressure, pointPressure } from './wind-pressure.ts';
import { loadResultant, sumByOrigin } from './load-resultant.ts';

/** sin θ below this: the member is taken as parallel to the wind (no load). */
const PARALLEL_SIN = 1e-9;

/** Component of the (unit, horizontal) wind direction normal to a member axis. */
export function normalComponent(wind: Vec3, axis: Vec3): Vec3 {
  return sub(wind, scale(axis, dot(wind, axis)));
}

export interface WindCaseOptions {
  readonly kind: 'wind' | 'ice-wind';
  /** Factor on the design pressures (1 for wind; the ice wind factor for ice-wind). */
  readonly factor: number;
}

export function windLoadCase(design: Design, model: FrameModel, dir: WindDirection, opts: WindCaseOptions = { kind: 'wind', factor: 1 }): LoadCase {
  const steps = new StepCollector();
  const loads: AppliedLoad[] = [];
  const wdir = planUnit(dir.angle_rad);
  const w = design.wind;
  // With ice the design pressures are scaled by the ice wind factor (a step once per typed class;
  // pressures from the wind speed carry the factor in their own steps).
  const f = opts.factor;
  if (opts.kind === 'ice-wind') {
    for (const [what, p] of [['members', w.membersPressure_Pa], ['panels', w.panelsPressure_Pa], ['points', w.pointsPressure_Pa]] as const) {
      if (p !== null) steps.add({ description: `Wind pressure on ${what} with ice`, symbol: `p_${what}`, formula: 'p = f_ice × p', substituted: [formatNumber(f), ' × ', qty(p, 'pressure')], result: qty(f * p, 'pressure'), source: RULES.iceWind });
    }
    if (w.speed) steps.add({ description: 'Factor on the pressures from the wind speed, with ice', symbol: 'f_ice', formula: 'f_ice', substituted: [formatNumber(f)], result: qty(f, 'ratio'), source: RULES.iceWind });
  }
  const tag = opts.kind === 'wind' ? 'wind' : 'wind with ice';

  for (const ax of memberAxes(design)) {
    const info = model.members.find((m) => m.id === ax.id);
    if (!info) throw new RangeError(`member ${ax.id} is missing from the frame model`);
    const name = ax.kind === 'pole' ? 'pole' : `arm ${ax.id}`;
    const origin = { source: `${tag} on ${name}` };
    const n = normalComponent(wdir, ax.direction);
    const sinT = norm(n);
    const cosT = Math.min(1, Math.abs(dot(wdir, ax.direction)));
    const theta = Math.acos(cosT);
    steps.add({ description: `Angle between the wind and the ${name} axis`, symbol: `θ_${ax.id}`, formula: 'cos θ = |ŵ · x̂|', substituted: [`|ŵ · x̂| = ${cosT.toFixed(4)}`], result: qty(theta, 'angle'), source: RULES.memberWind });
    const projected = w.memberRule === 'projected-area';
    // Force per length over p D: sin θ on the projected area, sin²θ for the normal component alone.
    const s2 = projected ? sinT : sinT * sinT;
    const rule = projected ? RULES.memberWindProjected : RULES.memberWind;
    const Dr = diameterAt(ax.section, ax.length_m, 0);
    const Dt = diameterAt(ax.section, ax.length_m, ax.length_m);
    const zAt = (s: number) => ax.origin_m[2] + s * ax.direction[2];
    const ends = [['root', Dr, zAt(0)], ['tip', Dt, zAt(ax.length_m)]] as const;
    const w_ends: number[] = [];
    for (const [where, D, z] of ends) {
      const p = f * memberPressure(design, ax.id, ax.section, z, D, { steps, where: `${name} ${where}` });
      w_ends.push(p * D * s2);
      steps.add({ description: `Wind force per length on the ${name} at its ${where}`, symbol: `w_${where}`, formula: projected ? 'w = p D sin θ' : 'w = p D sin²θ', substituted: [qty(p, 'pressure'), ' × ', qty(D, 'section'), projected ? ' × sin(' : ' × sin²(', qty(theta, 'angle'), ')'], result: qty(p * D * s2, 'lineLoad'), source: `${rule}; ${RULES.memberWindDiameter}` });
    }
    const direction = projected ? wdir : sinT < PARALLEL_SIN ? wdir : scale(n, 1 / sinT);
    let total = 0;
    for (const id of info.elements) {
      const el = model.elements[id];
      const e = elementEnds(model, el);
      // The pressure at each element end at its height: linear along the element.
      const wA = f * memberPressure(design, ax.id, ax.section, e.endI_m[2], el.diameterI_m) * el.diameterI_m * s2;
      const wB = f * memberPressure(design, ax.id, ax.section, e.endJ_m[2], el.diameterJ_m) * el.diameterJ_m * s2;
      total += (e.length_m * (wA + wB)) / 2;
      // The member axis is straight, so each element shares its direction.
      if (sinT >= PARALLEL_SIN) loads.push({ kind: 'distributed', element: id, axes: 'global', direction, wA_Npm: wA, wB_Npm: wB, a_m: 0, b_m: e.length_m, origin });
    }
    const F = sinT >= PARALLEL_SIN ? total : 0;
    const what = `Wind force on the ${name}, ${projected ? 'in the wind direction' : 'normal to its axis'}`;
    // A typed pressure gives a load linear along the whole member, reworkable from its two ends;
    // a pressure from the wind speed varies with height, so the force is the sum over the elements.
    if (memberPressureIsTyped(design, ax.id)) {
      steps.add({ description: what, symbol: `F_${ax.id}`, formula: 'L (w_root + w_tip) / 2', substituted: [qty(ax.length_m, 'length'), ' × (', qty(w_ends[0]!, 'lineLoad'), ' + ', qty(w_ends[1]!, 'lineLoad'), ') / 2'], result: qty(F, 'force'), source: 'integral of a linearly varying load' });
    } else {
      steps.add({ description: `${what}: the pressure changes with height, so the load is summed over the ${info.elements.length} elements`, symbol: `F_${ax.id}`, formula: 'Σ L_e (w_i + w_j) / 2', substituted: [`${info.elements.length} elements, w at each element end as above`], result: qty(F, 'force'), source: 'integral of the load, linear along each element' });
    }
  }

  for (const a of design.attachments) {
    if (a.kind === 'panel') {
      const cosA = Math.cos(dir.angle_rad - a.faceNormal_rad);
      const area = a.width_m * a.height_m;
      const pp = f * panelPressure(design, a, { steps, where: `panel ${a.id}` });
      const F = pp * area * cosA;
      steps.add({ description: `Wind force on panel ${a.id}, normal to its face`, symbol: `F_${a.id}`, formula: 'F = p × b × h × cos α', substituted: [qty(pp, 'pressure'), ' × ', qty(a.width_m, 'length'), ' × ', qty(a.height_m, 'length'), ` × cos(${(((dir.angle_rad - a.faceNormal_rad) * 180) / Math.PI).toFixed(1)}°)`], result: qty(F, 'force'), source: RULES.panelWind });
      loads.push(...attachmentLoads(design, model, steps, a, scale(planUnit(a.faceNormal_rad), F), `${tag} on panel`));
    } else {
      const pa = f * pointPressure(design, a, { steps, where: `${a.kind} ${a.id}` });
      // With a side area the wind meets A_face |cos α| + A_side |sin α|, α from the face normal.
      const alpha = dir.angle_rad - a.faceNormal_rad;
      const A = a.sideArea_m2 === null ? a.windArea_m2 : a.windArea_m2 * Math.abs(Math.cos(alpha)) + a.sideArea_m2 * Math.abs(Math.sin(alpha));
      if (a.sideArea_m2 !== null) {
        const alphaDeg = ((((alpha * 180) / Math.PI) % 360) + 360) % 360;
        steps.add({ description: `Wind area of ${a.kind} ${a.id} at the plan angle α = ${alphaDeg.toFixed(1)}° from its face normal`, symbol: `A_${a.id}`, formula: 'A = A_face |cos α| + A_side |sin α|', substituted: [qty(a.windArea_m2, 'area'), ` × ${Math.abs(Math.cos(alpha)).toFixed(4)} + `, qty(a.sideArea_m2, 'area'), ` × ${Math.abs(Math.sin(alpha)).toFixed(4)}`], result: qty(A, 'area'), source: RULES.pointWindSides });
      }
      const F = pa * A;
      steps.add({ description: `Wind force on ${a.kind} ${a.id}`, symbol: `F_${a.id}`, formula: 'F = p × A', substituted: [qty(pa, 'pressure'), ' × ', qty(A, 'area')], result: qty(F, 'force'), source: a.sideArea_m2 === null ? RULES.pointWind : RULES.pointWindSides });
      loads.push(...attachmentLoads(design, model, steps, a, scale(wdir, F), `${tag} on ${a.kind}`));
    }
  }

  const R = loadResultant(model, loads).force_N;
  const along = dot(R, wdir);
  steps.add({ description: 'Total horizontal wind force along the wind direction (sum of the loads of this case)', symbol: 'ΣF_w', formula: 'ΣF_w = Σ F · ŵ', substituted: sumByOrigin(model, loads, (F) => dot(F, wdir)), result: qty(along, 'force'), source: 'sum of the loads above' });
  const across = Math.hypot(R[0] - along * wdir[0], R[1] - along * wdir[1]);
  if (across > 1e-6 * Math.max(1, Math.abs(along))) {
    // its addends: each group's component along the across-wind direction of the total
    const c: Vec3 = [(R[0] - along * wdir[0]) / across, (R[1] - along * wdir[1]) / across, 0];
    steps.add({ description: 'Total horizontal force across the wind direction (panel faces and members not normal to the wind)', symbol: 'ΣF_⊥', formula: 'ΣF_⊥ = |ΣF − (ΣF · ŵ) ŵ|', substituted: sumByOrigin(model, loads, (F) => dot(F, c)), result: qty(across, 'force'), source: 'sum of the loads above' });
  }
  const id = opts.kind === 'wind' ? windCaseId(dir.angle_rad) : iceWindCaseId(dir.angle_rad);
  const deg = ((dir.angle_rad * 180) / Math.PI).toFixed(1).replace(/\.0$/, '');
  const description = opts.kind === 'wind' ? `Wind toward ${deg}° (${dir.label})` : `Wind with ice toward ${deg}° (${dir.label}), pressures × ${opts.factor}`;
  return { id, kind: opts.kind, description, windAngle_rad: dir.angle_rad, loads, steps: steps.steps };
}
