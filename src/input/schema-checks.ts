// The input keys of the design checks: criteria (limits, resistance factors, anchor bolts,
// base plate, vortex shedding) and the fatigue loads. Part of the input schema (schema.ts).
import { z } from 'zod';
import type { UnitSystem } from '../units/units.ts';
import { defaultNote } from './defaults.ts';
import { factor, quantity } from './quantity.ts';

const DRAG_RANGE = 'a drag coefficient is between 0.1 and 3 (about 0.45 to 1.2 for tubes, 1.1 to 1.2 for flat panels)';

/** A deflection limit: "L/100", "1/100" or a fraction such as 0.01. */
export const deflectionLimit = (description: string) =>
  z
    .union([z.number(), z.string()])
    .transform((raw, ctx) => {
      const m = typeof raw === 'string' ? /^\s*(?:L|1)\s*\/\s*(\d+(?:\.\d+)?)\s*$/.exec(raw) : null;
      const value = typeof raw === 'number' ? raw : m ? 1 / Number(m[1]) : NaN;
      if (!(value > 0 && value < 1)) {
        ctx.addIssue({ code: 'custom', message: `expected a limit such as "L/100" or a fraction between 0 and 1, got ${JSON.stringify(raw)}` });
        return z.NEVER;
      }
      return value;
    })
    .meta({ description });

/** The constant-amplitude fatigue threshold categories polebook knows (src/checks/fatigue/categories.ts). */
export const DETAIL_CATEGORY_VALUES = ['A', 'B', "B'", 'C', "C'", 'D', 'E', "E'", 'ET', 'K2'] as const;

const detailCategory = (what: string) =>
  z
    .enum(DETAIL_CATEGORY_VALUES, { error: () => `expected a detail category: ${DETAIL_CATEGORY_VALUES.join(', ')} (quote a category with a prime: "E'")` })
    .optional()
    .meta({ description: `Detail category of ${what} (A, B, B', C, C', D, E, E', ET, K2); its constant-amplitude fatigue threshold comes from the table printed in the package. Give this or the threshold` });

function deflectionSchema(system: UnitSystem) {
  return z
    .strictObject({
      armTipDead: deflectionLimit(`Arm tip vertical deflection under the unfactored dead load, "L/n" or a fraction of the arm length. ${defaultNote('armTipDeadDeflection')}`).optional(),
      armTipService: deflectionLimit(`Arm tip horizontal deflection under the service combinations, "L/n" or a fraction of the arm length. ${defaultNote('armTipServiceDeflection')}`).optional(),
      poleTopService: deflectionLimit(
        `Pole top horizontal deflection under the service combinations, "L/n" or a fraction of the pole height. Default by structure kind: sign and signal supports ${defaultNote('poleTopServiceDeflectionSignal')}; luminaire poles ${defaultNote('poleTopServiceDeflectionLuminaire')}`,
      ).optional(),
      armTipFatigue: quantity('section', system, 'positive', `Arm tip vertical deflection under the galloping and truck-gust fatigue loads (sign and signal supports). ${defaultNote('armTipFatigueDeflection')}`).optional(),
    })
    .meta({ description: 'Deflection limits; each names the movement it governs' });
}

function anchorBoltsSchema(system: UnitSystem) {
  return z
    .strictObject({
      count: z.int({ error: 'expected a whole number of bolts' }).min(3, { error: 'at least 3 anchor bolts are needed: fewer cannot hold a moment in every direction' }).max(64, { error: 'at most 64 anchor bolts: a pole base has 4 to 12, and polebook stops at 64 (a limit of ours)' }),
      circleDiameter: quantity('section', system, 'positive', 'Diameter of the bolt circle'),
      boltDiameter: quantity('section', system, 'positive', 'Nominal bolt diameter'),
      grade: z
        .union([z.literal(36), z.literal(55), z.literal(105), z.enum(['36', '55', '105'])], { error: () => 'expected an ASTM F1554 grade: 36, 55 or 105 (or give tensileStrength and yieldStrength)' })
        .transform((g) => String(g) as '36' | '55' | '105')
        .optional()
        .meta({ description: 'ASTM F1554 grade (36, 55, 105): sets the yield and tensile strengths. Give this, or tensileStrength and yieldStrength' }),
      tensileStrength: quantity('stress', system, 'positive', 'Specified minimum tensile strength of the bolt steel (instead of grade)').optional(),
      yieldStrength: quantity('stress', system, 'positive', 'Specified minimum yield strength of the bolt steel (instead of grade)').optional(),
      threadsPerInch: factor('Threads per inch of an inch thread (UNC form), when the bolt is not a standard UNC diameter', 1, 40, 'threads per inch of an anchor bolt are between 1 and 40 (a 1 in UNC bolt has 8, a 2 in bolt 4.5)').optional(),
      pitch: quantity('section', system, 'positive', 'Thread pitch of a metric thread (ISO form), when the bolt is not a standard ISO coarse-thread diameter').optional(),
      standOff: quantity('section', system, 'nonNegative', `Clear distance from the bottom of the leveling nut to the top of the concrete. ${defaultNote('boltStandOff')}`).optional(),
    })
    .meta({ description: 'Anchor bolts equally spaced on a circle: checked in axial force, shear, both together and (over a stand-off of more than one bolt diameter) bending, for every factored combination, and in fatigue when fatigue loads are given. Without this key the anchor bolts and base plate are not checked' });
}

