import { applyDecorators, SetMetadata } from '@nestjs/common';
import {
  ApiCookieAuth,
  ApiExtension,
  ApiForbiddenResponse,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import { ROLES, type Role } from '../../users/user-role';
import { ErrorResponse } from '../filters/error.response';

export const ROLES_KEY = 'liftwright:roles';

/** Only signed-in users with one of these roles may call the route. */
export const Roles = (...roles: [Role, ...Role[]]) =>
  applyDecorators(
    SetMetadata(ROLES_KEY, roles),
    ApiCookieAuth('session'),
    ApiExtension('x-roles', roles),
    ApiUnauthorizedResponse({ description: 'Not signed in', type: ErrorResponse }),
    ApiForbiddenResponse({ description: 'Role not allowed', type: ErrorResponse }),
  );

/** Any signed-in user, whatever the role. */
export const SignedIn = () => Roles(...ROLES);
