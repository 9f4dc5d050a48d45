import * as yup from 'yup';
import type {
  AdditionRole,
  ProductKind,
  QuotePackageItem,
  QuotePackageRequest,
  UploadKind,
  VehicleUse,
} from '@/types/api';

/**
 * The build a customer (or the front desk, for a walk-in) puts together in the planner. It lives
 * in localStorage so a reload, or a detour to register, keeps it. The stored shape is versioned
 * and checked on load: anything that does not match starts a fresh build.
 */
export const BUILD_VERSION = 1;

/** The customer's own planner. */
export const PLANNER_STORAGE_KEY = 'liftwright.build.v1';
/** The front desk's walk-in quote: kept apart, so a shared counter never mixes the two. */
export const WALK_IN_STORAGE_KEY = 'liftwright.walk-in-build.v1';

export const plannerSteps = [
  { id: 'vehicle', title: 'Your vehicle' },
  { id: 'use', title: 'How you use it' },
  { id: 'lift', title: 'Lift & suspension' },
  { id: 'wheels', title: 'Wheels & tyres' },
  { id: 'add-ons', title: 'Add-ons' },
  { id: 'review', title: 'Review & save' },
] as const;

export type StepId = (typeof plannerSteps)[number]['id'];

/**
 * The customer's planner goes on after the review: once the quote is saved, a time in the
 * workshop is booked for it. It has its own address with the quote's id (/plan/book/:quoteId)
 * and is not part of the build, so it is shown in the progress but never "opened" from it.
 */
export const bookStep = { id: 'book', title: 'Book a time' } as const;

/** A step the progress shows: a step of the build, or the booking after it. */
export type ProgressStepId = StepId | typeof bookStep.id;

/** The steps the progress shows: the walk-in quote at the desk ends with the review. */
export function progressSteps(
  mode: 'customer' | 'walk-in',
): readonly { id: ProgressStepId; title: string }[] {
  return mode === 'customer' ? [...plannerSteps, bookStep] : plannerSteps;
}

export const stepIds: readonly StepId[] = plannerSteps.map((step) => step.id);

export const vehicleUses: readonly VehicleUse[] = ['daily', 'touring', 'towing', 'off-road'];

export const useLabels: Record<VehicleUse, string> = {
  daily: 'Daily driving',
  touring: 'Touring',
  towing: 'Towing',
  'off-road': 'Off-road',
};

export const MAX_CONSTANT_LOAD_KG = 3000;

/** Kinds a package holds at most one of; the planner replaces rather than adds them. */
export const singleKinds: readonly ProductKind[] = ['suspension-kit', 'wheel', 'tyre'];

/** One product in the build, with what the planner shows about it without asking again. */
export interface BuildItem {
  productId: string;
  kind: ProductKind;
  quantity: number;
  name: string;
  brand: string;
  priceCents: number;
  /** Set when the add-ons step included it because the fit report says the package needs it. */
  requiredFor: AdditionRole | null;
  /** The fit report's reason, kept with a required item. */
  reason: string | null;
}

export interface BuildPhoto {
  id: string;
  kind: UploadKind;
  thumbnailUrl: string;
}

/** The walk-in customer the front desk is quoting for. */
export interface BuildCustomer {
  id: string;
  name: string;
  email: string;
}

export interface PlannerBuild {
  version: typeof BUILD_VERSION;
  vehicleModelId: string | null;
  /** "Vantrel Strata SR dual cab", for the summary. */
  vehicleName: string | null;
  make: string | null;
  year: number | null;
  customerVehicleId: string | null;
  uses: VehicleUse[];
  constantLoadKg: number;
  /** Wheels and tyres come as four (the road wheels) or five (with the spare). */
  wheelQuantity: 4 | 5;
  items: BuildItem[];
  photos: BuildPhoto[];
  /** Steps the user has finished with "Next". */
  completed: StepId[];
  customer: BuildCustomer | null;
}

export function emptyBuild(): PlannerBuild {
  return {
    version: BUILD_VERSION,
    vehicleModelId: null,
    vehicleName: null,
    make: null,
    year: null,
    customerVehicleId: null,
    uses: [],
    constantLoadKg: 0,
    wheelQuantity: 4,
    items: [],
    photos: [],
    completed: [],
    customer: null,
  };
}

const productKinds: readonly ProductKind[] = [
  'wheel',
  'tyre',
  'suspension-kit',
  'component',
  'service',
];
const additionRoles: readonly AdditionRole[] = [
  'diff-drop',
  'alignment',
  'hub-rings',
  'greasable-shackles',
  'extended-brake-lines',
  'steering-damper',
  'headlight-re-aim',
  'speedometer-recalibration',
  'spring-rating',
];
const uploadKinds: readonly UploadKind[] = ['vehicle', 'tyre-placard'];

const uuid = () => yup.string().uuid();

