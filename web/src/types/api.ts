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
