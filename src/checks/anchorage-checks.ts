// Anchor bolts and base plate, for every factored combination, from the base reaction:
// bolt forces on the elastic bolt circle (anchor/bolt-group.ts), bolt axial force, shear and
// tension with shear by AISC 360-16 Section J3 (anchor/bolt-resistance.ts), bolt bending over a
// stand-off of more than one bolt diameter, and base plate bending by an effective width
// (anchor/base-plate.ts). Without criteria.anchorBolts no record is made, and the package lists
// the checks as not made.
import { StepCollector, qty, type CalcStep } from '../calc/step.ts';
import type { AnchorBolts, Design } from '../design/design.ts';
import type { DesignAnalysis } from '../analyse-design.ts';
import type { Combination } from '../loads/load-types.ts';
import type { Vec6 } from '../model/frame.ts';
import { isFactored } from '../design/combination-use.ts';
import { boltThread, stressArea, stressDiameter, threadName, threadSource, type BoltThread } from '../design/thread-tables.ts';
import { makeRecord, type CheckedRecords } from './check-record.ts';
import type { CheckType } from './check-types.ts';
import { baseActions, boltForces, type BaseActions, type BoltForces } from './anchor/bolt-group.ts';
import { J3, FNT_OF_FU, FNV_OF_FU, nominalShear, nominalTension, nominalTensionWithShear, reducedTensileStress, type BoltAreas } from './anchor/bolt-resistance.ts';
import { BOLT_BENDING_SOURCE, boltBending, bendingApplies } from './anchor/bolt-bending.ts';
import { BASE_PLATE_SOURCE, basePlateBending } from './anchor/base-plate.ts';
import { baseReaction } from './anchor/base-reaction.ts';

export const BOLT_GROUP_SOURCE = 'elastic bolt-circle method: rigid plate, n equal bolts equally spaced on the circle, largest bolt force 4M/(nD) ∓ P/n (statics of the bolt group)';
const AXIAL_NOTE = 'the larger of the largest tension and the largest compression: the bolts are taken to carry the compression under the leveling nuts as well (a double-nut base; conservative where the plate bears on grout)';

export interface BoltGeometry {
  readonly bolts: AnchorBolts;
  readonly thread: BoltThread;
  readonly areas: BoltAreas;
}

/** The bolt areas, or the reason they cannot be found. */
export function boltGeometry(bolts: AnchorBolts): BoltGeometry | { readonly cannot: string } {
  const thread = boltThread(bolts);
  if (thread === null) return { cannot: 'the bolt diameter is not a standard UNC (1/2 in to 4 in) or ISO coarse (M12 to M72) size: give criteria.anchorBolts.threadsPerInch or pitch for its thread' };
  const d = bolts.boltDiameter_m;
  if (!(stressDiameter(d, thread) > 0)) return { cannot: 'the thread pitch is too coarse for the bolt diameter: the thread leaves no stress area' };
  return { bolts, thread, areas: { Ab_m2: (Math.PI / 4) * d * d, At_m2: stressArea(d, thread) } };
}

