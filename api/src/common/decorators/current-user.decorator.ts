import { createParamDecorator, type ExecutionContext, UnauthorizedException } from '@nestjs/common';
import type { Request } from 'express';
import { User } from '../../users/entities/user.entity';

/** The signed-in user loaded for this request (routes behind @Roles only). */
export const CurrentUser = createParamDecorator((_data: unknown, context: ExecutionContext) => {
  const request = context.switchToHttp().getRequest<Request>();
  if (!(request.user instanceof User)) throw new UnauthorizedException('Sign in to continue');
  return request.user;
});

/** On a @Public() route: the signed-in user, or null for a visitor. */
export const OptionalCurrentUser = createParamDecorator(
  (_data: unknown, context: ExecutionContext): User | null => {
    const request = context.switchToHttp().getRequest<Request>();
    return request.user instanceof User ? request.user : null;
  },
);
