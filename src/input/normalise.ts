// Validated input (schema output, already in SI) -> the normalised Design, with the
// checks that the geometry can be built and the assumptions recorded.
import { TUBE_STEEL_GRADE_SOURCE, tubeSteelYield } from '../design/tube-steel-grades.ts';
import type {
  AnalysisSettings, Arm, Attachment, BaseFixity, CombinationSpec, Design, FatigueInput, IceInput, Material,
  Offset, Pole, Project, StructureKind, WindInput,
} from '../design/design.ts';
import { DEG_RAD, formatQuantity, type UnitSystem } from '../units/units.ts';
import { AssumptionLog } from './assumptions.ts';
import { defaultCombinations, userCombinations, withDeadService } from './combinations.ts';
import { error, warning, type InputPath, type Problem } from './problem.ts';
import { packageDate } from './project-date.ts';
import type { DesignInput, OffsetInput } from './schema.ts';
import { buildSection } from './section.ts';
import { buildCriteria } from './criteria.ts';
import { buildFatigue } from './fatigue.ts';
import { closest } from './suggest.ts';
import { windDirections } from './wind-directions.ts';
import { MAX_ANALYSES, MAX_STATION_RESULTS } from './size-limits.ts';
import { ARM_RISE_MAX_RAD, ARM_RISE_MIN_RAD } from './plausibility.ts';

export const KIND_TITLES: Readonly<Record<StructureKind, string>> = {
  'cantilever-sign': 'Cantilevered sign support',
  'luminaire-pole': 'Luminaire pole',
  'signal-support': 'Traffic-signal support',
};

/** Small tolerance so that a panel flush with the tip is not "past the tip" by rounding. */
const FIT_TOL = 1e-9;

export interface NormaliseResult {
  readonly design: Design | undefined;
  readonly problems: readonly Problem[];
}