export function anchorageChecks(design: Design, analysis: DesignAnalysis): CheckedRecords {
  const out: CheckedRecords = { records: [], steps: new Map() };
  const bolts = design.criteria.anchorBolts;
  if (bolts === null) return out;
  const g = boltGeometry(bolts);
  const types: CheckType[] = ['bolt-tension', 'bolt-shear', 'bolt-combined', ...(bendingApplies(bolts) ? (['bolt-bending'] as const) : []), ...(design.criteria.basePlate !== null ? (['base-plate'] as const) : [])];
  if ('cannot' in g) {
    for (const type of types) out.records.push(makeRecord({ type, label: 'Anchor bolts: cannot be made', member: type === 'base-plate' ? 'base-plate' : 'anchor-bolts', s_m: null, combination: null, demand: qty(bolts.boltDiameter_m, 'section'), capacity: qty(bolts.boltDiameter_m, 'section'), equation: J3, cannot: g.cannot }));
    return out;
  }
  const phi = design.criteria.phi;
  for (const comb of analysis.combinations) {
    if (!isFactored(comb.category) || !analysis.results[comb.id]) continue;
    const reaction = baseReaction(analysis, comb.id);
    const a = baseActions(reaction);
    const f = boltForces(a, bolts.count, bolts.circleDiameter_m);
    const Fb = Math.max(f.tension_N, f.compression_N, 0);
    const head = (): StepCollector => forceSteps(comb, reaction, a, f, g);

    const phiRt = phi.boltTension * nominalTension(bolts, g.areas);
    add(out, { type: 'bolt-tension', label: 'Largest anchor bolt axial force', combination: comb.id, demand: qty(Fb, 'force'), capacity: qty(phiRt, 'force'), equation: `${J3}, Eq. J3-1 and Table J3.2 (threaded parts), with the thread stress area` }, () => {
      const c = head();
      tensionSteps(c, g, phi.boltTension, Fb);
      return [...c.steps];
    });

    const phiRv = phi.boltShear * nominalShear(bolts, g.areas);
    add(out, { type: 'bolt-shear', label: 'Anchor bolt shear, base shear plus torque', combination: comb.id, demand: qty(f.shear_N, 'force'), capacity: qty(phiRv, 'force'), equation: `${J3}, Eq. J3-1 and Table J3.2 (threads not excluded from the shear plane)` }, () => {
      const c = head();
      shearSteps(c, g, phi.boltShear, f.shear_N);
      return [...c.steps];
    });

    const frv = f.shear_N / g.areas.Ab_m2;
    const FntP = reducedTensileStress(bolts, frv, phi.boltShear);
    const combinedEq = `${J3}, Eqs. J3-2 and J3-3a`;
    const combined = FntP > 0
      ? { demand: qty(Fb, 'force'), capacity: qty(phi.boltTension * nominalTensionWithShear(bolts, g.areas, FntP), 'force'), equation: combinedEq }
      : { demand: qty(frv, 'stress'), capacity: qty(phi.boltShear * FNV_OF_FU * bolts.Fu_Pa, 'stress'), equation: combinedEq, cannot: 'the shear stress leaves no tensile resistance (F′nt of Eq. J3-3a is zero or less)' };
    add(out, { type: 'bolt-combined', label: 'Anchor bolt axial force with shear', combination: comb.id, ...combined }, () => {
      const c = head();
      shearSteps(c, g, phi.boltShear, f.shear_N);
      combinedSteps(c, g, phi, Fb, f.shear_N);
      return [...c.steps];
    });

    if (bendingApplies(bolts)) {
      const bb = boltBending(bolts, g.areas, Fb, f.shear_N);
      add(out, { type: 'bolt-bending', label: 'Anchor bolt bending over the stand-off', combination: comb.id, demand: qty(bb.stress_Pa, 'stress'), capacity: qty(phi.flexure * bolts.Fy_Pa, 'stress'), equation: BOLT_BENDING_SOURCE }, () => {
        const c = head();
        boltBending(bolts, g.areas, Fb, f.shear_N, c);
        c.add({ description: 'Design stress limit of the bolt (first yield)', symbol: 'φ Fy', formula: 'φ Fy', substituted: [`${phi.flexure} × `, qty(bolts.Fy_Pa, 'stress')], result: qty(phi.flexure * bolts.Fy_Pa, 'stress'), source: 'resistance factor for flexure (criteria.resistanceFactors.flexure) on the bolt yield strength', status: bb.stress_Pa <= phi.flexure * bolts.Fy_Pa ? 'ok' : 'fail' });
        return [...c.steps];
      });
    }

    const plate = design.criteria.basePlate;
    if (plate !== null) {
      const bp = basePlateBending(design, bolts, plate, Fb);
      const base = { type: 'base-plate' as const, member: 'base-plate', label: 'Base plate bending at the pole face', combination: comb.id, equation: BASE_PLATE_SOURCE };
      const rec = 'cannot' in bp
        ? { ...base, demand: qty(bolts.circleDiameter_m, 'section'), capacity: qty(design.pole.section.rootDiameter_m, 'section'), cannot: bp.cannot }
        : { ...base, demand: qty(bp.Mu_Nm, 'moment'), capacity: qty(bp.phiMn_Nm, 'moment') };
      add(out, rec, () => {
        const c = head();
        basePlateBending(design, bolts, plate, Fb, c);
        return [...c.steps];
      });
    }
  }
  return out;
}

type AddInput = Omit<Parameters<typeof makeRecord>[0], 'member' | 's_m'> & { member?: string };

function add(out: CheckedRecords, r: AddInput, steps: () => CalcStep[]): void {
  const rec = makeRecord({ member: 'anchor-bolts', s_m: null, ...r });
  out.records.push(rec);
  out.steps.set(rec, steps);
}

