/**
 * Payloads of the Liftwright HTTP API, as the client sees them. This is the only place these
 * types are written down; it may later be replaced by a file generated from /api/docs-json.
 */

// ---- Errors ------------------------------------------------------------------------------

/** Every non-2xx response has this shape. */
export interface ApiErrorBody {
  statusCode: number;
  error: string;
  message: string;
  /** Present only for validation errors, keyed by DTO property ("a.b" when nested). */
  fieldErrors?: Record<string, string[]>;
  requestId?: string;
}

// ---- Auth --------------------------------------------------------------------------------

export type Role = 'customer' | 'desk' | 'tech' | 'manager';

export interface User {
  id: string;
  email: string;
  name: string;
  role: Role;
}

export interface CsrfTokenResponse {
  csrfToken: string;
}

export interface MeResponse {
  user: User;
}

/** Answer of sign-in and register: the signed-in user and the session's new CSRF token. */
export interface AuthSessionResponse {
  user: User;
  csrfToken: string;
}

export interface SignInRequest {
  email: string;
  password: string;
}

export interface RegisterRequest {
  email: string;
  /** 8..128 characters. */
  password: string;
  /** 1..100 characters. */
  name: string;
}

export interface PasswordResetRequest {
  email: string;
}

export interface PasswordResetConfirmRequest {
  token: string;
  /** 8..128 characters. */
  password: string;
}

// ---- Staff (manager only) ----------------------------------------------------------------

export type StaffRole = Exclude<Role, 'customer'>;

export interface StaffMember {
  id: string;
  email: string;
  name: string;
  role: StaffRole;
  active: boolean;
  /** ISO 8601 instant (UTC). */
  createdAt: string;
}

export interface StaffListResponse {
  items: StaffMember[];
}

export interface CreateStaffRequest {
  email: string;
  /** 1..100 characters. */
  name: string;
  role: StaffRole;
  /** 8..128 characters. */
  password: string;
}

export interface UpdateStaffRequest {
  name?: string;
  role?: StaffRole;
  active?: boolean;
}

// ---- Vehicle models (GET public; POST/PATCH manager) ---------------------------------------

export type BodyType = 'ute' | 'wagon';
export type FrontSuspensionKind = 'independent' | 'solid-axle';
export type RearSuspensionKind = 'leaf' | 'coil' | 'independent';

export interface StockWheel {
  diameterIn: number;
  widthIn: number;
  offsetMm: number;
}

/** A vehicle model's spec sheet: what the fit report checks a package against. */
export interface VehicleModel {
  id: string;
  make: string;
  model: string;
  variant: string;
  yearFrom: number;
  yearTo: number;
  bodyType: BodyType;
  frontSuspension: FrontSuspensionKind;
  rearSuspension: RearSuspensionKind;
  /** Stud count x pitch circle diameter in mm, e.g. "6x139.7". */
  boltPattern: string;
  /** Metric wheel-nut thread, e.g. "M12x1.5". */
  studThread: string;
  centreBoreMm: number;
  /** Tyre designation with service description, e.g. "265/65R17 112S". */
  stockTyre: string;
  largestSpecifiedTyre: string | null;
  stockWheel: StockWheel;
  gvmKg: number;
  frontAxleKg: number;
  rearAxleKg: number;
  kerbMassKg: number;
  placardLoadIndex: number;
  placardSpeedSymbol: string;
  frontHalfShaftLengthMm: number | null;
  offRoadCategory: boolean;
  topSpeedKmh: number | null;
}

export type VehicleModelSpec = Omit<VehicleModel, 'id'>;

export interface VehicleModelListResponse {
  items: VehicleModel[];
}

export interface VehicleModelQuery {
  q?: string;
  make?: string;
  year?: number;
}

export type CreateVehicleModelRequest = VehicleModelSpec;
export type UpdateVehicleModelRequest = Partial<VehicleModelSpec>;

// ---- Products (GET public, includeInactive for managers; POST/PATCH manager) --------------

export type ProductKind = 'wheel' | 'tyre' | 'suspension-kit' | 'component' | 'service';
export type BayKind = 'hoist' | 'alignment' | 'tyre';
export type TreadType = 'highway' | 'all-terrain' | 'mud-terrain';
export type ComponentRole =
  | 'diff-drop'
  | 'greasable-shackles'
  | 'extended-brake-lines'
  | 'steering-damper'
  | 'hub-rings'
  | 'accessory';
export type ServiceRole =
  | 'alignment'
  | 'fitting-balancing'
  | 'tyre-disposal'
  | 'headlight-re-aim'
  | 'speedometer-recalibration';

