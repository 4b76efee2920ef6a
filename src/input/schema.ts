// The input file format, as a zod schema: the single source of truth for the keys, their
// types, the defaults (noted in descriptions, taken from defaults.ts) and the JSON Schema
// that `polebook schema` prints. Quantities are read in the file's unit system, so the
// schema is built per system; both give the same JSON Schema.
import { TUBE_STEEL_GRADES } from '../design/tube-steel-grades.ts';
import { MAX_ADDED_WIND_DIRECTIONS, MAX_ARMS, MAX_COMBINATIONS, MAX_PANELS, MAX_POINTS, MAX_REVISIONS, listLimit } from './size-limits.ts';
import { z } from 'zod';
import type { UnitSystem } from '../units/units.ts';
import { defaultNote } from './defaults.ts';
import { factor, quantity } from './quantity.ts';
import { criteriaSchema, fatigueSchema } from './schema-checks.ts';

export const INPUT_FORMAT_VERSION = 1;
export const STRUCTURE_KIND_VALUES = ['cantilever-sign', 'luminaire-pole', 'signal-support'] as const;

const text = (description: string) =>
  z
    .union([z.string(), z.number()])
    .transform((v) => String(v))
    .meta({ description });

const id = (description: string) =>
  z
    .union([z.string().min(1, { error: 'must not be empty' }), z.number()])
    .transform((v) => String(v))
    .meta({ description });

const isoDate = (description: string) =>
  z
    .string({ error: (iss) => (iss.input === undefined ? undefined : 'expected a date as yyyy-mm-dd, e.g. 2026-03-15 (quote it if your editor changes it)') })
    .regex(/^\d{4}-\d{2}-\d{2}$/, { error: 'expected a date as yyyy-mm-dd, e.g. 2026-03-15' })
    .refine((s) => {
      const d = new Date(`${s}T00:00:00Z`);
      return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
    }, { error: 'not a calendar date; expected yyyy-mm-dd' })
    .meta({ description });

function sectionSchema(system: UnitSystem) {
  const common = {
    taper: quantity('taper', system, 'any', 'Taper rate: decrease of the diameter per length from root to tip (give it with one end diameter)').optional(),
    wall: quantity('section', system, 'positive', 'Wall thickness'),
  };
  const round = z.strictObject({
    shape: z.literal('round'),
    rootDiameter: quantity('section', system, 'positive', 'Outside diameter at the root end (pole base, or the arm end at the pole)').optional(),
    tipDiameter: quantity('section', system, 'positive', 'Outside diameter at the tip end (pole top, arm tip)').optional(),
    ...common,
  });
  const multisided = z.strictObject({
    shape: z.literal('multisided'),
    sides: z.literal([8, 12, 16], { error: (iss) => `expected 8, 12 or 16 sides, got ${JSON.stringify(iss.input)}` }).meta({ description: 'Number of flat sides' }),
    rootAcrossFlats: quantity('section', system, 'positive', 'Outside diameter across the flats at the root end').optional(),
    tipAcrossFlats: quantity('section', system, 'positive', 'Outside diameter across the flats at the tip end').optional(),
    ...common,
  });
  return z
    .discriminatedUnion('shape', [round, multisided])
    .meta({ description: 'Tapered steel tube: give two of (root size, tip size, taper) and the wall. A multisided tube is dimensioned across the flats.' });
}

function offsetSchema(system: UnitSystem) {
  return z
    .strictObject({
      vertical: quantity('length', system, 'any', 'Offset of the centroid above (+) or below (-) the arm axis, or on the pole above or below the position (a bracket)').optional(),
      lateral: quantity('length', system, 'any', 'On an arm: horizontal offset perpendicular to the arm, + to the left looking from root to tip. On the pole: distance from the pole axis').optional(),
      direction: quantity('angle', system, 'planAngle', 'On the pole only: plan direction of the lateral offset (deg from +X toward +Y)').optional(),
    })
    .meta({ description: 'Offset of the centroid from the member axis. Default: on the axis' });
}

