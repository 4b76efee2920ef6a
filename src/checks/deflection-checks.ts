// Deflection checks: the arm tips under the unfactored dead load (vertical), the arm tips and the
// pole top under the service combinations (horizontal; for an arm its own deflection, without the
// movement it has with the pole), and the arm tips under the galloping and
// truck-gust fatigue loads (vertical, sign and signal supports). Movements are those of the member
// axis at its tip from the analysis, in global axes, including the movement of the pole.
import { qty, type CalcStep } from '../calc/step.ts';
import type { Design } from '../design/design.ts';
import type { DesignAnalysis } from '../analyse-design.ts';
import type { Station } from '../analysis/analysis-types.ts';
import type { Vec3, Vec6 } from '../model/frame.ts';
import { add, cross, sub } from '../model/vec3.ts';
import { isDeadOnly } from '../input/combinations.ts';
import { GALLOPING_CASE_ID, TRUCK_GUST_CASE_ID } from '../loads/fatigue-load.ts';
import type { CheckRecord } from './check-types.ts';
import { makeRecord, type CheckedRecords } from './check-record.ts';
import { isService } from '../design/combination-use.ts';

const tipOf = (stations: readonly Station[]): Station => stations.reduce((a, b) => (b.s_m >= a.s_m ? b : a));
const limitSource = (key: string) => `limit from criteria.deflection.${key} (input or the labelled default printed in the criteria section)`;

export function deflectionChecks(design: Design, analysis: DesignAnalysis): CheckedRecords {
  const out: CheckedRecords = { records: [], steps: new Map() };
  const lim = design.criteria.deflection;
  const add = (rec: CheckRecord, steps: () => CalcStep[]) => {
    out.records.push(rec);
    out.steps.set(rec, steps);
  };
  const specDeadOnly = new Set(design.combinations.filter((c) => c.category === 'service' && isDeadOnly(c)).map((c) => c.id));
  for (const comb of analysis.combinations) {
    const r = analysis.results[comb.id];
    if (!r) continue;
    const deadOnly = specDeadOnly.has(comb.specId);
    if (isService(comb.category)) {
      for (const arm of design.arms) {
        const tip = tipOf(r.members[arm.id]!.stations);
        if (deadOnly) {
          const limit = lim.armTipDeadRatio * arm.length_m;
          add(
            makeRecord({ type: 'deflection-dead', label: 'Arm tip vertical deflection, unfactored dead load', member: arm.id, s_m: tip.s_m, combination: comb.id, demand: qty(Math.abs(tip.uz_m), 'section'), capacity: qty(limit, 'section'), equation: 'δ_v ≤ L/n (limit of the input)' }),
            () => [
              { description: `Vertical movement of the tip of arm ${arm.id} under ${comb.id} (analysis, member axis at s = L)`, symbol: 'δ_v', formula: 'δ_v = |u_z(L)|', substituted: [qty(tip.uz_m, 'section')], result: qty(Math.abs(tip.uz_m), 'section'), source: 'analysis results of the combination', status: 'info' },
              { description: 'Limit', symbol: 'δ_lim', formula: 'δ_lim = L × limit ratio', substituted: [qty(arm.length_m, 'length'), ' × ', qty(lim.armTipDeadRatio, 'ratio')], result: qty(limit, 'section'), source: limitSource('armTipDead'), status: 'info' },
            ],
          );
          continue;
        }
        const rel = armOwnMovement(analysis, arm.id, r.displacements, tip);
        const h = Math.hypot(rel[0], rel[1]);
        const limit = lim.armTipServiceRatio * arm.length_m;
        add(
          makeRecord({ type: 'deflection-service', label: 'Arm tip horizontal deflection of the arm itself, service', member: arm.id, s_m: tip.s_m, combination: comb.id, demand: qty(h, 'section'), capacity: qty(limit, 'section'), equation: 'δ_h,arm ≤ L/n (limit of the input)' }),
          () => [
            { description: `Movement of the tip of arm ${arm.id} under ${comb.id}, less the rigid-body movement of the arm with its root (the pole's sway and rotation), horizontal part`, symbol: 'δ_h,arm', formula: 'δ_h,arm = |(u_tip − u_root − θ_root × r)_horizontal|', substituted: ['√((', qty(rel[0], 'section'), ')² + (', qty(rel[1], 'section'), ')²)'], result: qty(h, 'section'), source: 'analysis results of the combination (node displacements and rotations)', status: 'info' },
            { description: 'Limit', symbol: 'δ_lim', formula: 'δ_lim = L × limit ratio', substituted: [qty(arm.length_m, 'length'), ' × ', qty(lim.armTipServiceRatio, 'ratio')], result: qty(limit, 'section'), source: limitSource('armTipService'), status: 'info' },
          ],
        );
      }
      if (deadOnly) continue;
      const top = tipOf(r.members.pole!.stations);
      const h = Math.hypot(top.ux_m, top.uy_m);
      const limit = lim.poleTopServiceRatio * design.pole.height_m;
      add(
        makeRecord({ type: 'deflection-service', label: 'Pole top horizontal deflection, service', member: 'pole', s_m: top.s_m, combination: comb.id, demand: qty(h, 'section'), capacity: qty(limit, 'section'), equation: 'δ_h ≤ H/n (limit of the input)' }),
        () => horizontalSteps('the pole top', comb.id, top, design.pole.height_m, lim.poleTopServiceRatio, limit, 'H', 'poleTopService'),
      );
    }
    const verticalFatigue = comb.category === 'fatigue' && (comb.id === GALLOPING_CASE_ID || comb.id === TRUCK_GUST_CASE_ID) && design.kind !== 'luminaire-pole';
    if (verticalFatigue) {
      for (const arm of design.arms) {
        const tip = tipOf(r.members[arm.id]!.stations);
        add(
          makeRecord({ type: 'deflection-fatigue', label: 'Arm tip vertical deflection, fatigue load', member: arm.id, s_m: tip.s_m, combination: comb.id, demand: qty(Math.abs(tip.uz_m), 'section'), capacity: qty(lim.armTipFatigue_m, 'section'), equation: 'δ_v ≤ limit (AASHTO LRFD-LTS fatigue deflection limit, from memory; verify)' }),
          () => [
            { description: `Vertical movement of the tip of arm ${arm.id} under ${comb.id} (analysis, member axis at s = L)`, symbol: 'δ_v', formula: 'δ_v = |u_z(L)|', substituted: [qty(tip.uz_m, 'section')], result: qty(Math.abs(tip.uz_m), 'section'), source: 'analysis results of the fatigue load case', status: 'info' },
            { description: 'Limit', symbol: 'δ_lim', formula: 'δ_lim (input)', substituted: [qty(lim.armTipFatigue_m, 'section')], result: qty(lim.armTipFatigue_m, 'section'), source: limitSource('armTipFatigue'), status: 'info' },
          ],
        );
      }
    }
  }
  return out;
}

