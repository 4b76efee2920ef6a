// The normalised design: validated input in internal SI units (m, N, Pa, kg, rad).
// Produced by src/input, read by src/model, src/loads, src/checks and src/report.
import type { Dim, UnitSystem } from '../units/units.ts';

export type StructureKind = 'cantilever-sign' | 'luminaire-pole' | 'signal-support';

/** Tapered tube. Diameters are outside; for a multisided tube, across the flats. */
export interface TubeSection {
  readonly shape: 'round' | 'multisided';
  /** Number of flat sides (8, 12, 16) for multisided; null for round. */
  readonly sides: number | null;
  /** Outside diameter at the member's root end (pole base, arm root). */
  readonly rootDiameter_m: number;
  /** Outside diameter at the member's tip end (pole top, arm tip). */
  readonly tipDiameter_m: number;
  readonly wall_m: number;
}

export interface Material {
  readonly E_Pa: number;
  readonly G_Pa: number;
  readonly Fy_Pa: number;
  readonly density_kgm3: number;
}

/** A spring base: rotational stiffness about global X (and about Y unless stiffnessY is given), and
 * in torsion about Z when torsion is given (absent: fixed in torsion). Translations are fixed. */
export type BaseFixity =
  | { readonly kind: 'fixed' }
  | { readonly kind: 'spring'; readonly stiffness_Nm_per_rad: number; readonly stiffnessY_Nm_per_rad?: number; readonly torsion_Nm_per_rad?: number };

export interface Pole {
  readonly height_m: number;
  readonly section: TubeSection;
  readonly base: BaseFixity;
  /** Absent or null fields: the class pressure and the shape's drag apply. */
  readonly wind?: MemberWind;
}

/** A member's own wind: a typed pressure (over the class pressure and the wind speed), or a drag
 * coefficient for the wind-speed path (over the table); null when not given. */
export interface MemberWind {
  readonly pressure_Pa: number | null;
  readonly drag: number | null;
}

/**
 * Global axes: X and Y horizontal, Z up, origin at the pole base centre.
 * Plan directions are angles from +X toward +Y (counter-clockwise seen from above).
 */
export interface Arm {
  readonly id: string;
  /** Height above the pole base of the arm axis where it meets the pole. */
  readonly attachHeight_m: number;
  readonly direction_rad: number;
  /** Length along the arm axis from the pole face to the tip. */
  readonly length_m: number;
  /** How the drawing dimensioned the arm: from the pole face (absent: face) or from the pole axis,
   * in which case the face radius at the attachment height was taken off the length and positions. */
  readonly lengthFrom?: 'face' | 'axis';
  /** Rise angle above horizontal. */
  readonly rise_rad: number;
  readonly section: TubeSection;
  /** Absent or null fields: the class pressure and the shape's drag apply. */
  readonly wind?: MemberWind;
}

/** Where an attachment sits. For an arm: distance along the arm axis from the arm root
 * (pole face). For the pole: height above the base. */
export type MemberRef = 'pole' | string;

/** Offset of an attachment's centroid from the member axis.
 * On an arm: vertical_m up (+) or down (-), lateral_m horizontal and perpendicular to
 * the arm in plan, positive to the left looking from root to tip (+90 deg in plan).
 * On the pole: lateral_m horizontal from the pole axis in plan direction direction_rad;
 * vertical_m up (+) or down (-) from the position (the height of the bracket). */
export interface Offset {
  readonly vertical_m: number;
  readonly lateral_m: number;
  readonly direction_rad: number;
}

export interface PanelAttachment {
  readonly kind: 'panel';
  readonly id: string;
  readonly description: string;
  readonly member: MemberRef;
  readonly position_m: number;
  readonly width_m: number;
  readonly height_m: number;
  readonly weightPerArea_Pa: number;
  readonly offset: Offset;
  /** Plan direction of the panel's face normal. On an arm: perpendicular to the arm. */
  readonly faceNormal_rad: number;
}

export interface PointAttachment {
  readonly kind: 'luminaire' | 'signal-head' | 'other';
  readonly id: string;
  readonly description: string;
  readonly member: MemberRef;
  readonly position_m: number;
  readonly weight_N: number;
  /** Projected (or effective projected) wind area of the face; with no side area, the area
   * for every wind direction. */
  readonly windArea_m2: number;
  /** Area seen from the side (90 deg to the face); null: the face area from every direction. */
  readonly sideArea_m2: number | null;
  /** Plan direction of the face normal (square to the arm on an arm; given on the pole). */
  readonly faceNormal_rad: number;
  readonly offset: Offset;
}