function armSchema(system: UnitSystem) {
  return z.strictObject({
    id: id('Arm id, referred to by attachments (e.g. A1)'),
    attachHeight: quantity('length', system, 'positive', 'Height of the arm axis where it meets the pole, above the pole base'),
    direction: quantity('angle', system, 'planAngle', 'Plan direction of the arm from the pole (deg from +X toward +Y)'),
    length: quantity('length', system, 'positive', 'Length along the arm axis to the tip, from the pole face or the pole axis (lengthFrom)'),
    lengthFrom: z
      .enum(['face', 'axis'], { error: () => 'expected face or axis' })
      .optional()
      .meta({ description: `Where the arm length and the positions of the attachments on this arm are measured from: face (the pole face, where the arm meets the pole) or axis (the pole centreline, as signal mast arms are often dimensioned). ${defaultNote('armLengthFrom')}` }),
    rise: quantity('angle', system, 'any', `Rise angle of the arm above horizontal. ${defaultNote('armRise')}`).optional(),
    section: sectionSchema(system),
    ...memberWindKeys(system),
  });
}

/** A member's own wind pressure, or its drag coefficient for the wind-speed path. */
function memberWindKeys(system: UnitSystem) {
  return {
    windPressure: quantity('pressure', system, 'nonNegative', 'Design wind pressure on this member, on its projected tube area (overrides loads.wind.members and the wind speed for this member)').optional(),
    drag: factor('Drag coefficient of this member for the wind-speed path (overrides the table of its shape)', 0.1, 3, 'a drag coefficient is between 0.1 and 3 (about 0.45 to 1.2 for tubes)').optional(),
  };
}

function panelSchema(system: UnitSystem) {
  return z.strictObject({
    id: id('Panel id (e.g. S1)'),
    description: text('What the panel is, for the package').optional(),
    on: id('Member carrying the panel: an arm id, or "pole"'),
    position: quantity('length', system, 'nonNegative', 'Centre of the panel: on an arm, distance along the arm from the pole face; on the pole, height above the base'),
    width: quantity('length', system, 'positive', 'Panel width (horizontal, along an arm)'),
    height: quantity('length', system, 'positive', 'Panel height'),
    weightPerArea: quantity('pressure', system, 'nonNegative', 'Weight of the panel and its bracing per panel area (psf | kPa)'),
    offset: offsetSchema(system).optional(),
    faceDirection: quantity('angle', system, 'planAngle', 'On the pole only: plan direction of the panel face normal (a panel on an arm faces perpendicular to the arm)').optional(),
  });
}

function pointSchema(system: UnitSystem) {
  return z.strictObject({
    id: id('Attachment id (e.g. L1, H1)'),
    type: z.enum(['luminaire', 'signal-head', 'other']).meta({ description: 'luminaire | signal-head | other' }),
    description: text('What it is, for the package').optional(),
    on: id('Member carrying it: an arm id, or "pole"'),
    position: quantity('length', system, 'nonNegative', 'On an arm: distance along the arm from the pole face; on the pole: height above the base'),
    weight: quantity('weight', system, 'nonNegative', 'Weight (lb | N)'),
    windArea: quantity('area', system, 'nonNegative', 'Projected wind area (give this or epa)').optional(),
    epa: quantity('area', system, 'nonNegative', "Effective projected area from the maker's data (give this or windArea)").optional(),
    sideArea: quantity('area', system, 'nonNegative', 'Projected (or effective projected) area seen from the side, at 90 deg to the face: the wind then acts on A_face |cos α| + A_side |sin α| (α between the wind and the face normal). Without it the face area is taken from every direction').optional(),
    faceDirection: quantity('angle', system, 'planAngle', 'On the pole only, with sideArea: plan direction of the face normal (on an arm the face is square to the arm)').optional(),
    offset: offsetSchema(system).optional(),
  });
}