export interface WheelAttributes {
  diameterIn: number;
  widthIn: number;
  offsetMm: number;
  boltPattern: string;
  centreBoreMm: number;
  studThread: string;
  loadRatingKg: number;
}

export interface TyreAttributes {
  designation: string;
  treadType: TreadType;
  approvedRimWidthMinIn?: number;
  approvedRimWidthMaxIn?: number;
}

export interface SuspensionKitAttributes {
  frontLiftMm: number;
  rearLiftMm: number;
  constantLoadMinKg: number;
  constantLoadMaxKg: number;
  keepsTwoThirdsTravel: boolean;
  includesGreasableShackles: boolean;
  includesExtendedBrakeLines: boolean;
}

export interface ComponentAttributes {
  role: ComponentRole;
  diffDropMm?: number;
  massKg?: number;
}

export interface ServiceAttributes {
  role: ServiceRole;
  perWheel: boolean;
}

export interface ProductAttributesByKind {
  wheel: WheelAttributes;
  tyre: TyreAttributes;
  'suspension-kit': SuspensionKitAttributes;
  component: ComponentAttributes;
  service: ServiceAttributes;
}

export type ProductAttributes = ProductAttributesByKind[ProductKind];

export interface Product {
  id: string;
  sku: string;
  kind: ProductKind;
  name: string;
  brand: string;
  description: string;
  /** Price including tax, integer cents. */
  priceCents: number;
  labourMinutes: number;
  /** The bay its labour is done in; null for no bay time. */
  bayKind: BayKind | null;
  stockQty: number;
  /** Days to get it in when out of stock. */
  leadDays: number;
  active: boolean;
  /** Vehicle models it is made for; empty: any vehicle. */
  fitsVehicleModelIds: string[];
  attributes: ProductAttributes;
}

export type FitVerdict = 'does-not-fit' | 'needs-certification' | 'advisory' | 'ok';

/** A list item; `fit` only when the list was asked for with a vehicleModelId. */
export interface ProductWithFit extends Product {
  fit?: { verdict: FitVerdict; summary: string };
}

export interface ProductListResponse {
  items: ProductWithFit[];
}

export interface ProductQuery {
  vehicleModelId?: string;
  kind?: ProductKind;
  q?: string;
  /** Managers only. */
  includeInactive?: boolean;
}

export interface CreateProductRequest {
  sku: string;
  kind: ProductKind;
  name: string;
  brand: string;
  description?: string;
  priceCents: number;
  labourMinutes?: number;
  bayKind?: BayKind | null;
  stockQty?: number;
  leadDays?: number;
  active?: boolean;
  fitsVehicleModelIds?: string[];
  attributes: ProductAttributes;
}

export type UpdateProductRequest = Partial<CreateProductRequest>;

// ---- Catalogue CSV (manager) ---------------------------------------------------------------

export type ImportRowStatus = 'new' | 'updated' | 'unchanged' | 'rejected';

export interface ImportSummary {
  new: number;
  updated: number;
  unchanged: number;
  rejected: number;
}

export interface ImportFieldChange {
  /** Stored value (product field, e.g. priceCents in cents). */
  from: unknown;
  /** Value from the file. */
  to: unknown;
}

export interface ImportRow {
  /** Line of the file (the header is line 1). */
  line: number;
  /** As written in the file. */
  sku: string;
  status: ImportRowStatus;
  /** Rejected rows: why. */
  reason?: string;
  /** Updated rows: each changed product field (API field names). */
  changes?: Record<string, ImportFieldChange>;
}

export interface ImportPreviewResponse {
  summary: ImportSummary;
  rows: ImportRow[];
}

/** What apply wrote. The contract promises the summary; the rows may come too. */
export interface ImportApplyResponse {
  summary: ImportSummary;
  rows?: ImportRow[];
}

// ---- Rule sets (GET manager, desk; PATCH manager) ------------------------------------------

export interface RuleLimit {
  /** false: the rule is switched off and its check does not run. */
  enabled: boolean;
  /** null for a switch (a rule without a number). */
  value: number | null;
  unit: string | null;
  /** The rule's published source, quoted in the fit report. */
  source: string;
  label: string;
}

export interface RuleSet {
  id: string;
  name: string;
  jurisdiction: string;
  description: string;
  isDefault: boolean;
  /** Every rule key, in report order. */
  limits: Record<string, RuleLimit>;
}

export interface RuleSetListResponse {
  items: RuleSet[];
}

export interface RuleLimitChange {
  enabled?: boolean;
  value?: number;
}

export interface UpdateRuleSetRequest {
  limits: Record<string, RuleLimitChange>;
}
