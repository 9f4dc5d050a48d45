/**
 * Rule sets as data: every limit the fit report applies, with its unit and the source text the
 * report quotes. A manager edits them per jurisdiction; these two are the seeded examples.
 *
 * Confidence marks in the source texts follow REFERENCES.md: H primary text or several sources
 * agree, M a secondary source quotes the rule, MEM recalled. Limits differ by jurisdiction and
 * change: the product tells users to confirm with their road authority.
 */

export type RuleUnit =
  | 'mm'
  | 'percent'
  | 'km/h'
  | 'deg'
  | 'kg per occupant'
  | 'factor'
  | 'mm of diameter per 25 mm of lift';

/** A numeric limit. `enabled: false` switches the rule off. */
export interface RuleLimit {
  enabled: boolean;
  value: number;
  unit: RuleUnit;
  source: string;
}

/** A rule without a number (a must-match or a permission). `enabled: false` switches it off. */
export interface RuleSwitch {
  enabled: boolean;
  source: string;
}

export interface RuleSetLimits {
  name: string;
  jurisdiction: string;

  /** Wheel stud count and PCD must match the hub. */
  boltPatternMatch: RuleSwitch;
  /** Wheel centre bore must clear the hub spigot; a larger bore gets hub-centric rings. */
  centreBoreFit: RuleSwitch;
  /** Wheel nut thread must match the vehicle's studs. */
  studThreadMatch: RuleSwitch;
  /** Each wheel's rated load must be at least half the heaviest axle rating. */
  wheelLoadRating: RuleSwitch;

  /** Tyre load capacity (load index table) at least half the heaviest axle rating and the placard's. */
  tyreLoadCapacity: RuleSwitch;
  /** P-metric tyres on a light truck carry their capacity divided by this factor. Disabled: no derate. */
  passengerTyreLightTruckDerateFactor: RuleLimit;
  /**
   * Enabled: a tyre rated below the placard speed symbol does not fit (unless the off-road
   * exemption applies). Disabled: below the placard but at or above the legal minimum is an advisory.
   */
  placardSpeedSymbolEnforced: RuleSwitch;
  /** Minimum tyre speed rating for vehicles without the off-road exemption (capped at the vehicle's top speed). */
  minSpeedKmhOther: RuleLimit;
  /** Minimum tyre speed rating for vehicles with off-road features, when the exemption is enabled. */
  minSpeedKmhOffRoad: RuleLimit;
  /** Enabled: off-road vehicles may run tyres rated below the placard, down to minSpeedKmhOffRoad. */
  speedSymbolOffRoadExemption: RuleSwitch;
  /** The wheel's rim diameter must equal the tyre's rim diameter. */
  rimDiameterMatch: RuleSwitch;
  /** The wheel's rim width must lie in the tyre's approved (or derived) rim-width range. */
  rimWidthForSection: RuleSwitch;

  /** Largest overall diameter increase over the largest maker-specified tyre, off-road vehicles. */
  tyreDiameterIncreaseMaxMm: RuleLimit;
  /** Largest overall diameter increase over the largest maker-specified tyre, other vehicles. */
  tyreDiameterIncreaseMaxMmOther: RuleLimit;
  /** Largest overall diameter decrease below the smallest of stock / largest specified (applied to every vehicle). */
  tyreDiameterDecreaseMaxMm: RuleLimit;
  /** Largest diameter change either way as a percentage of the largest specified size. */
  diameterChangeMaxPercent: RuleLimit;
  /** Speedometer must never read below true speed, nor more than 10 % + 4 km/h above it. */
  speedometerAccuracy: RuleSwitch;
  /** Rule of thumb: extra tyre diameter usually clear of the body per 25 mm of suspension lift. */
  clearanceAllowanceMmPer25mmLift: RuleLimit;

