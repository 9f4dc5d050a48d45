/**
 * The API's payload types, under the names the web app uses. Every shape comes from
 * ./api.generated.ts, which is generated from the API's OpenAPI document
 * (`npm run openapi:types`; a test fails when it is stale). Only query strings and a few
 * derived conveniences are written here.
 */
import type { components } from './api.generated';

type Schemas = components['schemas'];

// ---- Errors and auth -----------------------------------------------------------------------
export type ApiErrorBody = Schemas['ErrorResponse'];
export type Role = Schemas['Role'];
export type User = Schemas['UserResponse'];
export type CsrfTokenResponse = Schemas['CsrfTokenResponse'];
export type MeResponse = Schemas['MeResponse'];
export type AuthSessionResponse = Schemas['AuthSessionResponse'];
export type SignInRequest = Schemas['SignInDto'];
export type RegisterRequest = Schemas['RegisterDto'];
export type PasswordResetRequest = Schemas['RequestPasswordResetDto'];
export type PasswordResetConfirmRequest = Schemas['ConfirmPasswordResetDto'];

// ---- Staff ---------------------------------------------------------------------------------
export type StaffRole = Schemas['StaffRole'];
export type StaffMember = Schemas['StaffMemberResponse'];
export type StaffListResponse = Schemas['StaffListResponse'];
export type CreateStaffRequest = Schemas['CreateStaffMemberDto'];
export type UpdateStaffRequest = Schemas['UpdateStaffMemberDto'];

// ---- Vehicle models ------------------------------------------------------------------------
export type BodyType = Schemas['BodyType'];
export type FrontSuspensionKind = Schemas['FrontSuspensionKind'];
export type RearSuspensionKind = Schemas['RearSuspensionKind'];
export type StockWheel = Schemas['StockWheelResponse'];
export type SpeedSymbol = Schemas['SpeedSymbol'];
export type VehicleModel = Schemas['VehicleModelResponse'];
export type VehicleModelSpec = Omit<VehicleModel, 'id'>;
export type VehicleModelListResponse = Schemas['VehicleModelListResponse'];
export type CreateVehicleModelRequest = Schemas['CreateVehicleModelDto'];
export type UpdateVehicleModelRequest = Schemas['UpdateVehicleModelDto'];

/** GET /api/vehicle-models query string. */
export interface VehicleModelQuery {
  q?: string;
  make?: string;
  year?: number;
}

// ---- Products ------------------------------------------------------------------------------
export type ProductKind = Schemas['ProductKind'];
export type BayKind = Schemas['BayKind'];
export type TreadType = Schemas['TreadType'];
export type ComponentRole = Schemas['ComponentRole'];
export type ServiceRole = Schemas['ServiceRole'];
export type WheelAttributes = Schemas['WheelAttributesDto'];
export type TyreAttributes = Schemas['TyreAttributesDto'];
export type SuspensionKitAttributes = Schemas['SuspensionKitAttributesDto'];
export type ComponentAttributes = Schemas['ComponentAttributesDto'];
export type ServiceAttributes = Schemas['ServiceAttributesDto'];

export interface ProductAttributesByKind {
  wheel: WheelAttributes;
  tyre: TyreAttributes;
  'suspension-kit': SuspensionKitAttributes;
  component: ComponentAttributes;
  service: ServiceAttributes;
}

export type ProductAttributes = ProductAttributesByKind[ProductKind];
export type Product = Schemas['ProductResponse'];
export type FitVerdict = Schemas['FitVerdict'];
export type ProductWithFit = Schemas['ProductWithFitResponse'];
export type ProductListResponse = Schemas['ProductListResponse'];
export type CreateProductRequest = Schemas['CreateProductDto'];
export type UpdateProductRequest = Schemas['UpdateProductDto'];

/** GET /api/products query string. */
export interface ProductQuery {
  vehicleModelId?: string;
  kind?: ProductKind;
  q?: string;
  /** Managers only. */
  includeInactive?: boolean;
}

