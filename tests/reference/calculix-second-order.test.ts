// polebook's second-order analysis (P-delta by geometric stiffness, iterated: analyzeCombination
// with secondOrder) against CalculiX 2.20 (Debian calculix-ccx) with a geometrically nonlinear step
// (*STEP, NLGEOM): full geometric nonlinearity, a superset of P-delta, loads keeping their
// direction. Base moments in ccx come from statics of its loads at their displaced points
// (calculix/deformed-statics.ts; the frames have one fixed support). Skipped when ccx is absent.
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../../src/model/frame.ts';
import type { AppliedLoad, Combination, LoadCase } from '../../src/loads/load-types.ts';
import { analyzeCombination, combinedLoads } from '../../src/analysis/analyze.ts';
import { analyseDesign } from '../../src/analyse-design.ts';
import { loadDesignFile } from '../../src/input/index.ts';
import { packageRoot } from '../../src/package-root.ts';
import { FrameSketch, nodalLoad, type TubeProps } from './calculix/frame-sketch.ts';
import { roundTubeSection } from './calculix/pipe-from-section.ts';
import { runCalculix } from './calculix/run-calculix.ts';
import { applyFactors } from './calculix/factored-loads.ts';
import { deformedBaseMoment } from './calculix/deformed-statics.ts';
import { ccxAvailableOrSkip } from './calculix/has-ccx.ts';
import { pct } from './calculix/compare.ts';
import { norm, sub } from './calculix/vec3.ts';

const ccxPresent = ccxAvailableOrSkip();

// Steel moduli, typical values (E = 200 GPa, G = 77 GPa), verify against the governing code;
// both programs get the same values.
const E_Pa = 200e9;
const G_Pa = 77e9;
const tube = (D_m: number, t_m: number): TubeProps => ({ E_Pa, G_Pa, ...roundTubeSection(D_m, t_m), diameter_m: D_m });
const horizontal = (v: Vec3): number => Math.hypot(v[0], v[1]);