export type Attachment = PanelAttachment | PointAttachment;

export interface WindDirection {
  /** Plan direction the wind blows toward. */
  readonly angle_rad: number;
  readonly label: string;
}

export type MemberWindRule = 'projected-area' | 'cross-flow';

export type Exposure = 'B' | 'C' | 'D';

/** The design pressure from a basic wind speed, P = 0.00256 Kz Kd G V² Cd (see src/loads/wind-coefficients.ts). */
export interface WindSpeedInput {
  readonly V_mps: number;
  /** What V is, as the user states it (map, return period or risk category), printed with it. */
  readonly basis: string;
  readonly exposure: Exposure;
  readonly Kd: number;
  readonly G: number;
  /** Factor on V d in the Reynolds-dependent drag of round tubes. */
  readonly Cv: number;
}

export interface WindInput {
  /** Design pressures entered by the user (already include the coefficients they chose); null:
   * computed from the wind speed for that class, at each height. */
  readonly membersPressure_Pa: number | null;
  readonly panelsPressure_Pa: number | null;
  readonly pointsPressure_Pa: number | null;
  /** The wind speed path, when given; typed pressures override it class by class. */
  readonly speed: WindSpeedInput | null;
  readonly directions: readonly WindDirection[];
  /** How the wind loads an inclined member: 'projected-area' (force p D sin θ in the wind
   * direction, on the area projected normal to the wind) or 'cross-flow' (p D sin²θ normal to the axis). */
  readonly memberRule: MemberWindRule;
}

export interface IceInput {
  /** Ice weight per unit surface area on members and attachments. */
  readonly weightPerArea_Pa: number;
  /** Factor on the wind pressures used together with ice. */
  readonly windFactor: number;
}

export type FatigueCategory = 'I' | 'II' | 'III';
export type FatigueLoadName = 'galloping' | 'naturalGust' | 'truckGust';

/** One equivalent static fatigue load, switched on. */
export interface FatigueLoad {
  /** Pressure before the drag coefficient and the importance factor (galloping has no Cd). */
  readonly pressure_Pa: number;
  readonly importance: number;
}

export interface TruckLane {
  readonly arm: string;
  readonly from_m: number;
  readonly to_m: number;
}

/** A fatigue detail: its threshold, and the category it came from (null when the threshold was given). */
export interface FatigueDetail {
  readonly category: string | null;
  readonly threshold_Pa: number;
}

export interface FatigueInput {
  readonly category: FatigueCategory;
  /** Yearly mean wind speed; the natural gust pressure scales with (V / 11.2 mph)². */
  readonly meanWindSpeed_mps: number;
  readonly galloping: FatigueLoad | null;
  readonly naturalGust: FatigueLoad | null;
  readonly truckGust: (FatigueLoad & {
    readonly lanes: readonly TruckLane[];
    /** Road surface level relative to the pole base (+ above). */
    readonly roadLevel_m: number;
    readonly fullPressureHeight_m: number;
    readonly zeroPressureHeight_m: number;
    /** Horizontal projected area of attachments seen from above, by id (absent: zero). */
    readonly horizontalAreas_m2: Readonly<Record<string, number>>;
  }) | null;
  readonly drag: { readonly panels: number; readonly roundMembers: number; readonly multisidedMembers: number; readonly points: number };
  readonly poleBase: FatigueDetail;
  readonly armRoot: FatigueDetail;
  readonly anchorBolts: FatigueDetail;
}

/** Load kinds that combinations put factors on. 'wind' expands to one analysis per direction. */
export type LoadKind = 'dead' | 'wind' | 'ice' | 'ice-wind';

export type CombinationCategory = 'strength' | 'extreme-wind' | 'extreme-ice' | 'service' | 'fatigue';

export interface CombinationSpec {
  readonly id: string;
  readonly category: CombinationCategory;
  readonly description: string;
  readonly factors: Readonly<Partial<Record<LoadKind, number>>>;
  /** Where the factors come from; defaults say so and ask to be verified. */
  readonly source: string;
}

