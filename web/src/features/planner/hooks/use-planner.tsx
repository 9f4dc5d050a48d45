import {
  createContext,
  useCallback,
  useContext,
  useEffect,
  useMemo,
  useRef,
  useState,
  type ReactNode,
} from 'react';
import { useLocation } from 'react-router';
import type {
  AdditionRole,
  PlannerOption,
  ProductKind,
  Quote,
  Role,
  VehicleUse,
} from '@/types/api';
import {
  discardStoredBuild,
  emptyBuild,
  loadStoredBuild,
  saveBuild,
  type BuildCustomer,
  type BuildItem,
  type BuildPhoto,
  type PlannerBuild,
  type PlannerMode,
  type RevisionDraft,
  type StepId,
} from '../forms/build';

export interface PlannerConfig {
  /** localStorage key of this build. */
  storageKey: string;
  /** Where the steps live: "/plan", "/desk/walk-in" or "/desk/quotes/:id/revise". */
  basePath: string;
  /**
   * A customer's own planner, the front desk quoting for a walk-in customer, or the front desk
   * revising a saved quote.
   */
  mode: PlannerMode;
  /** The signed-in user's role; null for a visitor. */
  viewerRole: Role | null;
  /** Where "Back" on the first step goes (the walk-in's customer step); none when absent. */
  firstStepBackHref?: string;
  /** Walk-in quotes: where the customer is chosen; the steps wait until one is. */
  customerStepHref?: string;
  /**
   * The build to start from when nothing usable is stored (a revision starts from the quote's
   * latest version); "Start again" returns to it. Without it, an empty build.
   */
  initialBuild?: PlannerBuild;
  /** Whether a stored build may be resumed (a revision of an older version may not). */
  acceptStored?: (stored: PlannerBuild) => boolean;
  /** Revisions: the quote being revised, as it stands (its latest version is the one replaced). */
  revisedQuote?: Quote;
}

export interface VehicleChoice {
  vehicleModelId: string;
  vehicleName: string;
  make: string;
  year: number | null;
  customerVehicleId: string | null;
}

interface PlannerContextValue {
  build: PlannerBuild;
  config: PlannerConfig;
  /** The address of a step in this planner. */
  stepHref: (step: StepId) => string;
  /** Location key the planner opened on: the first step shown keeps the browser's focus. */
  openedOnKey: string;
  setVehicle: (choice: VehicleChoice) => void;
  setUses: (uses: VehicleUse[]) => void;
  setConstantLoad: (kg: number) => void;
  /** Puts a product of a single kind (kit, wheel, tyre) in place, or none (the standard part). */
  chooseSingle: (kind: ProductKind, option: PlannerOption | null) => void;
  setWheelQuantity: (quantity: 4 | 5) => void;
  setAddOn: (option: PlannerOption, included: boolean, quantity?: number) => void;
  /** Revisions: the quantity of one line, as the desk set it on the review. */
  setItemQuantity: (productId: string, quantity: number) => void;
  /** Revisions: the desk's labour overrides, discount and reason. */
  setRevisionTerms: (
    terms: Pick<RevisionDraft, 'labourOverrides' | 'discountText' | 'reason'>,
  ) => void;
  /** Adds a product the fit report says the package needs, marked as such. */
  includeRequired: (option: PlannerOption, role: AdditionRole, reason: string) => void;
  addPhoto: (photo: BuildPhoto) => void;
  removePhoto: (id: string) => void;
  completeStep: (step: StepId) => void;
  setCustomer: (customer: BuildCustomer | null) => void;
  /** Clears the build (the "Start again" action), keeping the walk-in customer if asked. */
  startAgain: (options?: { keepCustomer?: boolean }) => void;
  /** Forgets the stored build for good (after it has been saved as a quote). */
  discard: () => void;
}

const PlannerContext = createContext<PlannerContextValue | null>(null);

function toItem(option: PlannerOption, quantity: number): BuildItem {
  return {
    productId: option.product.id,
    kind: option.product.kind,
    quantity,
    name: option.product.name,
    brand: option.product.brand,
    priceCents: option.product.priceCents,
    requiredFor: null,
    reason: null,
    labourMinutes: option.product.labourMinutes,
  };
}

/** Steps whose result depends on the kit, wheels and tyres: done again after they change. */
const AFTER_MAIN_PARTS: readonly StepId[] = ['add-ons', 'review'];

