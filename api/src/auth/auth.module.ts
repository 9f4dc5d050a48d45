import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { PassportModule } from '@nestjs/passport';
import { MailModule } from '../mail/mail.module';
import { UsersModule } from '../users/users.module';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { PasswordResetToken } from './entities/password-reset-token.entity';
import { LocalStrategy } from './local.strategy';
import { PasswordHasher } from './password-hasher';
import { SessionSerializer } from './session.serializer';
import { HttpSessionService } from './session/http-session.service';
import { SignInThrottleService } from './sign-in-throttle.service';

@Module({
  imports: [
    PassportModule.register({ session: true }),
    MikroOrmModule.forFeature([PasswordResetToken]),
    UsersModule,
    MailModule,
  ],
  controllers: [AuthController],
  providers: [
    AuthService,
    LocalStrategy,
    SessionSerializer,
    PasswordHasher,
    SignInThrottleService,
    HttpSessionService,
  ],
  exports: [HttpSessionService, PasswordHasher, AuthService],
})
export class AuthModule {}
