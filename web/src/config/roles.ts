import type { Role, StaffRole } from '@/types/api';
import { paths } from './paths';

export type Area = 'account' | 'desk' | 'workshop' | 'manage';

/** Which roles may use each signed-in area. The server enforces the same on every route. */
export const areaRoles: Record<Area, readonly Role[]> = {
  account: ['customer'],
  desk: ['desk', 'manager'],
  workshop: ['tech'],
  manage: ['manager'],
};

export const areaPaths: Record<Area, string> = {
  account: paths.account.home.path,
  desk: paths.desk.home.path,
  workshop: paths.workshop.home.path,
  manage: paths.manage.home.path,
};

export const roleLabels: Record<Role, string> = {
  customer: 'Customer',
  desk: 'Front desk',
  tech: 'Technician',
  manager: 'Manager',
};

export const staffRoles: readonly StaffRole[] = ['desk', 'tech', 'manager'];

const roleHomes: Record<Role, string> = {
  customer: paths.account.home.getHref(),
  desk: paths.desk.home.getHref(),
  tech: paths.workshop.home.getHref(),
  manager: paths.manage.home.getHref(),
};

/** The name of each role's home, as its page heading and navigation show it. */
export const roleHomeLabels: Record<Role, string> = {
  customer: 'Your garage',
  desk: 'Front desk',
  tech: 'Workshop',
  manager: 'Manage',
};

export function homePathForRole(role: Role): string {
  return roleHomes[role];
}

export function canUseArea(role: Role, area: Area): boolean {
  return areaRoles[area].includes(role);
}

/** The area a path belongs to, or null for public pages. */
export function areaOfPath(pathname: string): Area | null {
  for (const [area, root] of Object.entries(areaPaths) as [Area, string][]) {
    if (pathname === root || pathname.startsWith(`${root}/`)) return area;
  }
  return null;
}

/** Where to go after signing in: the return path if this role may use it, else the role's home. */
export function landingPathFor(role: Role, redirectTo: string | null): string {
  if (redirectTo) {
    const pathname = redirectTo.split(/[?#]/)[0];
    const area = areaOfPath(pathname);
    if (area !== null ? canUseArea(role, area) : !authPaths.has(pathname)) return redirectTo;
  }
  return homePathForRole(role);
}

/** Pages that make no sense to return to once signed in. */
const authPaths = new Set<string>([
  paths.auth.signIn.path,
  paths.auth.register.path,
  paths.auth.forgotPassword.path,
  paths.auth.resetPassword.path,
]);