export interface AnchorBolts {
  readonly count: number;
  readonly circleDiameter_m: number;
  readonly boltDiameter_m: number;
  /** ASTM F1554 grade when given ('36', '55', '105'), else null (strengths given directly). */
  readonly grade: string | null;
  readonly Fu_Pa: number;
  readonly Fy_Pa: number;
  /** Thread given in the input (threadsPerInch: UNC form; pitch: ISO metric form); null: the
   * standard coarse thread of the bolt diameter (UNC or ISO, from the tables). */
  readonly thread: { readonly standard: 'UNC' | 'ISO metric'; readonly pitch_m: number } | null;
  /** Clear stand-off from the bottom of the leveling nut to the concrete. */
  readonly standOff_m: number;
}

export interface BasePlate {
  readonly thickness_m: number;
  readonly Fy_Pa: number;
}

export interface DeflectionLimits {
  /** Ratios of the member length. */
  readonly armTipDeadRatio: number;
  readonly armTipServiceRatio: number;
  readonly poleTopServiceRatio: number;
  /** Absolute limit on the arm tip vertical movement under galloping and truck gust. */
  readonly armTipFatigue_m: number;
}

export interface VortexCriteria {
  readonly speedThreshold_mps: number;
  /** Taper (diameter change per length) at or above which a member is exempt. */
  readonly exemptTaper: number;
  readonly strouhalRound: number;
  readonly strouhalMultisided: number;
}

export interface Criteria {
  readonly deflection: DeflectionLimits;
  /** Effective length factor of the pole and arms as free-standing cantilever columns. */
  readonly columnK: number;
  readonly phi: {
    readonly flexure: number;
    readonly shear: number;
    readonly torsion: number;
    readonly axial: number;
    readonly tension: number;
    readonly boltTension: number;
    readonly boltShear: number;
  };
  readonly anchorBolts: AnchorBolts | null;
  readonly basePlate: BasePlate | null;
  readonly vortex: VortexCriteria;
}

export interface AnalysisSettings {
  readonly segmentsPerMember: number;
  readonly secondOrder: boolean;
  readonly pDeltaTolerance: number;
  readonly pDeltaMaxIterations: number;
  /** Regular spacing of result stations along members. */
  readonly stationSpacing_m: number;
}

export interface Revision {
  readonly id: string;
  readonly date: string;
  readonly description: string;
  /** Who made it; '' when not given. */
  readonly by: string;
  /** Set when the revision is issued for submittal by the engineer of record. */
  readonly issued: IssuedMark | null;
}

/** The engineer of record's mark on an issued revision. */
export interface IssuedMark {
  readonly engineer: string;
  readonly licence: string;
  /** '' when not given. */
  readonly jurisdiction: string;
}

export interface Project {
  readonly name: string;
  readonly structureId: string;
  readonly location: string;
  readonly owner: string;
  readonly revisions: readonly Revision[];
  readonly preparedBy: string;
  readonly checkedBy: string;
  readonly engineerOfRecord: string;
  /** Date printed on the package (ISO yyyy-mm-dd): from the input or SOURCE_DATE_EPOCH. */
  readonly date: string;
}

/** One value the package states as an assumption: every default carries its source. */
export interface Assumption {
  /** Input key path, e.g. "material.E". */
  readonly key: string;
  readonly label: string;
  readonly value: number | string | boolean;
  /** Dimension when value is a number in SI; absent for text. */
  readonly dim?: Dim;
  /** Published source, "common practice", or "typical value, verify against the governing code". */
  readonly source: string;
  /** True when the user did not give the value and the default was taken. */
  readonly defaulted: boolean;
}

export interface Design {
  readonly formatVersion: 1;
  /** The user's unit system, for printing. */
  readonly units: UnitSystem;
  readonly project: Project;
  readonly kind: StructureKind;
  readonly description: string;
  readonly material: Material;
  readonly pole: Pole;
  readonly arms: readonly Arm[];
  readonly attachments: readonly Attachment[];
  readonly wind: WindInput;
  readonly ice: IceInput | null;
  readonly fatigue: FatigueInput | null;
  readonly combinations: readonly CombinationSpec[];
  readonly criteria: Criteria;
  readonly analysis: AnalysisSettings;
  readonly assumptions: readonly Assumption[];
}

/** The design together with where it came from. */
export interface LoadedDesign {
  readonly design: Design;
  readonly file: string;
  readonly text: string;
  /** First 12 hex digits of the SHA-256 of the input bytes. */
  readonly inputHash: string;
  readonly warnings: readonly import('../errors.ts').Diagnostic[];
}