function windSchema(system: UnitSystem) {
  const p = (what: string) => quantity('pressure', system, 'nonNegative', `Design wind pressure on ${what} (the coefficients you chose already applied)`).optional();
  return z.strictObject({
    pressure: p('every class not given separately'),
    panels: p('sign panels'),
    members: p('the pole and arms (on the projected tube diameter)'),
    points: p('point attachments (on their wind area or EPA)'),
    speed: z
      .strictObject({
        V: quantity('speed', system, 'positive', 'Basic wind speed of the site'),
        basis: text('What V is: the map, and the return period or risk category it was taken for (printed with V)'),
        exposure: z.enum(['B', 'C', 'D'], { error: () => 'expected exposure category B, C or D' }).meta({ description: 'Exposure category of the site: B, C or D' }),
        Kd: factor(`Directionality factor. ${defaultNote('windKd')}`, 0.5, 1, 'the directionality factor Kd is between 0.5 and 1 (0.85 to 0.95 for poles and signs)').optional(),
        G: factor(`Gust effect factor. ${defaultNote('windG')}`, 0.5, 2, 'the gust effect factor G is between 0.5 and 2 (about 0.85 to 1.14 for poles)').optional(),
        Cv: factor(`Factor on V d in the Reynolds-dependent drag of round tubes. ${defaultNote('windCv')}`, 0.1, 2, 'the factor Cv on V d is between 0.1 and 2 (about 0.8)').optional(),
      })
      .optional()
      .meta({ description: 'Design pressures from a basic wind speed, P = 0.00256 Kz Kd G V² Cd at each height (from memory of the AASHTO support specification; verify). A pressure typed for a class (panels, members, points, or pressure for all) overrides it for that class' }),
    memberRule: z
      .enum(['projected-area', 'cross-flow'], { error: () => 'expected projected-area or cross-flow' })
      .optional()
      .meta({ description: `How the wind loads a member inclined to it: projected-area (the pressure on the member's area projected onto a plane normal to the wind, acting in the wind direction) or cross-flow (only the wind component normal to the axis, p D sin²θ, acting normal to the axis). ${defaultNote('memberWindRule')}` }),
    directions: z
      .strictObject({
        auto: z.boolean().optional().meta({ description: `Find directions from the geometry. ${defaultNote('windAuto')}` }),
        add: z.array(quantity('angle', system, 'planAngle', 'Plan direction the wind blows toward (deg from +X toward +Y)')).max(MAX_ADDED_WIND_DIRECTIONS, listLimit(MAX_ADDED_WIND_DIRECTIONS, 'added wind directions', 'one every 10 deg')).optional(),
      })
      .optional(),
  });
}

function iceSchema(system: UnitSystem) {
  return z.strictObject({
    weightPerArea: quantity('pressure', system, 'positive', `Ice weight per surface area. ${defaultNote('iceWeight')}`).optional(),
    windFactor: factor('Factor on the design wind pressures acting together with ice (no default: it depends on the governing code)', 0, 1, 'the wind acting with ice is a fraction of the design wind: between 0 and 1 (often about 0.25 to 0.5)'),
  });
}

function combinationSchema() {
  const f = (kind: string) => factor(`Load factor on ${kind}`, 0, 5, 'a load factor is at least 0 (a load that helps, such as dead load against uplift, takes a smaller factor like 0.9, never a negative one) and at most 5 (code factors are at most about 1.75)').optional();
  return z.strictObject({
    id: id('Combination id'),
    category: z
      .enum(['strength', 'extreme-wind', 'extreme-ice', 'service'], {
        error: (iss) =>
          iss.input === 'fatigue'
            ? 'fatigue is not a combination category here: the fatigue load cases are made from loads.fatigue and each is analysed alone'
            : 'expected strength, extreme-wind, extreme-ice or service',
      })
      .meta({ description: 'strength | extreme-wind | extreme-ice | service (the category decides which checks use it; fatigue cases come from loads.fatigue)' }),
    description: text('What the combination is').optional(),
    factors: z.strictObject({ dead: f('dead load'), wind: f('wind'), ice: f('ice weight'), iceWind: f('wind with ice') }),
  });
}

