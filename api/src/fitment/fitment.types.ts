/**
 * Input and output types of the fitment engine. The API maps its entities to the input types
 * and stores the FitReport as the quote's fit-report snapshot.
 */
import type { RuleKey } from './rule-set-limits';
import type { SpeedSymbol } from './speed-symbols';

export interface BoltPattern {
  studCount: number;
  /** Pitch circle diameter, mm (e.g. 139.7 for 6x139.7). */
  pcdMm: number;
}

export interface StockWheelSpec {
  diameterIn: number;
  widthIn: number;
  /** ET: mounting face from the rim centreline, mm, positive outboard. */
  offsetMm: number;
}

export type FrontSuspensionKind = 'independent' | 'solid-axle';
export type RearSuspensionKind = 'leaf' | 'coil' | 'independent';

export interface VehicleSpec {
  make: string;
  model: string;
  variant: string;
  frontSuspension: FrontSuspensionKind;
  rearSuspension: RearSuspensionKind;
  boltPattern: BoltPattern;
  /** Stud thread, e.g. "M12x1.5". */
  studThread: string;
  /** Hub spigot diameter, mm. */
  centreBoreMm: number;
  /** Stock tyre designation, e.g. "265/65R17 112S". */
  stockTyre: string;
  /** Largest tyre the maker specifies for this vehicle (the base of the diameter limit); stock tyre when absent. */
  largestSpecifiedTyre?: string;
  stockWheel: StockWheelSpec;
  gvmKg: number;
  frontAxleKg: number;
  rearAxleKg: number;
  kerbMassKg: number;
  /** Load index on the tyre placard (single fitment). */
  placardLoadIndex: number;
  placardSpeedSymbol: SpeedSymbol;
  /** Front half-shaft length, mm, for the joint-angle check on independent front suspension. */
  frontHalfShaftLengthMm?: number;
  /** The vehicle has off-road features (off-road passenger vehicle category). */
  offRoadCategory: boolean;
  topSpeedKmh?: number;
  /**
   * Treated as a light truck for the P-metric derate (utes, vans, 4x4 wagons). When absent it
   * follows offRoadCategory.
   */
  lightTruck?: boolean;
  /** Dual rear wheels: the rear tyres use the dual-fitment index and carry a quarter of the rear axle each. */
  dualRearWheels?: boolean;
}

export interface WheelSpec {
  id?: string;
  diameterIn: number;
  widthIn: number;
  offsetMm: number;
  boltPattern: BoltPattern;
  centreBoreMm: number;
  /** Thread of the wheel nuts supplied with or required by the wheel, e.g. "M12x1.5". */
  studThread: string;
  /** Rated load per wheel, kg. */
  loadRatingKg: number;
  /**
   * The fitment relies on a wheel spacer or adapter (offsetMm is then the effective offset with
   * the spacer). Spacers from the catalogue are never maker-fitted.
   */
  isSpacer?: boolean;
}

export interface TyreSpec {
  id?: string;
  /** Size and service description, e.g. "285/70R17 121/118Q". */
  designation: string;
  /** The tyre maker's approved rim-width range, inches; both or neither. Without it the range is derived. */
  approvedRimWidthMinIn?: number;
  approvedRimWidthMaxIn?: number;
}

export interface SuspensionKitVariant {
  id: string;
  name: string;
  constantLoadMinKg: number;
  constantLoadMaxKg: number;
}

export interface SuspensionKitSpec {
  id?: string;
  name?: string;
  /** Lift at the front wheels, mm (negative lowers). */
  frontLiftMm: number;
  /** Lift at the rear wheels, mm (negative lowers). */
  rearLiftMm: number;
  /** Rated constant (permanent extra) load range of the springs, kg. */
  constantLoadMinKg: number;
  constantLoadMaxKg: number;
  /** Other spring ratings of the same kit, from which the report picks one that covers the load. */
  variants?: SuspensionKitVariant[];
  /** False when the kit keeps less than two thirds of the original travel; unknown when absent. */
  keepsTwoThirdsTravel?: boolean;
  includesGreasableShackles?: boolean;
  includesExtendedBrakeLines?: boolean;
}

/** What a suggested addition (or an included component) is for. */
export type AdditionRole =
  | 'diff-drop'
  | 'alignment'
  | 'hub-rings'
  | 'greasable-shackles'
  | 'extended-brake-lines'
  | 'steering-damper'
  | 'headlight-re-aim'
  | 'speedometer-recalibration'
  | 'spring-rating';

export interface ComponentSpec {
  id?: string;
  role: AdditionRole | 'accessory';
  name?: string;
  /** For a diff drop: how far it lowers the front differential, mm. */
  diffDropMm?: number;
  /** For hub-centric rings: outer diameter, mm (the side that sits in the wheel's centre bore). */
  ringOuterMm?: number;
  /** For hub-centric rings: inner diameter, mm (the side that sits on the hub spigot). */
  ringInnerMm?: number;
  /** Mass the component adds to the vehicle, kg (counted in the GVM check). */
  massKg?: number;
}

