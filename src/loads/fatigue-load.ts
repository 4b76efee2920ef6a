// Fatigue load cases: the equivalent static loads of the fatigue design, each a case of its
// own (galloping, natural wind gust per wind direction, truck-induced gust). Each is analysed
// alone; the stresses it causes are the stress ranges the fatigue checks compare with the
// details' thresholds.
import { qty, StepCollector } from '../calc/step.ts';
import type { Attachment, Design, FatigueInput, WindDirection } from '../design/design.ts';
import type { FrameModel, Vec3 } from '../model/frame.ts';
import { elementEnds } from '../model/locate.ts';
import { memberAxes, offsetVector, pointOnAxis, type MemberAxis } from '../model/member-axes.ts';
import { diameterAt } from '../model/taper.ts';
import { add, dot, norm, scale } from '../model/vec3.ts';
import { attachmentLoads, planUnit } from './attachment-loads.ts';
import { directionKey } from './case-ids.ts';
import type { AppliedLoad, LoadCase } from './load-types.ts';
import { loadResultant, sumByOrigin } from './load-resultant.ts';
import { normalComponent } from './wind-load.ts';

export const GALLOPING_CASE_ID = 'fatigue-galloping';
export const TRUCK_GUST_CASE_ID = 'fatigue-truck-gust';
export const naturalGustCaseId = (angle_rad: number): string => `fatigue-natural-gust@${directionKey(angle_rad)}`;

/** Reference yearly mean wind speed of the natural gust pressure, 11.2 mph. */
export const NATURAL_GUST_REFERENCE_SPEED_mps = 11.2 * 0.44704;

export const FATIGUE_RULES = {
  galloping:
    'galloping: vertical pressure P_G = 21 I_F psf (or as given) on the area of the sign panels and signal heads on the arms as seen in normal elevation, no drag coefficient (AASHTO LRFD-LTS fatigue provisions, from memory; verify)',
  naturalGust:
    'natural wind gust: horizontal pressure P_NW = 5.2 Cd I_F psf (or as given) × (V_mean / 11.2 mph)² on every exposed area, in each wind direction; members by projected area (force in the wind direction on D × L sin θ), panels normal to their face with cos α (AASHTO LRFD-LTS fatigue provisions, from memory; verify)',
  truckGust:
    'truck-induced gust: vertical (upward) pressure P_TG = 18.8 Cd I_F psf (or as given) on the horizontal projection of the arms and attachments over the traffic lanes, in full up to the full-pressure height above the road and reduced linearly to zero at the zero-pressure height (AASHTO LRFD-LTS fatigue provisions, from memory; verify)',
} as const;

const memberName = (ax: MemberAxis) => (ax.kind === 'pole' ? 'pole' : `arm ${ax.id}`);
const memberCd = (f: FatigueInput, ax: MemberAxis) => (ax.section.shape === 'round' ? f.drag.roundMembers : f.drag.multisidedMembers);

/** Galloping on arm-mounted panels and signal heads, or null when it is off or nothing is exposed. */
export function gallopingCase(design: Design, model: FrameModel, f: FatigueInput): LoadCase | null {
  if (!f.galloping) return null;
  const g = f.galloping;
  const steps = new StepCollector();
  const p = steps.add({ description: 'Galloping pressure', symbol: 'P_G', formula: 'P_G = P × I_F', substituted: [qty(g.pressure_Pa, 'pressure'), ` × ${g.importance}`], result: qty(g.pressure_Pa * g.importance, 'pressure'), source: FATIGUE_RULES.galloping }).si;
  const loads: AppliedLoad[] = [];
  for (const a of design.attachments) {
    if (a.member === 'pole' || !(a.kind === 'panel' || a.kind === 'signal-head')) continue;
    const area = a.kind === 'panel' ? a.width_m * a.height_m : a.windArea_m2;
    const F = p * area;
    steps.add({ description: `Galloping force on ${a.kind === 'panel' ? 'panel' : 'signal head'} ${a.id}, vertical`, symbol: `F_${a.id}`, formula: 'F = P_G × A', substituted: [qty(p, 'pressure'), ' × ', qty(area, 'area')], result: qty(F, 'force'), source: FATIGUE_RULES.galloping });
    loads.push(...attachmentLoads(design, model, steps, a, [0, 0, F], 'galloping on'));
  }
  if (loads.length === 0) return null;
  total(steps, model, loads, 'vertical');
  return { id: GALLOPING_CASE_ID, kind: 'fatigue', description: 'Fatigue: galloping, vertical on the panels and signal heads of the arms', windAngle_rad: null, loads, steps: steps.steps };
}

