import * as yup from 'yup';
import type {
  AdditionRole,
  ProductKind,
  Quote,
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

/**
 * The front desk's revision of one quote: a key per quote, apart from the customer's planner and
 * the walk-in quote, so revising never touches either of those builds.
 */
export function reviseStorageKey(quoteId: string): string {
  return `liftwright.revise-build.v1.${quoteId}`;
}

/**
 * Who the planner works for: the customer's own planner, the front desk quoting for a walk-in
 * customer, or the front desk revising a saved quote (a new version of it).
 */
export type PlannerMode = 'customer' | 'walk-in' | 'revise';

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
export function progressSteps(mode: PlannerMode): readonly { id: ProgressStepId; title: string }[] {
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

/** Most workshop minutes per unit the desk may set on a line (a whole day, as the API's limit). */
export const MAX_LABOUR_MINUTES = 1440;

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
  /**
   * Workshop minutes per unit as saved on the quote (or the catalogue's, for a product the
   * revision adds); the default of the desk's labour override. Absent in the customer's build.
   */
  labourMinutes?: number;
}

/** What a revision adds to the build: which quote and version it starts from, and the desk's terms. */
export interface RevisionDraft {
  quoteId: string;
  /** "Q-000123". */
  reference: string;
  /** The version the revision was prefilled from (the latest when it was opened). */
  baseVersionNumber: number;
  /** Per-unit labour minutes the desk set, by product id; absent: the saved value. */
  labourOverrides: Record<string, number>;
  /** The workshop discount as typed, in dollars ("50" or "49.95"); empty for none. */
  discountText: string;
  /** Why the quote is revised, as typed so far. */
  reason: string;
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
  /** Only in the desk's revision of a quote. */
  revision?: RevisionDraft;
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
          labourMinutes: yup.number().integer().min(0).max(MAX_LABOUR_MINUTES).optional(),
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
    revision: yup
      .object({
        quoteId: uuid().required(),
        reference: yup.string().max(40).required(),
        baseVersionNumber: yup.number().integer().min(1).required(),
        labourOverrides: yup
          .mixed<Record<string, number>>()
          .test(
            'minutes-by-product',
            'must map product ids to whole minutes',
            (value) =>
              typeof value === 'object' &&
              value !== null &&
              !Array.isArray(value) &&
              Object.values(value).every(
                (minutes) =>
                  Number.isInteger(minutes) && minutes >= 0 && minutes <= MAX_LABOUR_MINUTES,
              ),
          )
          .required(),
        discountText: yup.string().max(20).defined(),
        reason: yup.string().max(2000).defined(),
      })
      .default(undefined)
      .optional(),
  })
  .noUnknown();

/** Reads a stored build; null when there is none, or it is unreadable or out of date. */
export function loadStoredBuild(storageKey: string): PlannerBuild | null {
  try {
    const text = window.localStorage.getItem(storageKey);
    if (!text) return null;
    const parsed: unknown = JSON.parse(text);
    if (!storedBuildSchema.isValidSync(parsed, { strict: true })) return null;
    const build = parsed as PlannerBuild;
    // Product ids are unique in a package (the API refuses repeats).
    const ids = new Set(build.items.map((item) => item.productId));
    return ids.size === build.items.length ? build : null;
  } catch {
    return null;
  }
}

/** Reads a stored build; a missing, unreadable or out-of-date one gives an empty build. */
export function loadBuild(storageKey: string): PlannerBuild {
  return loadStoredBuild(storageKey) ?? emptyBuild();
}

/** The latest version of a quote (versions come oldest first, but the order is not relied on). */
function latestVersionOf(quote: Quote) {
  return [...quote.versions].sort((a, b) => b.number - a.number)[0];
}

/**
 * The desk's revision of a quote, prefilled from its latest version: the same vehicle, uses and
 * load, every product line still in the catalogue with its quantity and its saved labour
 * minutes, and every step done (the revision opens on the review). Lines whose product has been
 * deleted since cannot be quoted again and are left out.
 */
export function buildFromQuote(quote: Quote): PlannerBuild {
  const version = latestVersionOf(quote);
  const items: BuildItem[] = (version?.lines ?? [])
    .filter((line): line is typeof line & { productId: string } => line.productId !== null)
    .sort((a, b) => a.position - b.position)
    .map((line) => ({
      productId: line.productId,
      kind: line.kind,
      quantity: line.quantity,
      name: line.name,
      brand: line.brand,
      priceCents: line.unitPriceCents,
      requiredFor: null,
      reason: null,
      labourMinutes: line.labourMinutes,
    }));
  const wheelLine = items.find((item) => item.kind === 'wheel' || item.kind === 'tyre');
  return {
    ...emptyBuild(),
    vehicleModelId: quote.vehicle.vehicleModelId,
    vehicleName: quote.vehicle.name,
    year: quote.vehicle.year,
    customerVehicleId: quote.vehicle.customerVehicle?.id ?? null,
    uses: [...quote.uses],
    constantLoadKg: quote.constantLoadKg,
    wheelQuantity: wheelLine?.quantity === 5 ? 5 : 4,
    items,
    completed: [...stepIds],
    customer: { id: quote.customer.id, name: quote.customer.name, email: quote.customer.email },
    revision: {
      quoteId: quote.id,
      reference: quote.reference,
      baseVersionNumber: version?.number ?? 1,
      labourOverrides: {},
      discountText: '',
      reason: '',
    },
  };
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
