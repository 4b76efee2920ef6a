// Validated criteria input -> Criteria of the design: limits by structure kind, resistance
// factors, anchor bolts, base plate and vortex-shedding settings, each default logged.
import type { AnchorBolts, BasePlate, Criteria, StructureKind } from '../design/design.ts';
import { f1554Grade, F1554_SOURCE } from '../design/anchor-bolt-grades.ts';
import type { AssumptionLog } from './assumptions.ts';
import { error, type InputPath, type Problem } from './problem.ts';
import type { DesignInput } from './schema.ts';

type CriteriaInput = NonNullable<DesignInput['criteria']>;

export function buildCriteria(input: DesignInput, log: AssumptionLog, problems: Problem[]): Criteria {
  const c: CriteriaInput = input.criteria ?? {};
  const kind: StructureKind = input.structure.kind;
  const r = c.resistanceFactors ?? {};
  const d = c.deflection ?? {};
  const v = c.vortex ?? {};
  const poleTop = kind === 'luminaire-pole' ? 'poleTopServiceDeflectionLuminaire' : 'poleTopServiceDeflectionSignal';
  return {
    deflection: {
      armTipDeadRatio: log.take('armTipDeadDeflection', d.armTipDead),
      armTipServiceRatio: log.take('armTipServiceDeflection', d.armTipService),
      poleTopServiceRatio: log.take(poleTop, d.poleTopService),
      armTipFatigue_m: log.take('armTipFatigueDeflection', d.armTipFatigue),
    },
    columnK: log.take('columnK', c.columnEffectiveLengthFactor),
    phi: {
      flexure: log.take('phiFlexure', r.flexure),
      shear: log.take('phiShear', r.shear),
      torsion: log.take('phiTorsion', r.torsion),
      axial: log.take('phiAxial', r.axial),
      tension: log.take('phiTension', r.tension),
      boltTension: log.take('phiBoltTension', r.boltTension),
      boltShear: log.take('phiBoltShear', r.boltShear),
    },
    anchorBolts: c.anchorBolts ? buildAnchorBolts(c.anchorBolts, input, log, problems) : null,
    basePlate: c.basePlate ? buildBasePlate(c.basePlate, log) : null,
    vortex: {
      speedThreshold_mps: log.take('vortexThreshold', v.speedThreshold),
      exemptTaper: log.take('vortexExemptTaper', v.exemptTaper),
      strouhalRound: log.take('strouhalRound', v.strouhalRound),
      strouhalMultisided: log.take('strouhalMultisided', v.strouhalMultisided),
    },
  };
}

function buildAnchorBolts(b: NonNullable<CriteriaInput['anchorBolts']>, input: DesignInput, log: AssumptionLog, problems: Problem[]): AnchorBolts {
  const path: InputPath = ['criteria', 'anchorBolts'];
  if (b.boltDiameter >= b.circleDiameter) {
    problems.push(error([...path, 'boltDiameter'], 'the bolt diameter is at or over the bolt circle diameter; expected a bolt much smaller than the circle'));
  }
  let Fu = b.tensileStrength ?? NaN;
  let Fy = b.yieldStrength ?? NaN;
  if (b.grade !== undefined) {
    if (b.tensileStrength !== undefined || b.yieldStrength !== undefined) {
      problems.push(error([...path, b.tensileStrength !== undefined ? 'tensileStrength' : 'yieldStrength'], 'give the grade or the strengths, not both: the grade sets them'));
    }
    const g = f1554Grade(b.grade);
    if (g) {
      Fu = g.Fu_Pa;
      Fy = g.Fy_Pa;
      log.note({ key: 'criteria.anchorBolts.grade', label: `Anchor bolt strengths of ASTM F1554 Grade ${b.grade}: tensile strength Fu`, value: Fu, dim: 'stress', source: F1554_SOURCE, defaulted: false });
      log.note({ key: 'criteria.anchorBolts.grade', label: `Anchor bolt strengths of ASTM F1554 Grade ${b.grade}: yield strength Fy`, value: Fy, dim: 'stress', source: F1554_SOURCE, defaulted: false });
    }
  } else {
    if (b.tensileStrength === undefined) problems.push(error([...path, 'tensileStrength'], 'required key is missing: give the bolt grade (ASTM F1554 36, 55 or 105), or tensileStrength and yieldStrength'));
    if (b.yieldStrength === undefined) problems.push(error([...path, 'yieldStrength'], 'required key is missing: give the bolt grade (ASTM F1554 36, 55 or 105), or yieldStrength with tensileStrength (the yield strength is needed for bolt bending)'));
    if (b.tensileStrength !== undefined && b.yieldStrength !== undefined && b.yieldStrength > b.tensileStrength) {
      problems.push(error([...path, 'yieldStrength'], 'the yield strength is above the tensile strength; expected Fy at most Fu'));
    }
  }
  if (b.pitch !== undefined && b.threadsPerInch !== undefined) problems.push(error([...path, 'pitch'], 'give threadsPerInch (an inch thread) or pitch (a metric thread), not both'));
  const thread: AnchorBolts['thread'] =
    b.threadsPerInch !== undefined ? { standard: 'UNC', pitch_m: 0.0254 / b.threadsPerInch } : b.pitch !== undefined ? { standard: 'ISO metric', pitch_m: b.pitch } : null;
  return {
    count: b.count,
    circleDiameter_m: b.circleDiameter,
    boltDiameter_m: b.boltDiameter,
    grade: b.grade ?? null,
    Fu_Pa: Fu,
    Fy_Pa: Fy,
    thread,
    standOff_m: log.take('boltStandOff', b.standOff),
  };
}

function buildBasePlate(p: NonNullable<CriteriaInput['basePlate']>, log: AssumptionLog): BasePlate {
  return { thickness_m: p.thickness, Fy_Pa: log.take('basePlateFy', p.yieldStrength) };
}