/** What a stored build must look like to be used (limits as the API's QuotePackageDto). */
const storedBuildSchema = yup
  .object({
    version: yup.number().oneOf([BUILD_VERSION]).required(),
    vehicleModelId: uuid().nullable().defined(),
    vehicleName: yup.string().max(200).nullable().defined(),
    make: yup.string().max(100).nullable().defined(),
    year: yup.number().integer().min(1950).max(2100).nullable().defined(),
    customerVehicleId: uuid().nullable().defined(),
    uses: yup.array(yup.string().oneOf(vehicleUses).required()).max(vehicleUses.length).required(),
    constantLoadKg: yup.number().integer().min(0).max(MAX_CONSTANT_LOAD_KG).required(),
    wheelQuantity: yup.number().oneOf([4, 5]).required(),
    items: yup
      .array(
        yup.object({
          productId: uuid().required(),
          kind: yup.string().oneOf(productKinds).required(),
          quantity: yup.number().integer().min(1).max(24).required(),
          name: yup.string().max(300).required(),
          brand: yup.string().max(200).defined(),
          priceCents: yup.number().integer().min(0).required(),
          requiredFor: yup.string().oneOf(additionRoles).nullable().defined(),
          reason: yup.string().max(1000).nullable().defined(),
        }),
      )
      .max(30)
      .required(),
    photos: yup
      .array(
        yup.object({
          id: uuid().required(),
          kind: yup.string().oneOf(uploadKinds).required(),
          thumbnailUrl: yup
            .string()
            .matches(/^\/api\/uploads\//)
            .required(),
        }),
      )
      .max(20)
      .required(),
    completed: yup.array(yup.string().oneOf(stepIds).required()).required(),
    customer: yup
      .object({
        id: uuid().required(),
        name: yup.string().max(200).required(),
        email: yup.string().max(254).required(),
      })
      .nullable()
      .defined(),
  })
  .noUnknown();

/** Reads a stored build; a missing, unreadable or out-of-date one gives an empty build. */
export function loadBuild(storageKey: string): PlannerBuild {
  try {
    const text = window.localStorage.getItem(storageKey);
    if (!text) return emptyBuild();
    const parsed: unknown = JSON.parse(text);
    if (!storedBuildSchema.isValidSync(parsed, { strict: true })) return emptyBuild();
    const build = parsed as PlannerBuild;
    // Product ids are unique in a package (the API refuses repeats).
    const ids = new Set(build.items.map((item) => item.productId));
    return ids.size === build.items.length ? build : emptyBuild();
  } catch {
    return emptyBuild();
  }
}

export function saveBuild(storageKey: string, build: PlannerBuild): void {
  try {
    window.localStorage.setItem(storageKey, JSON.stringify(build));
  } catch {
    // Private browsing or a full quota: the build still works for this visit.
  }
}

export function discardStoredBuild(storageKey: string): void {
  try {
    window.localStorage.removeItem(storageKey);
  } catch {
    // Nothing stored that can be removed.
  }
}

export function itemOfKind(build: PlannerBuild, kind: ProductKind): BuildItem | undefined {
  return build.items.find((item) => item.kind === kind);
}

/** The selection as the API takes it, in a stable order (so query keys do not churn). */
export function packageItems(items: readonly BuildItem[]): QuotePackageItem[] {
  return items
    .map((item) => ({ productId: item.productId, quantity: item.quantity }))
    .sort((a, b) => a.productId.localeCompare(b.productId));
}

/** The build as a QuotePackageDto, for the preview and for saving. */
export function toPackage(build: PlannerBuild): QuotePackageRequest | null {
  if (!build.vehicleModelId) return null;
  return {
    vehicleModelId: build.vehicleModelId,
    ...(build.customerVehicleId ? { customerVehicleId: build.customerVehicleId } : {}),
    ...(build.year !== null ? { vehicleYear: build.year } : {}),
    uses: build.uses,
    constantLoadKg: build.constantLoadKg,
    items: packageItems(build.items),
  };
}

/** The first step the user has not finished (the review once every step is done). */
export function firstOpenStep(build: PlannerBuild): StepId {
  return stepIds.find((step) => !build.completed.includes(step)) ?? 'review';
}

/** A step may be shown once every step before it is finished. */
export function canOpenStep(build: PlannerBuild, step: StepId): boolean {
  const index = stepIds.indexOf(step);
  return stepIds.slice(0, index).every((earlier) => build.completed.includes(earlier));
}

/** Where a step stands in the progress (the booking comes after every step of the build). */
export function stepIndex(step: ProgressStepId): number {
  return step === bookStep.id ? stepIds.length : stepIds.indexOf(step);
}

export function stepTitle(step: ProgressStepId): string {
  return step === bookStep.id ? bookStep.title : plannerSteps[stepIndex(step)].title;
}