export interface UsageSpec {
  /** Permanent extra load (drawers, canopy, water, tools), kg. */
  constantLoadKg: number;
  /** Accessories not in the package (bull bar, winch, roof rack), kg. */
  accessoriesMassKg?: number;
  /** Occupants counted in the GVM check; 1 (the driver) when absent. */
  occupantCount?: number;
}

export interface FitmentInput {
  vehicle: VehicleSpec;
  /** Replacement wheels; absent: the stock wheels stay. */
  wheel?: WheelSpec;
  /** Replacement tyres; absent: the stock tyres stay. */
  tyre?: TyreSpec;
  suspensionKit?: SuspensionKitSpec;
  components?: ComponentSpec[];
  /** Absent: no constant load, no accessories, one occupant. */
  usage?: UsageSpec;
}

export type FitVerdict = 'does-not-fit' | 'needs-certification' | 'advisory' | 'ok';

/** Verdicts, worst first. */
export const VERDICTS_WORST_FIRST: readonly FitVerdict[] = [
  'does-not-fit',
  'needs-certification',
  'advisory',
  'ok',
];

/** The worst of some verdicts; 'ok' for none. */
export function worstVerdict(verdicts: Iterable<FitVerdict>): FitVerdict {
  let worstRank = VERDICTS_WORST_FIRST.length - 1;
  for (const verdict of verdicts) {
    worstRank = Math.min(worstRank, VERDICTS_WORST_FIRST.indexOf(verdict));
  }
  return VERDICTS_WORST_FIRST[worstRank];
}

export type FitCheckCode =
  | 'tyre-designation'
  | 'bolt-pattern'
  | 'centre-bore'
  | 'stud-thread'
  | 'wheel-load-rating'
  | 'rim-diameter'
  | 'rim-width'
  | 'tyre-load-capacity'
  | 'speed-symbol'
  | 'tyre-diameter-change'
  | 'speedometer'
  | 'tyre-clearance'
  | 'suspension-lift'
  | 'combined-lift'
  | 'wheel-track-change'
  | 'joint-angle'
  | 'spring-rating'
  | 'gross-vehicle-mass'
  | 'alignment';

export interface SuggestedAddition {
  role: AdditionRole;
  reason: string;
  /** True: the package is not complete without it (it is added as a line, not only advised). */
  required: boolean;
  /** For a spring rating: the kit variant that covers the declared load. */
  variantId?: string;
  numbers?: Readonly<Record<string, number>>;
}

export interface FitCheck {
  code: FitCheckCode;
  verdict: FitVerdict;
  /** Plain words a customer can read. */
  message: string;
  /** The numbers behind the verdict, units in the keys (e.g. newDiameterMm). */
  numbers: Readonly<Record<string, number>>;
  rule: {
    /** The source text of the rule(s) that decided the verdict, from the rule set. */
    source: string;
    /** The rule-set keys that governed the check. */
    keys: RuleKey[];
  };
}

export type SkipReason = 'disabled-by-rule-set' | 'not-applicable' | 'missing-data';

export interface SkippedCheck {
  code: FitCheckCode;
  reason: SkipReason;
  message: string;
}

export type CheckOutcome =
  | { ran: true; check: FitCheck; additions: SuggestedAddition[] }
  | { ran: false; skipped: SkippedCheck };

export type CautionCode =
  | 'guide-only'
  | 'handling-and-rollover'
  | 'modification-limits'
  | 'insurer'
  | 'wheel-nut-retorque'
  | 'qualified-fitting';

export interface Caution {
  code: CautionCode;
  message: string;
}

export interface FitMetrics {
  stockDiameterMm: number | null;
  newDiameterMm: number | null;
  /** New minus stock overall diameter, mm (physical change, not the rule's base). */
  diameterChangeMm: number | null;
  diameterChangePercent: number | null;
  /** Speedometer reading at a true 100 km/h, assuming it read exactly true on the stock tyre. */
  speedometerAtTrue100Kmh: number | null;
  /** Smallest gain under the front and rear differentials (the lowest points). */
  groundClearanceGainMm: number | null;
  groundClearanceGainFrontMm: number | null;
  groundClearanceGainRearMm: number | null;
  /** Suspension lift + half the tyre diameter increase over the rule's base (as the combined-lift check). */
  combinedLiftMm: number;
  /** Track change, both sides together, mm (0 with stock wheels). */
  trackChangeMm: number;
  outerEdgeChangePerSideMm: number;
  /** Added front half-shaft angle, degrees, after any diff drop; null when it does not apply. */
  jointAngleAddedDeg: number | null;
}

export interface FitReport {
  /** The worst verdict of the checks that ran. */
  verdict: FitVerdict;
  ruleSetName: string;
  checks: FitCheck[];
  /** Checks that did not run, and why (switched off by the rule set, not applicable, data missing). */
  skippedChecks: SkippedCheck[];
  metrics: FitMetrics;
  suggestedAdditions: SuggestedAddition[];
  cautions: Caution[];
}