  /** Largest suspension raise or lowering without certification. */
  suspensionLiftMaxMm: RuleLimit;
  /** Largest suspension lift plus half the tyre diameter increase. */
  combinedLiftMaxMm: RuleLimit;
  /** Added front half-shaft angle past which a diff drop is suggested (independent front suspension). */
  jointAngleThresholdDeg: RuleLimit;
  /** A wheel alignment is added after any suspension or tyre-size change. */
  alignmentAfterChange: RuleSwitch;
  /** The kit's rated constant-load range must cover the declared constant load. */
  springRatingForLoad: RuleSwitch;
  /** Lift past which extended brake lines are suggested. */
  brakeLineLiftThresholdMm: RuleLimit;

  /** Largest wheel track increase (both sides together). */
  trackIncreaseMaxMm: RuleLimit;
  /** Enabled: wheel spacers are not permitted unless the maker fitted them. */
  wheelSpacersProhibited: RuleSwitch;

  /** Kerb mass + accessories + declared load + occupants must not exceed the GVM. */
  grossVehicleMass: RuleSwitch;
  /** Mass allowed per occupant in the GVM check. Disabled: occupants are not counted. */
  occupantAllowanceKg: RuleLimit;
}

export type RuleKey = Exclude<keyof RuleSetLimits, 'name' | 'jurisdiction'>;

export type RuleKeyShape = { kind: 'limit'; unit: RuleUnit } | { kind: 'switch' };

/** The shape of every rule key: what the API validates and what a rule editor shows. */
export const RULE_KEY_SHAPES: Readonly<Record<RuleKey, RuleKeyShape>> = {
  boltPatternMatch: { kind: 'switch' },
  centreBoreFit: { kind: 'switch' },
  studThreadMatch: { kind: 'switch' },
  wheelLoadRating: { kind: 'switch' },
  tyreLoadCapacity: { kind: 'switch' },
  passengerTyreLightTruckDerateFactor: { kind: 'limit', unit: 'factor' },
  placardSpeedSymbolEnforced: { kind: 'switch' },
  minSpeedKmhOther: { kind: 'limit', unit: 'km/h' },
  minSpeedKmhOffRoad: { kind: 'limit', unit: 'km/h' },
  speedSymbolOffRoadExemption: { kind: 'switch' },
  rimDiameterMatch: { kind: 'switch' },
  rimWidthForSection: { kind: 'switch' },
  tyreDiameterIncreaseMaxMm: { kind: 'limit', unit: 'mm' },
  tyreDiameterIncreaseMaxMmOther: { kind: 'limit', unit: 'mm' },
  tyreDiameterDecreaseMaxMm: { kind: 'limit', unit: 'mm' },
  diameterChangeMaxPercent: { kind: 'limit', unit: 'percent' },
  speedometerAccuracy: { kind: 'switch' },
  clearanceAllowanceMmPer25mmLift: { kind: 'limit', unit: 'mm of diameter per 25 mm of lift' },
  suspensionLiftMaxMm: { kind: 'limit', unit: 'mm' },
  combinedLiftMaxMm: { kind: 'limit', unit: 'mm' },
  jointAngleThresholdDeg: { kind: 'limit', unit: 'deg' },
  alignmentAfterChange: { kind: 'switch' },
  springRatingForLoad: { kind: 'switch' },
  brakeLineLiftThresholdMm: { kind: 'limit', unit: 'mm' },
  trackIncreaseMaxMm: { kind: 'limit', unit: 'mm' },
  wheelSpacersProhibited: { kind: 'switch' },
  grossVehicleMass: { kind: 'switch' },
  occupantAllowanceKg: { kind: 'limit', unit: 'kg per occupant' },
};

export const RULE_KEYS = Object.keys(RULE_KEY_SHAPES) as RuleKey[];

const VSB14_LS =
  'VSB 14 National Code of Practice for Light Vehicle Construction and Modification, Section LS';