// ---- Catalogue CSV -------------------------------------------------------------------------
export type ImportRowStatus = Schemas['ImportRowStatus'];
export type ImportSummary = Schemas['ImportSummaryResponse'];
/** The document describes `from`/`to` as free-form values; they are any JSON value. */
export type ImportFieldChange = Omit<Schemas['FieldChangeResponse'], 'from' | 'to'> & {
  from: unknown;
  to: unknown;
};
export type ImportRow = Omit<Schemas['ImportRowResponse'], 'changes'> & {
  changes?: Record<string, ImportFieldChange>;
};
export type ImportPreviewResponse = Omit<Schemas['ImportPreviewResponse'], 'rows'> & {
  rows: ImportRow[];
};
export type ImportApplyResponse = Omit<Schemas['ImportApplyResponse'], 'rows'> & {
  rows: ImportRow[];
};

// ---- Rule sets -----------------------------------------------------------------------------
export type RuleLimit = Schemas['RuleLimitResponse'];
export type RuleSet = Schemas['RuleSetResponse'];
export type RuleSetListResponse = Schemas['RuleSetListResponse'];
export type RuleLimitChange = Schemas['RuleLimitPatch'];
export type UpdateRuleSetRequest = Schemas['UpdateRuleSetDto'];

// ---- Vehicle makes and the customer's own vehicles ----------------------------------------
export type VehicleMakesResponse = Schemas['VehicleMakesResponse'];
export type CustomerVehicle = Schemas['CustomerVehicleResponse'];
export type CustomerVehicleListResponse = Schemas['CustomerVehicleListResponse'];

// ---- Fit report ----------------------------------------------------------------------------
export type FitReport = Schemas['FitReportResponse'];
export type FitCheck = Schemas['FitCheckResponse'];
export type FitCheckCode = Schemas['FitCheckCode'];
export type SkippedCheck = Schemas['SkippedCheckResponse'];
export type FitMetrics = Schemas['FitMetricsResponse'];
export type AdditionRole = Schemas['AdditionRole'];
export type SuggestedAddition = Schemas['SuggestedAdditionResponse'];
export type Caution = Schemas['CautionResponse'];

// ---- Workshop and policies ---------------------------------------------------------------
export type WorkshopCard = Schemas['WorkshopCardResponse'];
export type TaxRoundingMethod = Schemas['TaxRoundingMethod'];
export type Policy = Schemas['PolicyResponse'];
export type UpdatePolicyRequest = Schemas['UpdatePolicyDto'];

// ---- Planner and quotes --------------------------------------------------------------------
export type VehicleUse = Schemas['VehicleUse'];
export type QuotePackageItem = Schemas['QuoteItemDto'];
export type QuotePackageRequest = Schemas['QuotePackageDto'];
export type PlannerOptionsRequest = Schemas['PlannerOptionsDto'];
export type PlannerOptionMetrics = Schemas['PlannerOptionMetricsResponse'];
export type PlannerOption = Schemas['PlannerOptionResponse'];
export type PlannerOptionsResponse = Schemas['PlannerOptionsResponse'];
export type PricedLineKind = Schemas['PricedLineKind'];
/** One priced line; the fields after `taxCents` depend on the kind. */
export type PricedLine = Schemas['PricedLineResponse'];
export type PackagePrice = Schemas['PackagePriceResponse'];
export type QuotePreview = Schemas['QuotePreviewResponse'];
export type CreateQuoteRequest = Schemas['CreateQuoteDto'];
export type QuoteVersionState = Schemas['QuoteVersionState'];
export type QuoteCustomer = Schemas['QuoteCustomerResponse'];
export type QuoteSummary = Schemas['QuoteSummaryResponse'];
export type QuoteListResponse = Schemas['QuoteListResponse'];
export type QuoteLine = Schemas['QuoteLineResponse'];
export type QuotePhoto = Schemas['QuotePhotoResponse'];
export type QuoteVersion = Schemas['QuoteVersionResponse'];
export type Quote = Schemas['QuoteResponse'];
/** One product of a revision, with the desk's per-unit labour minutes when they differ. */
export type RevisionItem = Schemas['RevisionItemDto'];
/** POST /api/quotes/:id/revisions (desk): the quote's next version, with the reason. */
export type ReviseQuoteRequest = Schemas['ReviseQuoteDto'];
/** POST /api/quotes/:id/revisions/preview: the same, the reason optional. */
export type RevisionPreviewRequest = Schemas['RevisionPreviewDto'];