/** Natural wind gust toward one plan direction, or null when it is off. */
export function naturalGustCase(design: Design, model: FrameModel, f: FatigueInput, dir: WindDirection): LoadCase | null {
  if (!f.naturalGust) return null;
  const n = f.naturalGust;
  const steps = new StepCollector();
  const V = f.meanWindSpeed_mps;
  const scaleV = (V / NATURAL_GUST_REFERENCE_SPEED_mps) ** 2;
  const p0 = steps.add({
    description: 'Natural wind gust pressure before the drag coefficient',
    symbol: 'P_NW/Cd',
    formula: 'P × I_F × (V_mean / 11.2 mph)²',
    substituted: [qty(n.pressure_Pa, 'pressure'), ` × ${n.importance} × (`, qty(V, 'speed'), ' / ', qty(NATURAL_GUST_REFERENCE_SPEED_mps, 'speed'), ')²'],
    result: qty(n.pressure_Pa * n.importance * scaleV, 'pressure'),
    source: FATIGUE_RULES.naturalGust,
  }).si;
  const wdir = planUnit(dir.angle_rad);
  const loads: AppliedLoad[] = [];
  for (const ax of memberAxes(design)) {
    const info = model.members.find((m) => m.id === ax.id);
    if (!info) throw new RangeError(`member ${ax.id} is missing from the frame model`);
    const cd = memberCd(f, ax);
    const sinT = norm(normalComponent(wdir, ax.direction));
    const p = p0 * cd * sinT;
    steps.add({ description: `Natural gust force per projected length on the ${memberName(ax)}, per unit diameter`, symbol: `q_${ax.id}`, formula: 'q = P_NW/Cd × Cd × sin θ', substituted: [qty(p0, 'pressure'), ` × ${cd} × ${sinT.toFixed(4)}`], result: qty(p, 'pressure'), source: FATIGUE_RULES.naturalGust });
    if (p <= 0) continue;
    for (const id of info.elements) {
      const el = model.elements[id];
      loads.push({ kind: 'distributed', element: id, axes: 'global', direction: wdir, wA_Npm: p * el.diameterI_m, wB_Npm: p * el.diameterJ_m, a_m: 0, b_m: elementEnds(model, el).length_m, origin: { source: `natural gust on ${memberName(ax)}` } });
    }
  }
  for (const a of design.attachments) {
    if (a.kind === 'panel') {
      const cosA = Math.cos(dir.angle_rad - a.faceNormal_rad);
      const F = p0 * f.drag.panels * a.width_m * a.height_m * cosA;
      steps.add({ description: `Natural gust force on panel ${a.id}, normal to its face`, symbol: `F_${a.id}`, formula: 'F = P_NW/Cd × Cd × b × h × cos α', substituted: [qty(p0, 'pressure'), ` × ${f.drag.panels} × `, qty(a.width_m, 'length'), ' × ', qty(a.height_m, 'length'), ` × ${cosA.toFixed(4)}`], result: qty(F, 'force'), source: FATIGUE_RULES.naturalGust });
      loads.push(...attachmentLoads(design, model, steps, a, scale(planUnit(a.faceNormal_rad), F), 'natural gust on panel'));
    } else {
      const F = p0 * f.drag.points * a.windArea_m2;
      steps.add({ description: `Natural gust force on ${a.kind} ${a.id}`, symbol: `F_${a.id}`, formula: 'F = P_NW/Cd × Cd × A', substituted: [qty(p0, 'pressure'), ` × ${f.drag.points} × `, qty(a.windArea_m2, 'area')], result: qty(F, 'force'), source: FATIGUE_RULES.naturalGust });
      loads.push(...attachmentLoads(design, model, steps, a, scale(wdir, F), `natural gust on ${a.kind}`));
    }
  }
  total(steps, model, loads, 'horizontal', wdir);
  const deg = ((dir.angle_rad * 180) / Math.PI).toFixed(1).replace(/\.0$/, '');
  return { id: naturalGustCaseId(dir.angle_rad), kind: 'fatigue', description: `Fatigue: natural wind gust toward ${deg}° (${dir.label})`, windAngle_rad: dir.angle_rad, loads, steps: steps.steps };
}