/** Australian national-code defaults, as quoted in REFERENCES.md. Confirm with the road authority. */
export const defaultRuleSetLimits: RuleSetLimits = {
  name: 'National code defaults',
  jurisdiction: 'AU (VSB 14 Section LS and state codes as quoted)',

  boltPatternMatch: {
    enabled: true,
    source:
      "Physical fit: the wheel's stud count and PCD must match the vehicle maker's hub specification.",
  },
  centreBoreFit: {
    enabled: true,
    source:
      "Physical fit: the wheel's centre bore must clear the hub spigot; a larger bore is centred with hub-centric rings (common practice, no published source).",
  },
  studThreadMatch: {
    enabled: true,
    source: "Physical fit: wheel nuts must match the vehicle maker's stud thread.",
  },
  wheelLoadRating: {
    enabled: true,
    source:
      "Common practice (no published source): each wheel's rated load at least half the heaviest axle rating.",
  },

  tyreLoadCapacity: {
    enabled: true,
    source:
      'ISO 4000-1 / ETRTO load index table (H): capacity per tyre at least half the heaviest axle rating and at least the placard load index; LT dual marks give single and dual capacities (H).',
  },
  passengerTyreLightTruckDerateFactor: {
    enabled: true,
    value: 1.1,
    unit: 'factor',
    source:
      'US practice, Tire and Rim Association: P-metric tyres on light trucks derated by 1.10 (M).',
  },
  placardSpeedSymbolEnforced: {
    enabled: false,
    source:
      "Vehicle tyre placard: the maker's speed symbol. Not enforced here: a lower rating that meets the legal minimum is reported as an advisory.",
  },
  minSpeedKmhOther: {
    enabled: true,
    value: 180,
    unit: 'km/h',
    source:
      "WA Road Traffic (Vehicle Standards) Rules 2002 r46; SA rules r52: tyre speed rating at least 180 km/h for cars without off-road features, or the vehicle's top speed if lower (H).",
  },
  minSpeedKmhOffRoad: {
    enabled: true,
    value: 140,
    unit: 'km/h',
    source:
      "WA Road Traffic (Vehicle Standards) Rules 2002 r46; SA rules r52: at least 140 km/h (N) for vehicles with off-road features, or the vehicle's top speed if lower (H).",
  },
  speedSymbolOffRoadExemption: {
    enabled: true,
    source:
      'WA Road Traffic (Vehicle Standards) Rules 2002 r46; SA rules r52: vehicles with off-road features may run tyres rated down to 140 km/h (N) (H).',
  },
  rimDiameterMatch: {
    enabled: true,
    source:
      'ISO 4000-1 / ETRTO size designation: a tyre fits only a wheel of its own rim diameter (the 17 in 265/70R17).',
  },
  rimWidthForSection: {
    enabled: true,
    source:
      "Tire and Rim Association measuring rims: measuring rim ≈ K × section width, nearest 0.5 in (M); the tyre maker's approved range wins when known.",
  },

  tyreDiameterIncreaseMaxMm: {
    enabled: true,
    value: 50,
    unit: 'mm',
    source: `${VSB14_LS} (as quoted): off-road passenger vehicles up to +50 mm over the largest tyre size the maker specifies (M).`,
  },
  tyreDiameterIncreaseMaxMmOther: {
    enabled: true,
    value: 15,
    unit: 'mm',
    source: `${VSB14_LS} (as quoted): ordinary passenger cars up to +15 mm over the largest tyre size the maker specifies (M).`,
  },
  tyreDiameterDecreaseMaxMm: {
    enabled: true,
    value: 26,
    unit: 'mm',
    source: `${VSB14_LS} (as quoted): ordinary passenger cars down to −26 mm (M); Liftwright applies it to every vehicle.`,
  },
  diameterChangeMaxPercent: {
    enabled: false,
    value: 7,
    unit: 'percent',
    source:
      'One state code: overall diameter within ±7 % of the largest specified wheel-and-tyre size (M). Off in this rule set.',
  },
  speedometerAccuracy: {
    enabled: true,
    source:
      'UN ECE Regulation No. 39 §5.3; Australian Design Rule 18/03: 0 ≤ V1 − V2 ≤ 0.1·V2 + 4 km/h, indicated never below true (H).',
  },
  clearanceAllowanceMmPer25mmLift: {
    enabled: true,
    value: 25,
    unit: 'mm of diameter per 25 mm of lift',
    source:
      'Common practice (no published source): per 25 mm of lift about 25 mm (1 in) of extra tyre diameter usually clears the body.',
  },

  suspensionLiftMaxMm: {
    enabled: true,
    value: 50,
    unit: 'mm',
    source: `VicRoads VSI 8 §13.2 quoting ${VSB14_LS}: suspension raised or lowered up to 50 mm without certification, keeping at least two thirds of the original travel (M).`,
  },
  combinedLiftMaxMm: {
    enabled: true,
    value: 75,
    unit: 'mm',
    source:
      'VicRoads VSI 8 §13.3: combined lift up to 75 mm, suspension ≤ 50 mm plus tyre diameter increase ≤ 50 mm, the tyres counting half their diameter increase (M).',
  },
  jointAngleThresholdDeg: {
    enabled: true,
    value: 6.5,
    unit: 'deg',
    source:
      'Common practice (no published source): a diff drop is suggested when a lift adds more than 6.5° to the front half-shaft angle (about 50 mm on a 450 mm shaft).',
  },
  alignmentAfterChange: {
    enabled: true,
    source:
      "Common practice (no published source): a wheel alignment after any suspension or tyre-size change, to the vehicle maker's specification.",
  },
  springRatingForLoad: {
    enabled: true,
    source:
      "Kit maker's constant-load rating (M): the permanent extra mass at which the kit reaches its stated ride height must cover the declared load.",
  },
  brakeLineLiftThresholdMm: {
    enabled: true,
    value: 50,
    unit: 'mm',
    source:
      'Common practice (no published source): past a 50 mm lift, extended brake lines are suggested; check hose slack at full droop.',
  },

  trackIncreaseMaxMm: {
    enabled: true,
    value: 25,
    unit: 'mm',
    source: `${VSB14_LS} (as quoted): wheel track increase up to +25 mm (M). State codes differ (+50 mm for off-road categories in one, +26 mm in another).`,
  },
  wheelSpacersProhibited: {
    enabled: true,
    source: `${VSB14_LS} (as quoted): wheel spacers are not permitted unless fitted by the vehicle maker (M).`,
  },

  grossVehicleMass: {
    enabled: true,
    source:
      "Vehicle maker's gross vehicle mass (GVM, on the compliance plate): kerb mass + accessories + load + occupants must not exceed it.",
  },
  occupantAllowanceKg: {
    enabled: true,
    value: 75,
    unit: 'kg per occupant',
    source:
      'Liftwright default (no published source): 75 kg per occupant; set the figure your jurisdiction uses.',
  },
};

