import * as yup from 'yup';
import { roleLabels, staffRoles } from '@/config/roles';
import type { StaffRole } from '@/types/api';

/** Field rules mirroring the server's staff DTOs. */
export const STAFF_PASSWORD_MIN_LENGTH = 8;
export const STAFF_PASSWORD_MAX_LENGTH = 128;
export const STAFF_NAME_MAX_LENGTH = 100;
export const STAFF_EMAIL_MAX_LENGTH = 254;

export const staffNameField = yup
  .string()
  .trim()
  .required('Enter their name.')
  .max(STAFF_NAME_MAX_LENGTH, `Use at most ${STAFF_NAME_MAX_LENGTH} characters.`);

export const staffRoleField = yup
  .mixed<StaffRole>()
  .oneOf([...staffRoles], 'Choose front desk, technician or manager.')
  .required('Choose a role.');

export const staffRoleOptions = staffRoles.map((role) => ({
  value: role,
  label: roleLabels[role],
}));