function analysisSchema(system: UnitSystem) {
  return z.strictObject({
    segmentsPerMember: z.int({ error: 'expected a whole number' }).min(1, { error: 'at least 1 segment per member' }).max(200, { error: 'at most 200 segments per member: the taper is represented closely with 10 to 40, and more only slows the analysis (a limit of ours)' }).optional().meta({ description: defaultNote('segments') }),
    secondOrder: z.boolean().optional().meta({ description: `true: P-delta analysis. ${defaultNote('secondOrder')}` }),
    pDeltaTolerance: factor(`Relative change of displacements that ends the P-delta iteration. ${defaultNote('pDeltaTolerance')}`, 0, 0.01, 'the P-delta tolerance is the relative change of the displacements that ends the iteration: above 0 and at most 0.01 (1e-6 is typical)', false).optional(),
    pDeltaMaxIterations: z.int({ error: 'expected a whole number' }).min(2, { error: 'at least 2: the iteration compares each solution with the one before, starting from the first-order one' }).max(1000, { error: 'at most 1000 iterations: the P-delta iteration of a stable pole converges in under 20, so more would only hide a structure that is not converging' }).optional().meta({ description: defaultNote('pDeltaMaxIterations') }),
    stationSpacing: quantity('length', system, 'positive', `Regular spacing of result stations. ${defaultNote('stationSpacing')}`).optional(),
  });
}

/** Alternatives for `polebook compare` (read and checked by src/compare/; `build` ignores the block). */
function compareSchema() {
  const vary = z.strictObject({
    path: z.string().min(1, { error: 'must not be empty' }).meta({ description: 'What to vary, addressed by ids: e.g. A1.length (the length of arm A1), S1.position (panel S1), pole.section.wall, structure.arms[0].section.wall' }),
    values: z
      .union([z.string(), z.number(), z.array(z.union([z.string(), z.number()])).min(1)])
      .meta({ description: 'A list ("28, 32, 36 ft" or [28, 32, 36]) or a range ("20 ft..45 ft:5 ft", end included); numbers without a unit take the unit of the key' }),
  });
  return z
    .strictObject({ vary: z.array(vary).min(1, { error: 'give at least one key to vary' }) })
    .meta({ description: 'Alternatives compared by `polebook compare` (several vary entries make a grid); `polebook build` ignores this block' });
}