export function normalise(input: DesignInput, env: { readonly SOURCE_DATE_EPOCH?: string }): NormaliseResult {
  const problems: Problem[] = [];
  const log = new AssumptionLog(input.units);
  const system: UnitSystem = input.units;
  const len = (v: number) => formatQuantity(v, 'length', system);

  const project = buildProject(input, env, problems);
  const material = buildMaterial(input, log, problems);

  // Pole.
  const poleIn = input.structure.pole;
  const poleSection = buildSection(poleIn.section, poleIn.height, ['structure', 'pole', 'section'], system, problems);
  const base = buildBase(input, log, problems);
  const pole: Pole | undefined = poleSection ? { height_m: poleIn.height, section: poleSection, base, wind: { pressure_Pa: poleIn.windPressure ?? null, drag: poleIn.drag ?? null } } : undefined;

  // Arms.
  const arms: Arm[] = [];
  const armIds = new Set<string>();
  /** For each arm, how far its input lengths and positions are from the face (0 from the face). */
  const armShift = new Map<string, number>();
  (input.structure.arms ?? []).forEach((a, i) => {
    const path: InputPath = ['structure', 'arms', i];
    if (a.id === 'pole') problems.push(error([...path, 'id'], "'pole' is reserved for attachments on the pole; choose another arm id"));
    if (a.id === 'anchor-bolts' || a.id === 'base-plate') problems.push(error([...path, 'id'], `'${a.id}' is reserved: the checks report the ${a.id.replace('-', ' ')} under it; choose another arm id`));
    if (armIds.has(a.id)) problems.push(error([...path, 'id'], `duplicate arm id '${a.id}'; each arm needs its own id`));
    armIds.add(a.id);
    if (a.attachHeight > poleIn.height * (1 + FIT_TOL)) {
      problems.push(error([...path, 'attachHeight'], `arm ${a.id} is attached at ${len(a.attachHeight)}, above the pole top at ${len(poleIn.height)}; expected at most the pole height`));
    }
    const rise = log.take('armRise', a.rise, { key: `structure.arms[${i}].rise`, label: `Rise angle of arm ${a.id} above horizontal` });
    if (!(rise >= ARM_RISE_MIN_RAD && rise <= ARM_RISE_MAX_RAD)) {
      problems.push(error([...path, 'rise'], `a rise of ${formatQuantity(rise, 'angle', system)} is outside ${ARM_RISE_MIN_RAD / DEG_RAD} to ${ARM_RISE_MAX_RAD / DEG_RAD} deg, the arms polebook models (limits of ours): the rise is the arm's angle above horizontal, 0 to 15 deg for most mast arms; a member closer to vertical is a pole, not an arm`));
    }
    // Lengths from the pole axis are turned into lengths from the face: the radius of the pole
    // face at the attachment height (half the across-flats width of a multisided pole) comes off.
    const from = log.take('armLengthFrom', a.lengthFrom, { key: `structure.arms[${i}].lengthFrom`, label: `Arm ${a.id}: length and positions measured from the pole` });
    const shift = from === 'axis' && poleSection ? poleFaceRadiusAt(poleSection, poleIn.height, a.attachHeight) : 0;
    armShift.set(a.id, shift);
    if (a.length <= shift * (1 + FIT_TOL)) {
      problems.push(error([...path, 'length'], `arm ${a.id} is ${len(a.length)} from the pole axis, not more than the pole face radius ${len(shift)} there: the arm has no length outside the pole`));
      return;
    }
    const section = buildSection(a.section, a.length - shift, [...path, 'section'], system, problems);
    if (section) arms.push({ id: a.id, attachHeight_m: a.attachHeight, direction_rad: a.direction, length_m: a.length - shift, lengthFrom: from, rise_rad: rise, section, wind: { pressure_Pa: a.windPressure ?? null, drag: a.drag ?? null } });
  });

  const attachments = buildAttachments(input, arms, armShift, system, problems, log);
  const wind = buildWind(input, arms, attachments, log, problems);
  const ice = buildIce(input, log);
  const fatigueIn = buildFatigue(input, log, problems);
  // Lanes on an arm measured from the pole axis are taken to the face, like its positions.
  const fatigue = fatigueIn?.truckGust
    ? { ...fatigueIn, truckGust: { ...fatigueIn.truckGust, lanes: fatigueIn.truckGust.lanes.map((l) => {
        const shift = armShift.get(l.arm) ?? 0;
        const L = arms.find((a) => a.id === l.arm)?.length_m ?? Infinity;
        return { ...l, from_m: Math.min(L, Math.max(0, l.from_m - shift)), to_m: Math.min(L, Math.max(0, l.to_m - shift)) };
      }) } }
    : fatigueIn;
  const criteria = buildCriteria(input, log, problems);
  const useDefaultSet = input.combinations === undefined || input.combinations === 'default';
  if (!useDefaultSet && input.criteria?.serviceWindFactor !== undefined) {
    problems.push(warning(['criteria', 'serviceWindFactor'], 'serviceWindFactor applies only to the default combinations; your list of combinations sets its own factors, so it is not used'));
  }
  const combinations: CombinationSpec[] =
    input.combinations === undefined || input.combinations === 'default'
      ? defaultCombinations(ice !== null, log.take('serviceWindFactor', input.criteria?.serviceWindFactor))
      : withDeadService(userCombinations(input.combinations, ice !== null, problems));
  const analysis = buildAnalysis(input, log, problems);
  problems.push(...resultSizeProblems(input, wind.directions.length, combinations, fatigue, analysis));

  if (problems.some((p) => p.severity === 'error') || !pole) return { design: undefined, problems };
  const design: Design = {
    formatVersion: 1,
    units: system,
    project,
    kind: input.structure.kind,
    description: input.structure.description ?? KIND_TITLES[input.structure.kind],
    material,
    pole,
    arms,
    attachments,
    wind,
    ice,
    fatigue,
    combinations,
    criteria,
    analysis,
    assumptions: log.list,
  };
  return { design, problems };
}