function basePlateSchema(system: UnitSystem) {
  return z
    .strictObject({
      thickness: quantity('section', system, 'positive', 'Base plate thickness'),
      yieldStrength: quantity('stress', system, 'positive', `Minimum yield strength of the plate. ${defaultNote('basePlateFy')}`).optional(),
    })
    .meta({ description: 'Base plate: checked in bending at the pole face by an effective width per bolt (needs anchorBolts)' });
}

function vortexSchema(system: UnitSystem) {
  return z
    .strictObject({
      speedThreshold: quantity('speed', system, 'positive', `Critical vortex-shedding speed below which a member is reported as susceptible. ${defaultNote('vortexThreshold')}`).optional(),
      exemptTaper: quantity('taper', system, 'positive', `Taper at or above which a member is taken as not susceptible. ${defaultNote('vortexExemptTaper')}`).optional(),
      strouhalRound: factor(`Strouhal number, round tubes. ${defaultNote('strouhalRound')}`, 0.05, 0.5, 'the Strouhal number of a tube is between 0.05 and 0.5 (about 0.18 to 0.2 for a circle)').optional(),
      strouhalMultisided: factor(`Strouhal number, multisided tubes. ${defaultNote('strouhalMultisided')}`, 0.05, 0.5, 'the Strouhal number of a tube is between 0.05 and 0.5 (about 0.15 for 8 to 16 sides)').optional(),
    })
    .meta({ description: 'Vortex shedding: critical speeds of the members in their natural modes' });
}

export function criteriaSchema(system: UnitSystem) {
  const phi = (name: 'phiFlexure' | 'phiShear' | 'phiTorsion' | 'phiAxial' | 'phiTension' | 'phiBoltTension' | 'phiBoltShear', what: string) =>
    factor(`Resistance factor, ${what}. ${defaultNote(name)}`, 0, 1, 'a resistance factor φ reduces a nominal resistance: above 0 and at most 1 (typically 0.75 to 0.95)', false).optional();
  return z.strictObject({
    deflection: deflectionSchema(system).optional(),
    serviceWindFactor: factor(`Factor on wind in the service combination. ${defaultNote('serviceWindFactor')}`, 0, 2, 'the service wind factor scales the design pressures for the deflection checks: above 0 and at most 2 (1 or a little below is usual)', false).optional(),
    columnEffectiveLengthFactor: factor(`Effective length factor K of the pole and arms as free-standing cantilever columns. ${defaultNote('columnK')}`, 0.5, 5, 'the effective length factor K of a column is between 0.5 (fixed at both ends) and 5; a free-standing cantilever is about 2 to 2.1').optional(),
    resistanceFactors: z
      .strictObject({
        flexure: phi('phiFlexure', 'flexure'),
        shear: phi('phiShear', 'shear'),
        torsion: phi('phiTorsion', 'torsion'),
        axial: phi('phiAxial', 'axial compression'),
        tension: phi('phiTension', 'axial tension'),
        boltTension: phi('phiBoltTension', 'anchor bolt tension'),
        boltShear: phi('phiBoltShear', 'anchor bolt shear'),
      })
      .optional(),
    anchorBolts: anchorBoltsSchema(system).optional(),
    basePlate: basePlateSchema(system).optional(),
    vortex: vortexSchema(system).optional(),
  });
}