/** Truck gust height factor: 1 up to the full-pressure height above the road, 0 from the zero-pressure height. */
export function truckGustHeightFactor(heightAboveRoad_m: number, full_m: number, zero_m: number): number {
  if (heightAboveRoad_m <= full_m) return 1;
  if (heightAboveRoad_m >= zero_m) return 0;
  return (zero_m - heightAboveRoad_m) / (zero_m - full_m);
}

/** Truck-induced gust on the arms (and attachments with a horizontal area) over the lanes. */
export function truckGustCase(design: Design, model: FrameModel, f: FatigueInput): LoadCase | null {
  const t = f.truckGust;
  if (!t) return null;
  const steps = new StepCollector();
  const p0 = steps.add({ description: 'Truck-induced gust pressure before the drag coefficient and the height factor', symbol: 'P_TG/Cd', formula: 'P × I_F', substituted: [qty(t.pressure_Pa, 'pressure'), ` × ${t.importance}`], result: qty(t.pressure_Pa * t.importance, 'pressure'), source: FATIGUE_RULES.truckGust }).si;
  const heightFactor = (z_m: number) => truckGustHeightFactor(z_m - t.roadLevel_m, t.fullPressureHeight_m, t.zeroPressureHeight_m);
  const loads: AppliedLoad[] = [];
  for (const ax of memberAxes(design)) {
    if (ax.kind !== 'arm') continue;
    const info = model.members.find((m) => m.id === ax.id);
    if (!info) throw new RangeError(`member ${ax.id} is missing from the frame model`);
    const lanes = t.lanes.filter((l) => l.arm === ax.id);
    const cd = memberCd(f, ax);
    const cosRise = Math.hypot(ax.direction[0], ax.direction[1]);
    for (const lane of lanes) {
      const zFrom = pointOnAxis(ax, lane.from_m)[2];
      const zTo = pointOnAxis(ax, lane.to_m)[2];
      for (const [where, z] of [['start', zFrom], ['end', zTo]] as const) {
        steps.add({ description: `Height factor of the truck gust on arm ${ax.id} at the ${where} of the part over the lanes`, symbol: 'k_h', formula: 'k_h = 1 up to h_full; (h_zero − h) / (h_zero − h_full) above it; 0 from h_zero', substituted: ['h = ', qty(z - t.roadLevel_m, 'length'), ' above the road; h_full = ', qty(t.fullPressureHeight_m, 'length'), ', h_zero = ', qty(t.zeroPressureHeight_m, 'length')], result: qty(heightFactor(z), 'ratio'), source: FATIGUE_RULES.truckGust });
      }
      // Force per length along the arm: horizontal projection D cos(rise) per unit length.
      const w = (s: number) => p0 * cd * heightFactor(pointOnAxis(ax, s)[2]) * diameterAt(ax.section, ax.length_m, s) * cosRise;
      const cuts = laneCuts(ax, lane.from_m, lane.to_m, t.roadLevel_m + t.fullPressureHeight_m, t.roadLevel_m + t.zeroPressureHeight_m);
      let force = 0;
      for (const id of info.elements) {
        const el = model.elements[id];
        const L = elementEnds(model, el).length_m;
        const toLocal = (s: number) => ((s - el.sI_m) / (el.sJ_m - el.sI_m)) * L;
        const pts = [el.sI_m, ...cuts.filter((c) => c > el.sI_m && c < el.sJ_m), el.sJ_m].map((x) => Math.min(Math.max(x, lane.from_m), lane.to_m));
        for (let k = 0; k + 1 < pts.length; k++) {
          const a = pts[k]!;
          const b = pts[k + 1]!;
          if (b - a <= 1e-12) continue;
          force += ((w(a) + w(b)) / 2) * (toLocal(b) - toLocal(a));
          loads.push({ kind: 'distributed', element: id, axes: 'global', direction: [0, 0, 1], wA_Npm: w(a), wB_Npm: w(b), a_m: toLocal(a), b_m: toLocal(b), origin: { source: `truck gust on arm ${ax.id}` } });
        }
      }
      const D1 = diameterAt(ax.section, ax.length_m, lane.from_m);
      const D2 = diameterAt(ax.section, ax.length_m, lane.to_m);
      steps.add({ description: `Truck gust force on arm ${ax.id} over the lanes, vertical (the force per length varies with D and k_h, applied linearly between element ends and the height-factor kinks)`, symbol: `F_${ax.id}`, formula: 'F = ∫ P_TG/Cd × Cd × k_h × D cos(rise) ds', substituted: [qty(p0, 'pressure'), ` × ${cd} × k_h × D (`, qty(D1, 'section'), ' to ', qty(D2, 'section'), `) × ${cosRise.toFixed(4)}, from `, qty(lane.from_m, 'length'), ' to ', qty(lane.to_m, 'length')], result: qty(force, 'force'), source: FATIGUE_RULES.truckGust });
    }
  }
  for (const a of design.attachments) {
    const Ah = t.horizontalAreas_m2[a.id];
    if (Ah === undefined || Ah === 0 || !inLane(a, t.lanes)) continue;
    const z = attachmentHeight(design, a);
    const k = heightFactor(z);
    const cd = a.kind === 'panel' ? f.drag.panels : f.drag.points;
    const F = p0 * cd * k * Ah;
    steps.add({ description: `Truck gust force on ${a.kind} ${a.id}, vertical`, symbol: `F_${a.id}`, formula: 'F = P_TG/Cd × Cd × k_h × A_h', substituted: [qty(p0, 'pressure'), ` × ${cd} × ${k.toFixed(4)} × `, qty(Ah, 'area')], result: qty(F, 'force'), source: FATIGUE_RULES.truckGust });
    loads.push(...attachmentLoads(design, model, steps, a, [0, 0, F], `truck gust on ${a.kind}`));
  }
  if (loads.length === 0) return null;
  total(steps, model, loads, 'vertical');
  return { id: TRUCK_GUST_CASE_ID, kind: 'fatigue', description: 'Fatigue: truck-induced gust, vertical, over the traffic lanes', windAngle_rad: null, loads, steps: steps.steps };
}