function buildProject(input: DesignInput, env: { readonly SOURCE_DATE_EPOCH?: string }, problems: Problem[]): Project {
  const p = input.project;
  const revisions = (p.revisions ?? []).map((r) => ({
    id: r.id,
    date: r.date,
    description: r.description,
    by: r.by ?? '',
    issued: r.issued ? { engineer: r.issued.engineer, licence: r.issued.licence, jurisdiction: r.issued.jurisdiction ?? '' } : null,
  }));
  const seen = new Set<string>();
  revisions.forEach((r, i) => {
    if (seen.has(r.id)) problems.push(error(['project', 'revisions', i, 'id'], `duplicate revision id '${r.id}'`));
    seen.add(r.id);
  });
  return {
    name: p.name,
    structureId: p.structureId,
    location: p.location ?? '',
    owner: p.owner ?? '',
    revisions,
    preparedBy: p.preparedBy ?? '',
    checkedBy: p.checkedBy ?? '',
    engineerOfRecord: p.engineerOfRecord ?? '',
    date: packageDate(p.date, revisions, env, problems),
  };
}

function buildMaterial(input: DesignInput, log: AssumptionLog, problems: Problem[]): Material {
  const m = input.structure.material ?? {};
  const E = log.take('materialE', m.E);
  let G: number;
  if (m.poissonRatio !== undefined) {
    if (m.G !== undefined) problems.push(error(['structure', 'material', 'poissonRatio'], 'give G or poissonRatio, not both'));
    G = E / (2 * (1 + m.poissonRatio));
    log.note({
      key: 'structure.material.G',
      label: 'Shear modulus of steel, G = E / (2 (1 + poissonRatio))',
      value: G,
      dim: 'stress',
      source: `computed from E and the Poisson ratio ${m.poissonRatio} given in the input`,
      defaulted: false,
    });
  } else G = log.take('materialG', m.G);
  let Fy: number;
  const gradeFy = m.grade === undefined ? undefined : tubeSteelYield(m.grade);
  if (gradeFy !== undefined) {
    if (m.yieldStrength !== undefined) problems.push(error(['structure', 'material', 'yieldStrength'], 'give the steel grade or the yield strength, not both: the grade sets it'));
    Fy = gradeFy;
    log.note({ key: 'structure.material.grade', label: `Minimum yield strength of the tube steel, grade ${m.grade}, Fy`, value: Fy, dim: 'stress', source: TUBE_STEEL_GRADE_SOURCE, defaulted: false });
  } else Fy = log.take('materialFy', m.yieldStrength);
  return { E_Pa: E, G_Pa: G, Fy_Pa: Fy, density_kgm3: log.take('materialDensity', m.density) };
}

function buildBase(input: DesignInput, log: AssumptionLog, problems: Problem[]): BaseFixity {
  const b = input.structure.pole.base;
  const fixity = log.take('baseFixity', b?.fixity);
  const path: InputPath = ['structure', 'pole', 'base'];
  if (fixity === 'rotational-spring') {
    const both = b?.rotationalStiffness;
    if (both !== undefined && (b?.rotationalStiffnessX !== undefined || b?.rotationalStiffnessY !== undefined)) {
      problems.push(error([...path, b?.rotationalStiffnessX !== undefined ? 'rotationalStiffnessX' : 'rotationalStiffnessY'], 'give rotationalStiffness (both horizontal axes) or rotationalStiffnessX and rotationalStiffnessY, not both'));
    }
    const kx = b?.rotationalStiffnessX ?? both;
    const ky = b?.rotationalStiffnessY ?? both;
    if (kx === undefined || ky === undefined) {
      const key = both === undefined && b?.rotationalStiffnessX === undefined && b?.rotationalStiffnessY === undefined ? 'rotationalStiffness' : kx === undefined ? 'rotationalStiffnessX' : 'rotationalStiffnessY';
      problems.push(error([...path, key], 'required key is missing: a rotational-spring base needs its rotationalStiffness (or rotationalStiffnessX and rotationalStiffnessY)'));
      return { kind: 'fixed' };
    }
    return { kind: 'spring', stiffness_Nm_per_rad: kx, ...(ky !== kx ? { stiffnessY_Nm_per_rad: ky } : {}), ...(b?.torsionalStiffness !== undefined ? { torsion_Nm_per_rad: b.torsionalStiffness } : {}) };
  }
  for (const key of ['rotationalStiffness', 'rotationalStiffnessX', 'rotationalStiffnessY', 'torsionalStiffness'] as const) {
    if (b?.[key] !== undefined) problems.push(error([...path, key], `${key} applies only with fixity: rotational-spring`));
  }
  return { kind: 'fixed' };
}