export function buildInputSchema(system: UnitSystem) {
  return z
    .strictObject({
      formatVersion: z.literal(INPUT_FORMAT_VERSION, { error: `expected formatVersion: ${INPUT_FORMAT_VERSION} (the only input format so far)` }),
      units: z.enum(['us', 'si'], { error: "expected 'us' (ft, in, kip, lb, psf, ksi, pcf) or 'si' (m, mm, kN, N, kPa, MPa, kg/m3)" }),
      project: z.strictObject({
        name: text('Project name'),
        structureId: id('Structure id, printed on every page'),
        location: text('Location (road, crossing, station)').optional(),
        owner: text('Owner or client').optional(),
        revisions: z.array(z.strictObject({
          id: id('Revision id, e.g. A or 0'),
          date: isoDate('Revision date, yyyy-mm-dd'),
          description: text('What changed'),
          by: text('Who made the revision (initials or name), printed in the revision history').optional(),
          issued: z.strictObject({
            engineer: text('Engineer of record who issues this revision, as on the seal'),
            licence: text('Licence or registration number of the engineer of record'),
            jurisdiction: text('Where the licence is held (state, province or country)').optional(),
          }).meta({ description: 'Marks the revision issued for submittal. When the newest revision (the last listed) is issued, the package drops its DRAFT marks, fills the sign-off block and records the input hash of this revision beside the input file (<input name>.issued.json); building the same issued revision again from a changed input is refused. Earlier revisions keep their mark as history' }).optional(),
        })).max(MAX_REVISIONS, listLimit(MAX_REVISIONS, 'revisions', 'a package is issued a few times')).optional(),
        preparedBy: text('Prepared by').optional(),
        checkedBy: text('Checked by').optional(),
        engineerOfRecord: text('Engineer of record').optional(),
        date: isoDate('Date of the package, yyyy-mm-dd. Default: SOURCE_DATE_EPOCH, else the newest revision date').optional(),
      }),
      structure: z.strictObject({
        kind: z.enum(STRUCTURE_KIND_VALUES).meta({ description: 'cantilever-sign | luminaire-pole | signal-support. Sets the defaults of the pole-top deflection limit, of which fatigue loads apply (galloping and truck gust for signs and signals) and of the fatigue importance factors; the default combinations are the same for every kind' }),
        description: text('One line describing the structure').optional(),
        material: z
          .strictObject({
            E: quantity('stress', system, 'positive', `Modulus of elasticity. ${defaultNote('materialE')}`).optional(),
            G: quantity('stress', system, 'positive', `Shear modulus (or give poissonRatio). ${defaultNote('materialG')}`).optional(),
            poissonRatio: factor('Poisson ratio; G = E / (2 (1 + poissonRatio))', 0, 0.5, 'the Poisson ratio of a metal is above 0 and at most 0.5 (steel 0.3, aluminium 0.33)', false).optional(),
            yieldStrength: quantity('stress', system, 'positive', `Minimum yield strength (or give grade). ${defaultNote('materialFy')}`).optional(),
            grade: z.enum(TUBE_STEEL_GRADES as [string, ...string[]]).meta({ description: `Steel grade of the tubes, which sets the minimum yield strength: ${TUBE_STEEL_GRADES.join(', ')} (give the grade or yieldStrength, not both)` }).optional(),
            density: quantity('density', system, 'positive', `Density. ${defaultNote('materialDensity')}`).optional(),
          })
          .optional(),
        pole: z.strictObject({
          height: quantity('length', system, 'positive', 'Pole height above the base plate'),
          section: sectionSchema(system),
          ...memberWindKeys(system),
          base: z
            .strictObject({
              fixity: z.enum(['fixed', 'rotational-spring']).meta({ description: `fixed | rotational-spring. ${defaultNote('baseFixity')}` }),
              rotationalStiffness: quantity('rotStiffness', system, 'positive', 'Rotational stiffness of the base about both horizontal axes, for rotational-spring (or give rotationalStiffnessX and rotationalStiffnessY)').optional(),
              rotationalStiffnessX: quantity('rotStiffness', system, 'positive', 'Rotational stiffness of the base about the global X axis, for rotational-spring').optional(),
              rotationalStiffnessY: quantity('rotStiffness', system, 'positive', 'Rotational stiffness of the base about the global Y axis, for rotational-spring').optional(),
              torsionalStiffness: quantity('rotStiffness', system, 'positive', 'Stiffness of the base in torsion about the pole axis, for rotational-spring. Without it the base is fixed in torsion').optional(),
            })
            .optional(),
        }),
        arms: z.array(armSchema(system)).max(MAX_ARMS, listLimit(MAX_ARMS, 'arms', 'a support has one to four')).optional(),
      }),
      attachments: z
        .strictObject({
          panels: z.array(panelSchema(system)).max(MAX_PANELS, listLimit(MAX_PANELS, 'sign panels', 'a support carries a few')).optional(),
          points: z.array(pointSchema(system)).max(MAX_POINTS, listLimit(MAX_POINTS, 'point attachments', 'a support carries a few dozen at most')).optional(),
        })
        .optional(),
      loads: z.strictObject({
        wind: windSchema(system),
        ice: iceSchema(system).optional(),
        fatigue: fatigueSchema(system).optional(),
      }),
      combinations: z
        .union([z.literal('default'), z.array(combinationSchema()).min(1, { error: 'give at least one combination, or write default' }).max(MAX_COMBINATIONS, listLimit(MAX_COMBINATIONS, 'combinations', 'a code set has a dozen or two'))])
        .optional()
        .meta({ description: "'default' (the default set, labelled in the package) or a list of combinations with their factors" }),
      criteria: criteriaSchema(system).optional(),
      analysis: analysisSchema(system).optional(),
      compare: compareSchema().optional(),
    })
    .meta({ title: 'polebook input', description: 'Input file of polebook: one pole with its arms, attachments, loads and criteria' });
}

export type DesignInput = z.output<ReturnType<typeof buildInputSchema>>;
export type SectionInput = DesignInput['structure']['pole']['section'];
export type OffsetInput = NonNullable<NonNullable<DesignInput['attachments']>['panels']>[number]['offset'];