export function fatigueSchema(system: UnitSystem) {
  const importance = (what: string) => factor(`Importance factor, ${what} (overrides the category table)`, 0, 2, 'a fatigue importance factor scales a fatigue pressure: between 0 and 2 (the category tables give about 0.3 to 1)').optional();
  const caseBlock = <E extends z.ZodRawShape>(what: string, pressureDefault: 'gallopingPressure' | 'naturalGustPressure' | 'truckGustPressure', extra: E) =>
    z
      .union([
        z.literal(false),
        z.strictObject({
          pressure: quantity('pressure', system, 'positive', `Equivalent static pressure. ${defaultNote(pressureDefault)}`).optional(),
          importance: importance(what),
          ...extra,
        }),
      ])
      .optional()
      .meta({ description: `${what}: false to leave it out; a block (possibly empty, {}) to include it with its defaults. Default by structure kind: see loads.fatigue` });
  const lane = z.strictObject({
    arm: z.union([z.string(), z.number()]).transform((v) => String(v)).meta({ description: 'Arm id' }),
    from: quantity('length', system, 'nonNegative', 'Start of the part over the traffic lanes, along the arm from its root'),
    to: quantity('length', system, 'positive', 'End of the part over the traffic lanes, along the arm from its root'),
  });
  return z
    .strictObject({
      category: z.enum(['I', 'II', 'III'], { error: () => 'expected a fatigue importance category: I, II or III' }).optional().meta({ description: `Fatigue importance category. ${defaultNote('fatigueCategory')}` }),
      meanWindSpeed: quantity('speed', system, 'positive', `Yearly mean wind speed at the site. ${defaultNote('fatigueMeanWind')}`).optional(),
      galloping: caseBlock('Galloping (vertical, on panels and signal heads seen in elevation)', 'gallopingPressure', {}),
      naturalGust: caseBlock('Natural wind gust (horizontal, on every exposed area, each wind direction)', 'naturalGustPressure', {}),
      truckGust: caseBlock('Truck-induced gust (vertical, on the horizontal projection of the arms and attachments over the lanes)', 'truckGustPressure', {
        lanes: z.array(lane).optional().meta({ description: `Parts of the arms over the traffic lanes. ${defaultNote('truckLanes')}` }),
        roadLevel: quantity('length', system, 'any', `Road surface level relative to the pole base. ${defaultNote('roadLevel')}`).optional(),
        fullPressureHeight: quantity('length', system, 'positive', `${defaultNote('truckGustFullHeight')}`).optional(),
        zeroPressureHeight: quantity('length', system, 'positive', `${defaultNote('truckGustZeroHeight')}`).optional(),
        horizontalAreas: z
          .record(z.string(), quantity('area', system, 'nonNegative', 'Horizontal projected area of the attachment seen from above'))
          .optional()
          .meta({ description: 'Horizontal projected area of attachments seen from above, by attachment id (taken as zero when not given: the package says so)' }),
      }),
      dragCoefficients: z
        .strictObject({
          panels: factor(`Sign panels. ${defaultNote('dragPanels')}`, 0.1, 3, DRAG_RANGE).optional(),
          roundMembers: factor(`Round tubes. ${defaultNote('dragRound')}`, 0.1, 3, DRAG_RANGE).optional(),
          multisidedMembers: factor(`Multisided tubes. ${defaultNote('dragMultisided')}`, 0.1, 3, DRAG_RANGE).optional(),
          points: factor(`Point attachments, on their wind area. ${defaultNote('dragPoints')}`, 0.1, 3, DRAG_RANGE).optional(),
        })
        .optional(),
      poleBaseCategory: detailCategory('the pole-to-base-plate connection'),
      poleBaseThreshold: quantity('stress', system, 'positive', 'Constant-amplitude fatigue threshold of the pole base detail (instead of poleBaseCategory)').optional(),
      armRootCategory: detailCategory('the arm-to-pole connection at the arm root'),
      armRootThreshold: quantity('stress', system, 'positive', 'Constant-amplitude fatigue threshold of the arm root detail (instead of armRootCategory)').optional(),
      anchorBoltCategory: detailCategory('the anchor bolts in axial tension (stress on the tensile stress area)'),
      anchorBoltThreshold: quantity('stress', system, 'positive', 'Constant-amplitude fatigue threshold of the anchor bolts (instead of anchorBoltCategory)').optional(),
    })
    .meta({
      description:
        'Fatigue (infinite life) by equivalent static loads, each analysed alone. Default cases by structure kind: cantilever-sign and signal-support: galloping, natural gust and truck gust; luminaire-pole: natural gust only',
    });
}