/** All fatigue cases of the design (none without a fatigue block). */
export function fatigueLoadCases(design: Design, model: FrameModel): LoadCase[] {
  const f = design.fatigue;
  if (!f) return [];
  const out: (LoadCase | null)[] = [gallopingCase(design, model, f), ...design.wind.directions.map((d) => naturalGustCase(design, model, f, d)), truckGustCase(design, model, f)];
  return out.filter((c): c is LoadCase => c !== null);
}

function inLane(a: Attachment, lanes: readonly { arm: string; from_m: number; to_m: number }[]): boolean {
  return lanes.some((l) => l.arm === a.member && a.position_m >= l.from_m - 1e-9 && a.position_m <= l.to_m + 1e-9);
}

function attachmentHeight(design: Design, a: Attachment): number {
  const ax = memberAxes(design).find((m) => m.id === a.member);
  if (!ax) throw new RangeError(`no member '${a.member}'`);
  return add(pointOnAxis(ax, a.position_m), offsetVector(ax, a.offset))[2];
}

function total(steps: StepCollector, model: FrameModel, loads: readonly AppliedLoad[], how: 'vertical' | 'horizontal', wdir?: Vec3): void {
  const R = loadResultant(model, loads).force_N;
  const v = how === 'vertical' ? R[2] : dot(R, wdir as Vec3);
  steps.add({ description: `Total ${how === 'vertical' ? 'vertical force' : 'horizontal force along the wind direction'} of this case (sum of the loads)`, symbol: 'ΣF', formula: 'ΣF = Σ F', substituted: sumByOrigin(model, loads, (F) => (how === 'vertical' ? F[2] : dot(F, wdir as Vec3))), result: qty(v, 'force'), source: 'sum of the loads above' });
}

/** Positions along the arm (within [from, to]) where the height factor has a kink: where the
 * axis crosses the full-pressure and the zero-pressure levels. */
function laneCuts(ax: MemberAxis, from_m: number, to_m: number, zFull_m: number, zZero_m: number): number[] {
  const dz = ax.direction[2];
  if (Math.abs(dz) < 1e-12) return [from_m, to_m];
  const z0 = ax.origin_m[2];
  const cuts = [zFull_m, zZero_m].map((z) => (z - z0) / dz).filter((s) => s > from_m && s < to_m);
  return [from_m, ...cuts, to_m];
}
