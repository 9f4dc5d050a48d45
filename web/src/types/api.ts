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
