/**
 * The facts every check shares, derived once from the input: parsed tyre sizes, their geometry,
 * the fitted wheel, lifts, diff drop and masses.
 */
import type {
  AdditionRole,
  FitmentInput,
  StockWheelSpec,
  TyreSpec,
  VehicleSpec,
} from './fitment.types';
import { type TyreDesignationError, type TyreSize, parseTyreDesignation } from './tyre-designation';
import { type TyreGeometry, tyreGeometry } from './tyre-geometry';

export interface DesignationProblem {
  /** Which tyre the designation belongs to. */
  which: 'new tyre' | 'stock tyre' | 'largest specified tyre';
  designation: string;
  error: TyreDesignationError;
}

export interface ParsedTyre {
  size: TyreSize;
  geometry: TyreGeometry;
}

export interface FitmentContext {
  input: FitmentInput;
  vehicle: VehicleSpec;
  designationProblems: DesignationProblem[];
  stockTyre: ParsedTyre | null;
  largestSpecifiedTyre: ParsedTyre | null;
  /** The replacement tyre when one is given and readable. */
  newTyre: ParsedTyre | null;
  newTyreSpec: TyreSpec | null;
  /** The tyre that will be on the vehicle: the new one, or the stock one when none is given. Null when unreadable. */
  fittedTyre: ParsedTyre | null;
  /** A replacement tyre was given (readable or not). */
  tyreReplaced: boolean;
  /** The replacement tyre's dimensions differ from the stock tyre's. */
  tyreSizeChanged: boolean;
  /**
   * Base of the diameter rules: the larger of the stock tyre and the largest specified tyre, mm
   * (the largest tyre the maker specifies; the stock tyre when none is recorded).
   */
  ruleBaseDiameterMm: number | null;
  /** Smaller of the stock and largest specified diameters, mm: the base of the decrease rule. */
  smallestSpecifiedDiameterMm: number | null;
  /** A replacement wheel was given. */
  wheelReplaced: boolean;
  /** Position of the wheel that will be fitted (new or stock). */
  fittedWheel: StockWheelSpec;
  frontLiftMm: number;
  rearLiftMm: number;
  /** The larger of the front and rear suspension lifts, mm (0 without a kit). */
  suspensionLiftMm: number;
  /** Sum of the diff drops in the package, mm. */
  diffDropMm: number;
  declaredLoadKg: number;
  /** Accessories declared in usage plus the mass of the package's components, kg. */
  accessoriesMassKg: number;
  occupantCount: number;
  /** Roles already in the package: suggestions for them are not repeated. */
  includedRoles: ReadonlySet<AdditionRole | 'accessory'>;
}

const SAME_DIAMETER_TOLERANCE_MM = 0.05;

function readTyre(
  designation: string,
  which: DesignationProblem['which'],
  problems: DesignationProblem[],
): ParsedTyre | null {
  const parsed = parseTyreDesignation(designation);
  if (!parsed.ok) {
    problems.push({ which, designation, error: parsed.error });
    return null;
  }
  return { size: parsed.size, geometry: tyreGeometry(parsed.size) };
}

export function buildFitmentContext(input: FitmentInput): FitmentContext {
  const { vehicle } = input;
  const designationProblems: DesignationProblem[] = [];
  const stockTyre = readTyre(vehicle.stockTyre, 'stock tyre', designationProblems);
  const largestSpecifiedTyre =
    vehicle.largestSpecifiedTyre === undefined
      ? null
      : readTyre(vehicle.largestSpecifiedTyre, 'largest specified tyre', designationProblems);
  const newTyre = input.tyre
    ? readTyre(input.tyre.designation, 'new tyre', designationProblems)
    : null;
  const tyreReplaced = input.tyre !== undefined;
  const fittedTyre = tyreReplaced ? newTyre : stockTyre;

  const specifiedDiametersMm = [stockTyre, largestSpecifiedTyre]
    .filter((tyre): tyre is ParsedTyre => tyre !== null)
    .map((tyre) => tyre.geometry.overallDiameterMm);
  const ruleBaseDiameterMm = stockTyre === null ? null : Math.max(...specifiedDiametersMm);
  const smallestSpecifiedDiameterMm = stockTyre === null ? null : Math.min(...specifiedDiametersMm);

  const tyreSizeChanged =
    newTyre !== null &&
    (stockTyre === null ||
      Math.abs(newTyre.geometry.overallDiameterMm - stockTyre.geometry.overallDiameterMm) >
        SAME_DIAMETER_TOLERANCE_MM ||
      Math.abs(newTyre.geometry.sectionWidthMm - stockTyre.geometry.sectionWidthMm) >
        SAME_DIAMETER_TOLERANCE_MM);

  const kit = input.suspensionKit;
  const frontLiftMm = kit?.frontLiftMm ?? 0;
  const rearLiftMm = kit?.rearLiftMm ?? 0;
  const components = input.components ?? [];

  return {
    input,
    vehicle,
    designationProblems,
    stockTyre,
    largestSpecifiedTyre,
    newTyre,
    newTyreSpec: input.tyre ?? null,
    fittedTyre,
    tyreReplaced,
    tyreSizeChanged,
    ruleBaseDiameterMm,
    smallestSpecifiedDiameterMm,
    wheelReplaced: input.wheel !== undefined,
    fittedWheel: input.wheel
      ? {
          diameterIn: input.wheel.diameterIn,
          widthIn: input.wheel.widthIn,
          offsetMm: input.wheel.offsetMm,
        }
      : vehicle.stockWheel,
    frontLiftMm,
    rearLiftMm,
    suspensionLiftMm: Math.max(frontLiftMm, rearLiftMm, 0),
    diffDropMm: components
      .filter((component) => component.role === 'diff-drop')
      .reduce((sumMm, component) => sumMm + (component.diffDropMm ?? 0), 0),
    declaredLoadKg: input.usage?.constantLoadKg ?? 0,
    accessoriesMassKg:
      (input.usage?.accessoriesMassKg ?? 0) +
      components.reduce((sumKg, component) => sumKg + (component.massKg ?? 0), 0),
    occupantCount: input.usage?.occupantCount ?? 1,
    includedRoles: new Set(components.map((component) => component.role)),
  };
}

/** Tyre diameter increase over the rule's base, mm (null when either is unknown). */
export function diameterIncreaseOverRuleBaseMm(context: FitmentContext): number | null {
  if (context.newTyre === null || context.ruleBaseDiameterMm === null) return null;
  return context.newTyre.geometry.overallDiameterMm - context.ruleBaseDiameterMm;
}

/** Physical diameter change of the fitted tyre against stock, mm (0 when the stock tyre stays). */
export function diameterChangeOverStockMm(context: FitmentContext): number | null {
  if (context.fittedTyre === null || context.stockTyre === null) return null;
  return (
    context.fittedTyre.geometry.overallDiameterMm - context.stockTyre.geometry.overallDiameterMm
  );
}

/** Suspension lift plus half the tyre diameter increase over the rule's base (increases only). */
export function combinedLiftMm(context: FitmentContext): number {
  const increaseMm = diameterIncreaseOverRuleBaseMm(context) ?? 0;
  return context.suspensionLiftMm + Math.max(0, increaseMm) / 2;
}