const STRICTER = 'Illustrative stricter example (not a published limit)';

/**
 * An example of a stricter jurisdiction, for demonstration and tests: smaller lifts, the ±7 %
 * rule on, the placard speed symbol enforced and no off-road exemption. Illustrative only.
 */
export const stricterRuleSetLimits: RuleSetLimits = {
  ...defaultRuleSetLimits,
  name: 'Stricter example',
  jurisdiction: 'Example jurisdiction (illustrative)',
  placardSpeedSymbolEnforced: {
    enabled: true,
    source: `${STRICTER}: tyres at least the speed symbol on the vehicle's tyre placard.`,
  },
  speedSymbolOffRoadExemption: {
    enabled: false,
    source: `${STRICTER}: no off-road speed-rating exemption.`,
  },
  tyreDiameterIncreaseMaxMm: {
    enabled: true,
    value: 25,
    unit: 'mm',
    source: `${STRICTER}: up to +25 mm over the largest tyre size the maker specifies.`,
  },
  diameterChangeMaxPercent: {
    enabled: true,
    value: 7,
    unit: 'percent',
    source:
      'One state code: overall diameter within ±7 % of the largest specified wheel-and-tyre size (M).',
  },
  suspensionLiftMaxMm: {
    enabled: true,
    value: 40,
    unit: 'mm',
    source: `${STRICTER}: suspension raised or lowered up to 40 mm without certification.`,
  },
  combinedLiftMaxMm: {
    enabled: true,
    value: 50,
    unit: 'mm',
    source: `${STRICTER}: suspension lift plus half the tyre diameter increase up to 50 mm.`,
  },
  trackIncreaseMaxMm: {
    enabled: true,
    value: 20,
    unit: 'mm',
    source: `${STRICTER}: wheel track increase up to +20 mm.`,
  },
  jointAngleThresholdDeg: {
    enabled: true,
    value: 5,
    unit: 'deg',
    source: `${STRICTER}: a diff drop is suggested past 5° of added half-shaft angle.`,
  },
  brakeLineLiftThresholdMm: {
    enabled: true,
    value: 40,
    unit: 'mm',
    source: `${STRICTER}: extended brake lines suggested past a 40 mm lift.`,
  },
};

