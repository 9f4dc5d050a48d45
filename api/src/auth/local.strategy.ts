import { Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import type { Request } from 'express';
import { Strategy } from 'passport-local';
import type { User } from '../users/entities/user.entity';
import { AuthService } from './auth.service';

/** passport-local with the e-mail address as the user name. */
@Injectable()
export class LocalStrategy extends PassportStrategy(Strategy) {
  constructor(private readonly auth: AuthService) {
    super({ usernameField: 'email', passwordField: 'password', passReqToCallback: true });
  }

  validate(request: Request, email: string, password: string): Promise<User> {
    return this.auth.checkCredentials(email, password, request.ip ?? 'unknown');
  }
}