describe.skipIf(!ccxPresent)('second order: polebook P-delta against CalculiX 2.20 NLGEOM', () => {
  it('beam-column: pole under a quarter of its buckling load and a lateral tip load (amplification about 1.3)', async () => {
    // Vertical cantilever, 9 m, tube 0.3 x 0.006 in 8 elements; tip loads P down and H along x.
    // Closed form (beam-column, Timoshenko & Gere, Theory of Elastic Stability, ch. 1, from memory):
    // tip deflection H (tan kL - kL) / (P k), k = sqrt(P / EI); base moment H L + P delta.
    // Tolerances: 2 % between polebook and ccx for the tip deflection and the base moment (the
    // issue's 1-2 % for second order; ccx adds shear deformation, a few tenths of a percent
    // amplified by 1.3, and its large-rotation terms, of order (delta/L)^2 = 1e-4 here); the closed
    // form is held to the same 2 %, which also shows the case really is second order (its first-order
    // deflection is 25 % smaller).
    const tp = tube(0.3, 0.006);
    const L = 9;
    const EI = E_Pa * tp.I_m4;
    const Pcr = (Math.PI ** 2 * EI) / (4 * L * L); // Euler, fixed-free column
    const P = 0.25 * Pcr;
    const H = 0.01 * P;
    const s = new FrameSketch();
    const base = s.node([0, 0, 0], 'base');
    const tip = s.chain('pole', base, [0, 0, L], Array.from({ length: 8 }, () => tp), [1, 0, 0]);
    const model = s.build(base);
    const loads: AppliedLoad[] = [nodalLoad(tip, [H, 0, -P])];
    const cases: LoadCase[] = [{ id: 'all', kind: 'dead', description: 'test', windAngle_rad: null, loads, steps: [] }];
    const combo: Combination = { id: 'c', specId: 'c', category: 'strength', description: 'test', source: 'test', factors: [{ caseId: 'all', factor: 1 }] };
    const pb = analyzeCombination(model, cases, combo, { secondOrder: true, tolerance: 1e-10, maxIterations: 100, stationSpacing_m: 1 });
    const ccx = await runCalculix(model, loads, { nlgeom: true, printAllNodes: true });
    const k = Math.sqrt(P / EI);
    const exactTip = (H * (Math.tan(k * L) - k * L)) / (P * k);
    const exactBase = H * L + P * exactTip;
    const firstOrderTip = (H * L ** 3) / (3 * EI);
    expect(exactTip / firstOrderTip).toBeGreaterThan(1.25);
    const ccxTip = ccx.translations_m[tip]![0];
    const ccxBase = horizontal(deformedBaseMoment(model, ccx));
    const pbTip = pb.displacements[tip]![0];
    const pbBase = pb.baseMoment!.final_Nm;
    console.info(
      `[CalculiX NLGEOM] beam-column: tip polebook ${pbTip.toExponential(4)} m, ccx ${ccxTip.toExponential(4)} m, closed form ${exactTip.toExponential(4)} m; ` +
        `base moment polebook ${pbBase.toFixed(1)}, ccx ${ccxBase.toFixed(1)}, closed form ${exactBase.toFixed(1)} N m`,
    );
    expect(Math.abs(pbTip / ccxTip - 1)).toBeLessThan(0.02);
    expect(Math.abs(pbBase / ccxBase - 1)).toBeLessThan(0.02);
    expect(Math.abs(ccxTip / exactTip - 1)).toBeLessThan(0.02);
    expect(Math.abs(pbTip / exactTip - 1)).toBeLessThan(0.02);
  });

  it('examples/cantilever-sign.yaml, extreme-wind-max@wind-090: base moment within 1 %, pole-top and arm-tip translations within 2 %', async () => {
    // Amplification here is small (polebook 1.0017, ccx 1.0022 on the base moment), so this checks
    // that polebook's second-order answer lies where full geometric nonlinearity puts it (1 %, the
    // first-order displacement tolerance), not the size of the second-order increment: that differs
    // (ccx's base-moment increment is about 1.35 times polebook's) because the axial-force-only
    // geometric stiffness leaves out, e.g., the moment of the vertical loads on the arm as the arm
    // swings in plan with the pole's twist and of the wind on the arm as the arm drops (ccx
    // foreshortens the arm too: its tip moves 4 mm toward the pole, which P-delta does not model).
    // Translations: 2 % (the 1-2 % for second order): the first-order difference is up to
    // 0.56 % at the pole top (shear deformation, calculix-examples.test.ts), and the arm's
    // foreshortening (4.3 mm along the arm under a 0.31 m deflection, of order delta^2 / L) is 1.3 %
    // of the arm tip's translation.
    const { design } = loadDesignFile(join(packageRoot(), 'examples', 'cantilever-sign.yaml'));
    const { model, cases, combinations, options, results } = analyseDesign(design, {});
    expect(options.secondOrder).toBe(true);
    const id = 'extreme-wind-max@wind-090';
    const combo = combinations.find((c) => c.id === id)!;
    const pb = results[id]!;
    const ccx = await runCalculix(model, applyFactors(combinedLoads(cases, combo)), { nlgeom: true, printAllNodes: true, torsion: 'scale-shear-modulus' });
    const ccxBase = horizontal(deformedBaseMoment(model, ccx));
    const pbBase = pb.baseMoment!.final_Nm;
    const firstOrder = pb.baseMoment!.firstOrder_Nm;
    console.info(
      `[CalculiX NLGEOM] ${id}: base moment polebook ${pbBase.toFixed(0)} (x${(pbBase / firstOrder).toFixed(5)}), ` +
        `ccx ${ccxBase.toFixed(0)} (x${(ccxBase / firstOrder).toFixed(5)}) N m; difference ${pct(pbBase / ccxBase - 1)}`,
    );
    expect(Math.abs(pbBase / ccxBase - 1)).toBeLessThan(0.01);
    const keyNodes = model.nodes.filter((n) => /pole-top|arm-tip/.test(n.tag));
    const largest = Math.max(...keyNodes.map((n) => norm(ccx.translations_m[n.id]!)));
    for (const n of keyNodes) {
      const u = pb.displacements[n.id]!;
      const d = norm(sub([u[0], u[1], u[2]], ccx.translations_m[n.id]!));
      // Own translation, floored at a tenth of the largest (as in calculix-examples.test.ts).
      const e = d / Math.max(norm(ccx.translations_m[n.id]!), largest / 10);
      console.info(`[CalculiX NLGEOM] ${id}: ${n.tag} translation difference ${pct(e)}`);
      expect(e, n.tag).toBeLessThan(0.02);
    }
  });
  it('tapered pole with a heavy head and a bracket-mounted attachment (tests/fixtures/heavy-head-pole.yaml): amplification within 1 % of (A - 1)', async () => {
    // The head is an attachment at the top node, applied on the end of the top element, and the
    // bracket box on the end of an element part way up: the loads whose P-delta stiffness was
    // halved before each element used the axial force it carries. Amplification about 1.19.
    // Tolerance: the second-order increment (A - 1) of the base moment within 1 % of ccx's (the
    // comparison asked of the method); ccx also has shear deformation and large rotations, a few
    // tenths of a percent here. Pole-top translation within 2 % (as for the cantilever sign).
    const { design } = loadDesignFile(join(packageRoot(), 'tests', 'fixtures', 'heavy-head-pole.yaml'));
    const { model, cases, combinations, results } = analyseDesign(design, {});
    for (const combo of combinations) {
      const pb = results[combo.id]!;
      const ccx = await runCalculix(model, applyFactors(combinedLoads(cases, combo)), { nlgeom: true, printAllNodes: true, torsion: 'scale-shear-modulus' });
      const firstOrder = pb.baseMoment!.firstOrder_Nm;
      const ccxBase = horizontal(deformedBaseMoment(model, ccx));
      const pbIncrement = pb.baseMoment!.final_Nm / firstOrder - 1;
      const ccxIncrement = ccxBase / firstOrder - 1;
      console.info(
        `[CalculiX NLGEOM] heavy-head pole ${combo.id}: base moment polebook ${pb.baseMoment!.final_Nm.toFixed(0)} (A - 1 = ${pbIncrement.toFixed(5)}), ` +
          `ccx ${ccxBase.toFixed(0)} (A - 1 = ${ccxIncrement.toFixed(5)}) N m; increment difference ${pct(pbIncrement / ccxIncrement - 1)}`,
      );
      expect(pbIncrement).toBeGreaterThan(0.1);
      expect(Math.abs(pbIncrement / ccxIncrement - 1)).toBeLessThan(0.01);
      const top = model.nodes.find((n) => n.tag.split(',').includes('pole-top'))!;
      const u = pb.displacements[top.id]!;
      const ref = ccx.translations_m[top.id]!;
      expect(norm(sub([u[0], u[1], u[2]], ref)) / norm(ref)).toBeLessThan(0.02);
    }
  });
});