/** The base reaction, the bolt group and the bolt forces: the head of every anchorage step list. */
function forceSteps(comb: Combination, r: Vec6, a: BaseActions, f: BoltForces, g: BoltGeometry): StepCollector {
  const c = new StepCollector();
  const { bolts } = g;
  const src = `base reaction of the analysis under ${comb.id}`;
  c.add({ description: 'Overturning moment at the base', symbol: 'M', formula: 'M = √(Mx² + My²)', substituted: ['√((', qty(r[3], 'moment'), ')² + (', qty(r[4], 'moment'), ')²)'], result: qty(a.M_Nm, 'moment'), source: src });
  c.add({ description: 'Vertical force of the pole on the base (down +; negative is uplift)', symbol: 'P', formula: 'P = Fz', substituted: [qty(r[2], 'force')], result: qty(a.P_N, 'force'), source: src });
  c.add({ description: 'Base shear', symbol: 'V', formula: 'V = √(Fx² + Fy²)', substituted: ['√((', qty(r[0], 'force'), ')² + (', qty(r[1], 'force'), ')²)'], result: qty(a.V_N, 'force'), source: src });
  c.add({ description: 'Torque about the pole axis', symbol: 'T', formula: 'T = |Mz|', substituted: [qty(r[5], 'moment')], result: qty(a.T_Nm, 'moment'), source: src });
  const nD = ['4 × ', qty(a.M_Nm, 'moment'), ` / (${bolts.count} × `, qty(bolts.circleDiameter_m, 'section'), ')'] as const;
  c.add({ description: `Largest bolt tension, ${bolts.count} bolts on the bolt circle`, symbol: 'T_b', formula: 'T_b = 4M/(nD) − P/n', substituted: [...nD, ' − ', qty(a.P_N, 'force'), ` / ${bolts.count}`], result: qty(f.tension_N, 'force'), source: BOLT_GROUP_SOURCE });
  c.add({ description: 'Largest bolt compression', symbol: 'C_b', formula: 'C_b = 4M/(nD) + P/n', substituted: [...nD, ' + ', qty(a.P_N, 'force'), ` / ${bolts.count}`], result: qty(f.compression_N, 'force'), source: BOLT_GROUP_SOURCE });
  c.add({ description: `Design axial force of a bolt: ${AXIAL_NOTE}`, symbol: 'F_b', formula: 'F_b = max(T_b, C_b)', substituted: [qty(f.tension_N, 'force'), ', ', qty(f.compression_N, 'force')], result: qty(Math.max(f.tension_N, f.compression_N, 0), 'force'), source: 'polebook, conservative' });
  c.add({
    description: 'Shear per bolt: base shear shared equally plus the torque on the bolt circle, added as if in one direction (an upper bound)',
    symbol: 'V_b',
    formula: 'V_b = V/n + T/(n D/2)',
    substituted: [qty(a.V_N, 'force'), ` / ${bolts.count} + `, qty(a.T_Nm, 'moment'), ` / (${bolts.count} × `, qty(bolts.circleDiameter_m / 2, 'section'), ')'],
    result: qty(f.shear_N, 'force'),
    source: BOLT_GROUP_SOURCE,
  });
  const t = g.thread;
  c.add({ description: 'Nominal bolt area', symbol: 'Ab', formula: 'Ab = π d²/4', substituted: ['π × (', qty(bolts.boltDiameter_m, 'section'), ')² / 4'], result: qty(g.areas.Ab_m2, 'sectionArea'), source: 'geometry' });
  c.add({
    description: `Tensile stress area, ${threadName(t)} (${t.from === 'table' ? 'the standard coarse thread of the size' : 'as given'})`,
    symbol: 'At',
    formula: t.standard === 'UNC' ? 'At = π/4 (d − 0.9743 p)²' : 'As = π/4 (d − 0.9382 P)²',
    substituted: ['π/4 × (', qty(bolts.boltDiameter_m, 'section'), ` − ${t.standard === 'UNC' ? '0.9743' : '0.9382'} × `, qty(t.pitch_m, 'section'), ')²'],
    result: qty(g.areas.At_m2, 'sectionArea'),
    source: threadSource(t),
  });
  return c;
}

