export const ROLES = ['customer', 'desk', 'tech', 'manager'] as const;
export type Role = (typeof ROLES)[number];

/** Roles a manager can give a staff account (customers register themselves). */
export const STAFF_ROLES = ['desk', 'tech', 'manager'] as const satisfies readonly Role[];
export type StaffRole = (typeof STAFF_ROLES)[number];
