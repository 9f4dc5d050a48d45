import { type ExecutionContext, Injectable } from '@nestjs/common';
import { AuthGuard } from '@nestjs/passport';
import { plainToInstance } from 'class-transformer';
import { validate } from 'class-validator';
import type { Request } from 'express';
import { validationException } from '../common/pipes/validation.pipe';
import { SignInDto } from './dto/sign-in.dto';

/**
 * Signs in with passport-local. The body is validated first, with the same rules and error
 * shape as the global ValidationPipe (guards run before pipes), then passport checks the
 * credentials and logIn() regenerates the session and stores the user's id in it.
 */
@Injectable()
export class LocalAuthGuard extends AuthGuard('local') {
  override async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<Request>();
    const raw: unknown = request.body;
    const plain = typeof raw === 'object' && raw !== null && !Array.isArray(raw) ? raw : {};
    const dto = plainToInstance(SignInDto, plain);
    const errors = await validate(dto, {
      whitelist: true,
      forbidNonWhitelisted: true,
      stopAtFirstError: true,
      validationError: { target: false, value: false },
    });
    if (errors.length > 0) throw validationException(errors);
    request.body = dto;

    await super.canActivate(context);
    await super.logIn(request);
    return true;
  }
}
