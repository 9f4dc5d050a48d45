import { Controller, ForbiddenException, Get, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { ExecutionContextHost } from '@nestjs/core/helpers/execution-context-host';
import { describe, expect, it } from 'vitest';
import { User } from '../../users/entities/user.entity';
import type { Role } from '../../users/user-role';
import { Public } from '../decorators/public.decorator';
import { Roles } from '../decorators/roles.decorator';
import { NO_ACCESS_RULE_MESSAGE, RolesGuard } from './roles.guard';

@Controller('examples')
class ExampleController {
  @Get('forgotten')
  forgotten(): void {}

  @Public()
  @Get('open')
  open(): void {}

  @Roles('desk', 'manager')
  @Get('desk')
  desk(): void {}

  @Public()
  @Roles('manager')
  @Get('both')
  both(): void {}
}

function canActivate(handler: keyof ExampleController, role?: Role): boolean {
  const user = role ? new User(`${role}@example.test`, role, role, 'hash') : undefined;
  const context = new ExecutionContextHost([{ user }, {}]);
  context.setType('http');
  Object.assign(context, {
    getHandler: () => ExampleController.prototype[handler],
    getClass: () => ExampleController,
  });
  return new RolesGuard(new Reflector()).canActivate(context);
}

describe('RolesGuard', () => {
  it('refuses a route with no decision, for everyone (fails closed)', () => {
    expect(() => canActivate('forgotten')).toThrow(new ForbiddenException(NO_ACCESS_RULE_MESSAGE));
    expect(() => canActivate('forgotten', 'manager')).toThrow(ForbiddenException);
  });

  it('refuses a route that says both @Public and @Roles', () => {
    expect(() => canActivate('both', 'manager')).toThrow(ForbiddenException);
  });

  it('lets anyone through a public route', () => {
    expect(canActivate('open')).toBe(true);
    expect(canActivate('open', 'customer')).toBe(true);
  });

  it('asks anonymous callers to sign in and refuses other roles', () => {
    expect(() => canActivate('desk')).toThrow(UnauthorizedException);
    expect(() => canActivate('desk', 'customer')).toThrow(ForbiddenException);
    expect(() => canActivate('desk', 'tech')).toThrow(ForbiddenException);
    expect(canActivate('desk', 'desk')).toBe(true);
    expect(canActivate('desk', 'manager')).toBe(true);
  });
});