interface MemberInfo {
  readonly kind: 'pole' | 'arm';
  /** Length in the input's own convention (an arm measured from the pole axis includes the shift). */
  readonly length_m: number;
  readonly direction_rad: number;
  /** Input positions minus this are positions from the pole face (the pole face radius for an
   * arm measured from the pole axis, else 0). */
  readonly shift_m: number;
}

/** Radius of the pole face at height z: half the outside diameter, or the across-flats width. */
function poleFaceRadiusAt(section: { readonly rootDiameter_m: number; readonly tipDiameter_m: number }, height_m: number, z_m: number): number {
  return (section.rootDiameter_m + ((section.tipDiameter_m - section.rootDiameter_m) * z_m) / height_m) / 2;
}

function findMember(on: string, arms: readonly Arm[], armShift: ReadonlyMap<string, number>, input: DesignInput, path: InputPath, problems: Problem[]): MemberInfo | undefined {
  if (on === 'pole') return { kind: 'pole', length_m: input.structure.pole.height, direction_rad: 0, shift_m: 0 };
  const arm = arms.find((a) => a.id === on);
  const shift = armShift.get(on) ?? 0;
  if (arm) return { kind: 'arm', length_m: arm.length_m + shift, direction_rad: arm.direction_rad, shift_m: shift };
  const declared = (input.structure.arms ?? []).map((a) => a.id);
  if (declared.includes(on)) return undefined; // the arm itself has an error, reported there
  const guess = closest(on, declared);
  const list = declared.length === 0 ? 'there are no arms' : `arms: ${declared.join(', ')}`;
  problems.push(error([...path, 'on'], `no arm with id '${on}'; ${guess ? `did you mean '${guess}'? ` : ''}expected an arm id or "pole" (${list})`));
  return undefined;
}

function buildOffset(offset: OffsetInput, member: MemberInfo, path: InputPath, problems: Problem[]): { offset: Offset; defaulted: boolean } {
  const o = offset ?? {};
  const vertical = o.vertical ?? 0;
  const lateral = o.lateral ?? 0;
  if (member.kind === 'arm') {
    if (o.direction !== undefined) problems.push(error([...path, 'offset', 'direction'], 'offset.direction applies only on the pole; on an arm, lateral is measured square to the arm'));
    return { offset: { vertical_m: vertical, lateral_m: lateral, direction_rad: member.direction_rad + Math.PI / 2 }, defaulted: offset === undefined };
  }
  if (lateral !== 0 && o.direction === undefined) problems.push(error([...path, 'offset', 'direction'], 'required key is missing: a lateral offset on the pole needs its plan direction'));
  return { offset: { vertical_m: vertical, lateral_m: lateral, direction_rad: o.direction ?? 0 }, defaulted: offset === undefined };
}

