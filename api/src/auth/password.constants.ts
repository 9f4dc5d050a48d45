import { argon2id } from 'argon2';

export const PASSWORD_MIN_LENGTH = 8;
export const PASSWORD_MAX_LENGTH = 128;

/**
 * argon2id with 19 MiB of memory, 2 iterations and 1 degree of parallelism: the minimum
 * configuration of the OWASP Password Storage Cheat Sheet ("Argon2id").
 */
export const ARGON2_OPTIONS = {
  type: argon2id,
  memoryCost: 19_456, // KiB
  timeCost: 2,
  parallelism: 1,
} as const;

/** A password reset link stays valid for one hour. */
export const PASSWORD_RESET_TTL_MS = 60 * 60 * 1000;

/**
 * The set-password link e-mailed to a customer the desk created: 72 hours, since it is often
 * opened after the visit. An unused one is replaced when the customer asks for a reset.
 */
export const SET_PASSWORD_TTL_MS = 72 * 60 * 60 * 1000;

/** Failed sign-ins allowed in one window, per account (e-mail) and per client address. */
export const SIGN_IN_THROTTLE = {
  windowSeconds: 15 * 60,
  failuresPerAccount: 5,
  failuresPerAddress: 20,
} as const;

/** Password reset e-mails sent per account in one window. */
export const PASSWORD_RESET_THROTTLE = {
  windowSeconds: 60 * 60,
  requestsPerAccount: 5,
} as const;