/** GET /api/quotes query string (staff). */
export interface QuoteQuery {
  customerId?: string;
  q?: string;
}

// ---- Photos --------------------------------------------------------------------------------
export type UploadKind = Schemas['UploadKind'];
export type Upload = Schemas['UploadResponse'];
export type UploadListResponse = Schemas['UploadListResponse'];

// ---- Customers (front desk) ----------------------------------------------------------------
export type Customer = Schemas['CustomerResponse'];
export type CustomerListResponse = Schemas['CustomerListResponse'];
export type CreateCustomerRequest = Schemas['CreateCustomerDto'];

// ---- Availability and bookings -------------------------------------------------------------
export type BookingState = Schemas['BookingState'];
export type JobSegment = Schemas['JobSegmentResponse'];
export type JobPlan = Schemas['JobPlanResponse'];
/** One stay in one bay, in UTC and in the workshop's zone. */
export type PlannedSegment = Schemas['PlannedSegmentResponse'];
/** A booked segment: the bay's time and the work done in it. */
export type BookingSegment = Schemas['BookingSegmentResponse'];
/** One start time on offer, with every segment it books. */
export type StartOption = Schemas['StartOptionResponse'];
export type AvailabilityDay = Schemas['AvailabilityDayResponse'];
export type Availability = Schemas['AvailabilityResponse'];
export type BookingQuoteSummary = Schemas['BookingQuoteSummaryResponse'];
export type BookingMoveRequest = Schemas['MoveRequestResponse'];
/** Set when an accepted revision no longer fits the booked time: why, and since when. */
export type BookingNeedsMove = Schemas['NeedsMoveResponse'];
export type BookingEventKind = Schemas['BookingEventKind'];
/** One line of a booking's audit trail (UTC time, who, what). */
export type BookingEvent = Schemas['BookingEventResponse'];
export type Booking = Schemas['BookingResponse'];
export type BookingListResponse = Schemas['BookingListResponse'];
/** 409 from creating or moving a booking: why, and the next starts that are free. */
export type BookingConflict = Schemas['BookingConflictResponse'];
export type CreateBookingRequest = Schemas['CreateBookingDto'];
export type MoveBookingRequest = Schemas['MoveBookingDto'];
export type AskToMoveRequest = Schemas['MoveRequestDto'];
export type AdvanceBookingRequest = Schemas['AdvanceBookingDto'];

// ---- Deposits and refunds ------------------------------------------------------------------
/** One payment of a booking (a deposit or a top-up), as the provider reported it. */
export type BookingPayment = Schemas['BookingPaymentResponse'];
export type PaymentKind = Schemas['PaymentKind'];
export type PaymentStatus = Schemas['PaymentStatus'];
/** The workshop's cancellation rule, and what cancelling this booking now would refund. */
export type CancellationPolicy = Schemas['CancellationPolicyResponse'];
/** 201 from POST /api/bookings/:id/deposit-checkout: where to pay, and the booking held on. */
export type DepositCheckout = Schemas['DepositCheckoutResponse'];

/** GET /api/availability query string. */
export interface AvailabilityQuery {
  quoteVersionId: string;
  /** Workshop-local date YYYY-MM-DD; the API's default is the workshop's today. */
  from?: string;
  /** 1 to 31. */
  days?: number;
}

// ---- Workshop set-up (Manage → Workshop) ---------------------------------------------------
export type WorkshopSetup = Schemas['WorkshopSetupResponse'];
export type Bay = Schemas['BayResponse'];
export type OpeningHoursEntry = Schemas['OpeningHoursEntryResponse'];
export type Closure = Schemas['ClosureResponse'];
export type Holiday = Schemas['HolidayResponse'];
export type HolidayRegion = Schemas['HolidayRegionResponse'];
export type UpdateWorkshopCalendarRequest = Schemas['UpdateWorkshopCalendarDto'];
export type OpeningHoursEntryRequest = Schemas['OpeningHoursEntryDto'];
export type CreateBayRequest = Schemas['CreateBayDto'];
export type UpdateBayRequest = Schemas['UpdateBayDto'];
export type CreateClosureRequest = Schemas['CreateClosureDto'];
export type HolidayOverrideRequest = Schemas['HolidayOverrideDto'];