function buildAttachments(input: DesignInput, arms: readonly Arm[], armShift: ReadonlyMap<string, number>, system: UnitSystem, problems: Problem[], log: AssumptionLog): Attachment[] {
  const out: Attachment[] = [];
  const ids = new Set<string>();
  const onAxis: string[] = [];
  const sameEveryWay: string[] = [];
  const len = (v: number) => formatQuantity(v, 'length', system);
  const claim = (id: string, path: InputPath) => {
    if (ids.has(id)) problems.push(error([...path, 'id'], `duplicate attachment id '${id}'; panels and point attachments each need their own id`));
    ids.add(id);
  };
  const where = (m: MemberInfo, on: string) => (m.kind === 'pole' ? 'the pole' : `arm ${on}`);

  (input.attachments?.panels ?? []).forEach((p, i) => {
    const path: InputPath = ['attachments', 'panels', i];
    claim(p.id, path);
    const m = findMember(p.on, arms, armShift, input, path, problems);
    if (!m) return;
    const along = m.kind === 'arm' ? p.width : p.height;
    const end = m.kind === 'arm' ? 'tip' : 'top';
    if (p.position > m.length_m * (1 + FIT_TOL)) {
      problems.push(error([...path, 'position'], `position ${len(p.position)} is beyond the ${end} of ${where(m, p.on)} (${len(m.length_m)})`));
    } else if (p.position + along / 2 > m.length_m * (1 + FIT_TOL)) {
      problems.push(error([...path, 'position'], `the panel (centre at ${len(p.position)}, ${m.kind === 'arm' ? 'width' : 'height'} ${len(along)}) reaches past the ${end} of ${where(m, p.on)} at ${len(m.length_m)}`));
    } else if (p.position - along / 2 < m.shift_m - FIT_TOL * m.length_m) {
      problems.push(error([...path, 'position'], `the panel (centre at ${len(p.position)}, ${m.kind === 'arm' ? 'width' : 'height'} ${len(along)}) reaches past the ${m.kind === 'arm' ? 'pole face at the arm root' : 'pole base'}`));
    }
    let faceNormal = m.direction_rad + Math.PI / 2;
    if (m.kind === 'arm' && p.faceDirection !== undefined) {
      problems.push(error([...path, 'faceDirection'], 'faceDirection applies only to panels on the pole; a panel on an arm faces square to the arm'));
    }
    if (m.kind === 'pole') {
      if (p.faceDirection === undefined) problems.push(error([...path, 'faceDirection'], 'required key is missing: a panel on the pole needs the plan direction of its face'));
      else faceNormal = p.faceDirection;
    }
    const { offset, defaulted } = buildOffset(p.offset, m, path, problems);
    if (defaulted) onAxis.push(p.id);
    out.push({
      kind: 'panel', id: p.id, description: p.description ?? `Panel ${p.id}`, member: p.on, position_m: p.position - m.shift_m,
      width_m: p.width, height_m: p.height, weightPerArea_Pa: p.weightPerArea, offset, faceNormal_rad: faceNormal,
    });
  });

  (input.attachments?.points ?? []).forEach((p, i) => {
    const path: InputPath = ['attachments', 'points', i];
    claim(p.id, path);
    const m = findMember(p.on, arms, armShift, input, path, problems);
    if (p.windArea !== undefined && p.epa !== undefined) problems.push(error([...path, 'epa'], 'give windArea or epa, not both'));
    if (p.windArea === undefined && p.epa === undefined) problems.push(error([...path, 'windArea'], 'required key is missing: give windArea (projected area) or epa (effective projected area)'));
    if (!m) return;
    if (p.position > m.length_m * (1 + FIT_TOL)) {
      problems.push(error([...path, 'position'], `position ${len(p.position)} is beyond the ${m.kind === 'arm' ? 'tip' : 'top'} of ${where(m, p.on)} (${len(m.length_m)})`));
    } else if (p.position < m.shift_m * (1 - FIT_TOL)) {
      problems.push(error([...path, 'position'], `position ${len(p.position)} from the pole axis is inside the pole (its face is ${len(m.shift_m)} from the axis there); expected a position on the arm`));
    }
    const { offset, defaulted } = buildOffset(p.offset, m, path, problems);
    if (defaulted) onAxis.push(p.id);
    const typeName = p.type === 'signal-head' ? 'Signal head' : p.type === 'luminaire' ? 'Luminaire' : 'Attachment';
    if (m.kind === 'arm' && p.faceDirection !== undefined) problems.push(error([...path, 'faceDirection'], 'faceDirection applies only on the pole; on an arm the face is square to the arm'));
    if (m.kind === 'pole' && p.sideArea !== undefined && p.faceDirection === undefined) problems.push(error([...path, 'faceDirection'], 'required key is missing: a side area on the pole needs the plan direction of the face'));
    if (p.sideArea === undefined) sameEveryWay.push(p.id);
    out.push({
      kind: p.type, id: p.id, description: p.description ?? `${typeName} ${p.id}`, member: p.on, position_m: Math.max(0, p.position - m.shift_m),
      weight_N: p.weight, windArea_m2: p.windArea ?? p.epa ?? 0, sideArea_m2: p.sideArea ?? null,
      faceNormal_rad: m.kind === 'arm' ? m.direction_rad + Math.PI / 2 : (p.faceDirection ?? 0), offset,
    });
  });

  if (sameEveryWay.length > 0) {
    log.note({
      key: 'attachments.points[].sideArea',
      label: 'Point attachments without a side area take their face area from every wind direction',
      value: sameEveryWay.join(', '),
      source: 'polebook default: no sideArea given; give sideArea for an attachment whose area seen from the side differs (signal heads, luminaires), verify',
      defaulted: true,
    });
  }
  if (onAxis.length > 0) {
    log.note({
      key: 'attachments.*.offset',
      label: 'Attachments without an offset are taken with their centroid on the member axis',
      value: onAxis.join(', '),
      source: 'polebook default: no offset given in the input',
      defaulted: true,
    });
  }
  return out;
}

