import {
  type CanActivate,
  type ExecutionContext,
  ForbiddenException,
  Injectable,
  UnauthorizedException,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Request } from 'express';
import { User } from '../../users/entities/user.entity';
import type { Role } from '../../users/user-role';
import { IS_PUBLIC_KEY } from '../decorators/public.decorator';
import { ROLES_KEY } from '../decorators/roles.decorator';

export const NO_ACCESS_RULE_MESSAGE = 'This route has no access rule';

export type AccessRule =
  { kind: 'public' } | { kind: 'roles'; roles: readonly Role[] } | { kind: 'none' };

/** What a handler declares: @Public(), @Roles(...), or (a mistake) nothing or both. */
export function accessRuleOf(
  reflector: Reflector,
  targets: Parameters<Reflector['getAllAndOverride']>[1],
): AccessRule {
  const isPublic =
    reflector.getAllAndOverride<boolean | undefined>(IS_PUBLIC_KEY, targets) === true;
  const roles = reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
  const hasRoles = Array.isArray(roles) && roles.length > 0;
  if (isPublic && !hasRoles) return { kind: 'public' };
  if (hasRoles && !isPublic) return { kind: 'roles', roles };
  return { kind: 'none' };
}

/**
 * Global guard. Default deny: a route must say @Public() or @Roles(...); with neither (or both)
 * it is refused for everyone, so a forgotten decorator fails closed.
 */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const rule = accessRuleOf(this.reflector, [context.getHandler(), context.getClass()]);
    if (rule.kind === 'public') return true;
    if (rule.kind === 'none') throw new ForbiddenException(NO_ACCESS_RULE_MESSAGE);

    const request = context.switchToHttp().getRequest<Request>();
    if (!(request.user instanceof User)) throw new UnauthorizedException('Sign in to continue');
    if (!rule.roles.includes(request.user.role)) {
      throw new ForbiddenException('Your role does not allow this');
    }
    return true;
  }
}