export function PlannerProvider({
  config,
  children,
}: {
  config: PlannerConfig;
  children: ReactNode;
}) {
  const [build, setBuild] = useState<PlannerBuild>(() => {
    const stored = loadStoredBuild(config.storageKey);
    if (stored && (config.acceptStored?.(stored) ?? true)) return stored;
    return config.initialBuild ?? emptyBuild();
  });
  const { key } = useLocation();
  const [openedOnKey] = useState(key);
  const discarded = useRef(false);

  useEffect(() => {
    if (!discarded.current) saveBuild(config.storageKey, build);
  }, [build, config.storageKey]);

  const update = useCallback((change: (build: PlannerBuild) => PlannerBuild) => {
    discarded.current = false;
    setBuild(change);
  }, []);

  const value = useMemo<PlannerContextValue>(() => {
    const { basePath } = config;
    return {
      build,
      config,
      openedOnKey,
      stepHref: (step) => `${basePath}/${step}`,
      setVehicle: (choice) =>
        update((current) => {
          const sameModel = current.vehicleModelId === choice.vehicleModelId;
          return {
            ...current,
            ...choice,
            // Products are made for a model: another model starts the parts again.
            items: sameModel ? current.items : [],
            completed: sameModel ? current.completed : [],
          };
        }),
      setUses: (uses) => update((current) => ({ ...current, uses })),
      setConstantLoad: (kg) => update((current) => ({ ...current, constantLoadKg: kg })),
      chooseSingle: (kind, option) =>
        update((current) => {
          const existing = current.items.find((item) => item.kind === kind);
          if ((existing?.productId ?? null) === (option?.product.id ?? null)) return current;
          const quantity = kind === 'suspension-kit' ? 1 : current.wheelQuantity;
          const others = current.items.filter(
            // A change of kit, wheel or tyre may change what the package needs: the required
            // extras are worked out again on the add-ons step.
            (item) => item.kind !== kind && item.requiredFor === null,
          );
          return {
            ...current,
            items: option ? [...others, toItem(option, quantity)] : others,
            completed: current.completed.filter((step) => !AFTER_MAIN_PARTS.includes(step)),
          };
        }),
      setWheelQuantity: (quantity) =>
        update((current) => ({
          ...current,
          wheelQuantity: quantity,
          items: current.items.map((item) =>
            item.kind === 'wheel' || item.kind === 'tyre' ? { ...item, quantity } : item,
          ),
        })),
      setAddOn: (option, included, quantity = 1) =>
        update((current) => {
          const others = current.items.filter((item) => item.productId !== option.product.id);
          return {
            ...current,
            items: included ? [...others, toItem(option, quantity)] : others,
          };
        }),
      setItemQuantity: (productId, quantity) =>
        update((current) => {
          const item = current.items.find((candidate) => candidate.productId === productId);
          if (!item || item.quantity === quantity) return current;
          return {
            ...current,
            items: current.items.map((candidate) =>
              candidate.productId === productId ? { ...candidate, quantity } : candidate,
            ),
          };
        }),
      setRevisionTerms: (terms) =>
        update((current) => {
          if (!current.revision) return current;
          const same =
            current.revision.discountText === terms.discountText &&
            current.revision.reason === terms.reason &&
            JSON.stringify(current.revision.labourOverrides) ===
              JSON.stringify(terms.labourOverrides);
          return same ? current : { ...current, revision: { ...current.revision, ...terms } };
        }),
      includeRequired: (option, role, reason) =>
        update((current) => {
          if (current.items.some((item) => item.productId === option.product.id)) return current;
          return {
            ...current,
            items: [...current.items, { ...toItem(option, 1), requiredFor: role, reason }],
          };
        }),
      addPhoto: (photo) =>
        update((current) => ({ ...current, photos: [...current.photos, photo] })),
      removePhoto: (id) =>
        update((current) => ({
          ...current,
          photos: current.photos.filter((photo) => photo.id !== id),
        })),
      completeStep: (step) =>
        update((current) =>
          current.completed.includes(step)
            ? current
            : { ...current, completed: [...current.completed, step] },
        ),
      setCustomer: (customer) => update((current) => ({ ...current, customer })),
      startAgain: (options) =>
        update((current) =>
          config.initialBuild
            ? config.initialBuild
            : {
                ...emptyBuild(),
                customer: options?.keepCustomer ? current.customer : null,
              },
        ),
      discard: () => {
        discarded.current = true;
        discardStoredBuild(config.storageKey);
      },
    };
  }, [build, config, openedOnKey, update]);

  return <PlannerContext.Provider value={value}>{children}</PlannerContext.Provider>;
}

export function usePlanner(): PlannerContextValue {
  const value = useContext(PlannerContext);
  if (!value) throw new Error('usePlanner is used outside a PlannerProvider.');
  return value;
}