function buildWind(input: DesignInput, arms: readonly Arm[], attachments: readonly Attachment[], log: AssumptionLog, problems: Problem[]): WindInput {
  const w = input.loads.wind;
  const path: InputPath = ['loads', 'wind'];
  const speed = w.speed
    ? { V_mps: w.speed.V, basis: w.speed.basis, exposure: w.speed.exposure, Kd: log.take('windKd', w.speed.Kd), G: log.take('windG', w.speed.G), Cv: log.take('windCv', w.speed.Cv) }
    : null;
  // A typed pressure wins; without one the class takes its pressure from the wind speed (null).
  const need = (key: 'panels' | 'members' | 'points', needed: boolean): number | null => {
    const v = w[key] ?? w.pressure;
    if (v !== undefined) return v;
    if (speed) return null;
    if (needed) problems.push(error([...path, key], `required key is missing: no design pressure for ${key}; give loads.wind.${key} or loads.wind.pressure, or a wind speed (loads.wind.speed)`));
    return 0;
  };
  const auto = log.take('windAuto', w.directions?.auto);
  const directions = windDirections(arms, attachments, auto, w.directions?.add ?? []);
  if (directions.length === 0) problems.push(error([...path, 'directions'], 'no wind direction to analyse: set auto: true or add angles'));
  return {
    // Members that carry their own pressure need no class pressure.
    membersPressure_Pa: need('members', input.structure.pole.windPressure === undefined || (input.structure.arms ?? []).some((a) => a.windPressure === undefined)),
    panelsPressure_Pa: need('panels', attachments.some((a) => a.kind === 'panel')),
    pointsPressure_Pa: need('points', attachments.some((a) => a.kind !== 'panel')),
    speed,
    directions,
    memberRule: log.take('memberWindRule', w.memberRule),
  };
}

function buildIce(input: DesignInput, log: AssumptionLog): IceInput | null {
  const ice = input.loads.ice;
  if (!ice) return null;
  return { weightPerArea_Pa: log.take('iceWeight', ice.weightPerArea), windFactor: ice.windFactor };
}