/** The tip movement of an arm less the rigid-body movement it has with the pole node it hangs
 * from (translation plus rotation × lever arm): the arm's own bending and twisting. */
function armOwnMovement(analysis: DesignAnalysis, armId: string, displacements: readonly Vec6[], tip: Station): Vec3 {
  const info = analysis.model.members.find((m) => m.id === armId)!;
  const first = analysis.model.elements[info.elements[0]!]!;
  const last = analysis.model.elements[info.elements[info.elements.length - 1]!]!;
  const root = analysis.model.nodes[first.i]!.xyz_m;
  const tipXyz = add(analysis.model.nodes[last.j]!.xyz_m, last.offsetJ_m);
  const u = displacements[first.i]!;
  const rigid = add([u[0], u[1], u[2]], cross([u[3], u[4], u[5]], sub(tipXyz, root)));
  return sub([tip.ux_m, tip.uy_m, tip.uz_m], rigid);
}

function horizontalSteps(what: string, comb: string, st: Station, L: number, ratio: number, limit: number, sym: string, key: string): CalcStep[] {
  const h = Math.hypot(st.ux_m, st.uy_m);
  return [
    { description: `Horizontal movement of ${what} under ${comb} (analysis, member axis)`, symbol: 'δ_h', formula: 'δ_h = √(u_x² + u_y²)', substituted: ['√((', qty(st.ux_m, 'section'), ')² + (', qty(st.uy_m, 'section'), ')²)'], result: qty(h, 'section'), source: 'analysis results of the combination', status: 'info' },
    { description: 'Limit', symbol: 'δ_lim', formula: `δ_lim = ${sym} × limit ratio`, substituted: [qty(L, 'length'), ' × ', qty(ratio, 'ratio')], result: qty(limit, 'section'), source: limitSource(key), status: 'info' },
  ];
}