function tensionSteps(c: StepCollector, g: BoltGeometry, phiT: number, Fb: number): void {
  const { bolts, areas } = g;
  const rodNominal = bolts.Fu_Pa * areas.At_m2;
  const aiscNominal = FNT_OF_FU * bolts.Fu_Pa * areas.Ab_m2;
  c.add({ description: 'Tensile strength of the threaded rod on its stress area', symbol: 'Rn,rod', formula: 'Rn,rod = Fu At', substituted: [qty(bolts.Fu_Pa, 'stress'), ' × ', qty(areas.At_m2, 'sectionArea')], result: qty(rodNominal, 'force'), source: 'tensile stress area of the thread' });
  c.add({ description: 'Nominal tensile strength on the nominal area, Fnt = 0.75 Fu', symbol: 'Rn,J3', formula: 'Rn,J3 = Fnt Ab = 0.75 Fu Ab', substituted: ['0.75 × ', qty(bolts.Fu_Pa, 'stress'), ' × ', qty(areas.Ab_m2, 'sectionArea')], result: qty(aiscNominal, 'force'), source: `${J3}, Eq. J3-1, Table J3.2 (threaded parts)` });
  const phiRn = phiT * Math.min(rodNominal, aiscNominal);
  c.add({ description: 'Design axial resistance of a bolt (the smaller nominal value)', symbol: 'φRn', formula: 'φRn = φ min(Rn,rod, Rn,J3)', substituted: [`${phiT} × min(`, qty(rodNominal, 'force'), ', ', qty(aiscNominal, 'force'), ')'], result: qty(phiRn, 'force'), source: 'resistance factor criteria.resistanceFactors.boltTension', status: Fb <= phiRn * (1 + 1e-9) ? 'ok' : 'fail' });
}

function shearSteps(c: StepCollector, g: BoltGeometry, phiV: number, Vb: number): void {
  const { bolts, areas } = g;
  const phiRn = phiV * nominalShear(bolts, areas);
  c.add({ description: 'Design shear resistance of a bolt, Fnv = 0.450 Fu (threads not excluded from the shear plane)', symbol: 'φRnv', formula: 'φRnv = φ 0.450 Fu Ab', substituted: [`${phiV} × 0.450 × `, qty(bolts.Fu_Pa, 'stress'), ' × ', qty(areas.Ab_m2, 'sectionArea')], result: qty(phiRn, 'force'), source: `${J3}, Eq. J3-1, Table J3.2; resistance factor criteria.resistanceFactors.boltShear`, status: Vb <= phiRn * (1 + 1e-9) ? 'ok' : 'fail' });
}

function combinedSteps(c: StepCollector, g: BoltGeometry, phi: Design['criteria']['phi'], Fb: number, Vb: number): void {
  const { bolts, areas } = g;
  const frv = Vb / areas.Ab_m2;
  const Fnt = FNT_OF_FU * bolts.Fu_Pa;
  const Fnv = FNV_OF_FU * bolts.Fu_Pa;
  const FntP = reducedTensileStress(bolts, frv, phi.boltShear);
  c.add({ description: 'Required shear stress', symbol: 'frv', formula: 'frv = V_b / Ab', substituted: [qty(Vb, 'force'), ' / ', qty(areas.Ab_m2, 'sectionArea')], result: qty(frv, 'stress'), source: J3 });
  c.add({ description: 'Nominal tensile stress reduced for the shear, at most Fnt', symbol: 'F′nt', formula: 'F′nt = 1.3 Fnt − Fnt/(φ Fnv) frv ≤ Fnt', substituted: ['1.3 × ', qty(Fnt, 'stress'), ' − ', qty(Fnt, 'stress'), ` / (${phi.boltShear} × `, qty(Fnv, 'stress'), ') × ', qty(frv, 'stress')], result: qty(FntP, 'stress'), source: `${J3}, Eq. J3-3a (applied at every ratio of shear, also where J3.7 lets it be left out)`, status: FntP > 0 ? 'info' : 'fail' });
  if (!(FntP > 0)) return;
  const nominal = nominalTensionWithShear(bolts, areas, FntP);
  const phiRn = phi.boltTension * nominal;
  c.add({ description: 'Design axial resistance with shear (the smaller of the rod strength and F′nt Ab)', symbol: 'φR′n', formula: 'φR′n = φ min(Fu At, F′nt Ab)', substituted: [`${phi.boltTension} × min(`, qty(bolts.Fu_Pa * areas.At_m2, 'force'), ', ', qty(FntP * areas.Ab_m2, 'force'), ')'], result: qty(phiRn, 'force'), source: `${J3}, Eq. J3-2`, status: Fb <= phiRn * (1 + 1e-9) ? 'ok' : 'fail' });
}