export interface RuleSetValidationError {
  /** The offending key path, e.g. "suspensionLiftMaxMm.value". */
  key: string;
  message: string;
}

export type ValidateRuleSetResult =
  { ok: true; ruleSet: RuleSetLimits } | { ok: false; errors: RuleSetValidationError[] };

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function validateRule(key: RuleKey, rule: unknown, errors: RuleSetValidationError[]): void {
  const shape = RULE_KEY_SHAPES[key];
  if (!isRecord(rule)) {
    errors.push({ key, message: 'must be an object with enabled and source' });
    return;
  }
  if (typeof rule.enabled !== 'boolean') {
    errors.push({ key: `${key}.enabled`, message: 'must be true or false' });
  }
  if (typeof rule.source !== 'string' || rule.source.trim() === '') {
    errors.push({ key: `${key}.source`, message: "must name the rule's source" });
  }
  if (shape.kind === 'switch') return;
  if (rule.unit !== shape.unit) {
    errors.push({ key: `${key}.unit`, message: `must be "${shape.unit}"` });
  }
  const value = rule.value;
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0) {
    errors.push({ key: `${key}.value`, message: 'must be a number of zero or more' });
  } else if (shape.unit === 'factor' && value < 1) {
    errors.push({ key: `${key}.value`, message: 'a derate factor must be 1 or more' });
  } else if (shape.unit === 'deg' && value >= 90) {
    errors.push({ key: `${key}.value`, message: 'an angle must be below 90°' });
  }
}

/** Check stored or edited rule-set data before the engine uses it. Never throws. */
export function validateRuleSetLimits(value: unknown): ValidateRuleSetResult {
  const errors: RuleSetValidationError[] = [];
  if (!isRecord(value)) {
    return { ok: false, errors: [{ key: '', message: 'a rule set must be an object' }] };
  }
  for (const key of ['name', 'jurisdiction'] as const) {
    if (typeof value[key] !== 'string' || (value[key] as string).trim() === '') {
      errors.push({ key, message: 'must be a non-empty text' });
    }
  }
  for (const key of RULE_KEYS) validateRule(key, value[key], errors);
  for (const key of Object.keys(value)) {
    if (key !== 'name' && key !== 'jurisdiction' && !(key in RULE_KEY_SHAPES)) {
      errors.push({ key, message: 'is not a rule Liftwright knows' });
    }
  }
  // Every key has been checked above, so the value has the RuleSetLimits shape.
  return errors.length === 0
    ? { ok: true, ruleSet: value as unknown as RuleSetLimits }
    : { ok: false, errors };
}