/** Result stations per member at the regular spacing, at most: a spacing of a hair on a pole
 * asked for billions of stations (found by tests/fuzz). 10 000 stations give a point every
 * 0.1 m even on a 1000 m member, far finer than any package needs. A polebook limit. */
export const MAX_STATIONS_PER_MEMBER = 10_000;

function buildAnalysis(input: DesignInput, log: AssumptionLog, problems: Problem[]): AnalysisSettings {
  const a = input.analysis ?? {};
  const longest = Math.max(input.structure.pole.height, ...(input.structure.arms ?? []).map((arm) => arm.length));
  if (a.stationSpacing !== undefined && longest / a.stationSpacing > MAX_STATIONS_PER_MEMBER * (1 + 1e-9)) {
    const system = input.units;
    problems.push(
      error(['analysis', 'stationSpacing'], `a spacing of ${formatQuantity(a.stationSpacing, 'length', system)} gives more than ${MAX_STATIONS_PER_MEMBER} result stations on a member of ${formatQuantity(longest, 'length', system)}; expected at least ${formatQuantity(longest / MAX_STATIONS_PER_MEMBER, 'length', system)}`),
    );
  }
  return {
    segmentsPerMember: log.take('segments', a.segmentsPerMember),
    secondOrder: log.take('secondOrder', a.secondOrder),
    pDeltaTolerance: log.take('pDeltaTolerance', a.pDeltaTolerance),
    pDeltaMaxIterations: log.take('pDeltaMaxIterations', a.pDeltaMaxIterations),
    stationSpacing_m: log.take('stationSpacing', a.stationSpacing),
  };
}

/** The analyses a build would run and the station results it would hold, against the limits
 * (size-limits.ts), before any work: a few lines of YAML can otherwise ask for hours. */
function resultSizeProblems(input: DesignInput, directions: number, combinations: readonly CombinationSpec[], fatigue: FatigueInput | null, analysis: AnalysisSettings): Problem[] {
  const withWind = (c: CombinationSpec) => (c.factors.wind ?? 0) !== 0 || (c.factors['ice-wind'] ?? 0) !== 0;
  const fatigueCases = fatigue ? [fatigue.galloping, fatigue.naturalGust, fatigue.truckGust].filter((x) => x !== null).length : 0;
  const analyses = combinations.reduce((n, c) => n + (withWind(c) ? Math.max(directions, 1) : 1), 0) + fatigueCases;
  const where: InputPath = input.combinations === undefined || input.combinations === 'default' ? ['loads', 'wind'] : ['combinations'];
  if (analyses > MAX_ANALYSES) {
    return [error(where, `${combinations.length} combinations with ${directions} wind directions make ${analyses} analyses, more than the ${MAX_ANALYSES} polebook runs in one build (a limit of ours; a design needs a few dozen): use fewer wind directions or combinations`)];
  }
  const members = [input.structure.pole.height, ...(input.structure.arms ?? []).map((a) => a.length)];
  // A spacing past the per-member limit is reported by buildAnalysis already.
  if (members.some((L) => L / analysis.stationSpacing_m > MAX_STATIONS_PER_MEMBER * (1 + 1e-9))) return [];
  const stations = members.reduce((n, L) => n + Math.ceil(L / analysis.stationSpacing_m) + 1, 0);
  if (stations * analyses > MAX_STATION_RESULTS) {
    return [error(['analysis', 'stationSpacing'], `${stations} result stations on ${members.length} members in ${analyses} analyses are ${stations * analyses} station results, more than the ${MAX_STATION_RESULTS} polebook holds (a limit of ours): give a larger stationSpacing (about ${formatQuantity((analysis.stationSpacing_m * stations * analyses) / MAX_STATION_RESULTS, 'length', input.units)} or more) or fewer analyses`)];
  }
  return [];
}
