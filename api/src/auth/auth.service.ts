import { createHash, randomBytes } from 'node:crypto';
import { UniqueConstraintViolationException } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/postgresql';
import { HttpStatus, Injectable, UnauthorizedException } from '@nestjs/common';
import type { Request } from 'express';
import { FieldErrorsException } from '../common/errors/field-errors.exception';
import { AppConfigService } from '../config/app-config.service';
import { MailService } from '../mail/mail.service';
import { passwordResetMail } from '../mail/templates/password-reset.mail';
import { User } from '../users/entities/user.entity';
import { UsersService } from '../users/users.service';
import type { RegisterDto } from './dto/register.dto';
import { PasswordResetToken } from './entities/password-reset-token.entity';
import { PasswordHasher } from './password-hasher';
import { PASSWORD_RESET_TTL_MS } from './password.constants';
import { HttpSessionService } from './session/http-session.service';
import { SignInThrottleService } from './sign-in-throttle.service';

export const WRONG_CREDENTIALS_MESSAGE = 'E-mail or password is not right';
export const EMAIL_TAKEN_MESSAGE = 'An account with this e-mail address already exists';
export const RESET_LINK_INVALID_MESSAGE = 'This link has expired or was already used';

export function hashResetToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

export function emailTakenException(): FieldErrorsException {
  return new FieldErrorsException(
    { email: [EMAIL_TAKEN_MESSAGE] },
    EMAIL_TAKEN_MESSAGE,
    HttpStatus.CONFLICT,
  );
}

@Injectable()
export class AuthService {
  constructor(
    private readonly em: EntityManager,
    private readonly users: UsersService,
    private readonly hasher: PasswordHasher,
    private readonly throttle: SignInThrottleService,
    private readonly sessions: HttpSessionService,
    private readonly mail: MailService,
    private readonly config: AppConfigService,
  ) {}

  /**
   * The passport-local check. Throttled per account and per address; an unknown e-mail, a wrong
   * password and a switched-off account all get the same 401, after the same argon2 work.
   */
  async checkCredentials(email: string, password: string, address: string): Promise<User> {
    await this.throttle.assertSignInAllowed(email, address);
    const user = await this.users.findByEmailWithPassword(email);
    let valid = false;
    if (user) {
      valid = (await this.hasher.verify(user.passwordHash, password)) && user.active;
    } else {
      await this.hasher.verifyAgainstDummy(password);
    }
    if (!user || !valid) {
      await this.throttle.recordFailure(email, address);
      throw new UnauthorizedException(WRONG_CREDENTIALS_MESSAGE);
    }
    await this.throttle.recordSuccess(email);
    if (this.hasher.needsRehash(user.passwordHash)) {
      user.passwordHash = await this.hasher.hash(password);
      await this.em.flush();
    }
    return user;
  }

  /** Creates a customer account. */
  async register(dto: RegisterDto): Promise<User> {
    if (await this.users.emailTaken(dto.email)) throw emailTakenException();
    const user = new User(dto.email, dto.name, 'customer', await this.hasher.hash(dto.password));
    try {
      await this.users.save(user);
    } catch (error) {
      // Two registrations racing for one address: the unique index decides.
      if (error instanceof UniqueConstraintViolationException) throw emailTakenException();
      throw error;
    }
    return user;
  }

  /** passport's logIn: regenerates the session and stores the user's id in it. */
  logIn(request: Request, user: User): Promise<void> {
    return new Promise((resolve, reject) =>
      request.logIn(user, (error: unknown) => (error ? reject(error) : resolve())),
    );
  }

  /**
   * Stores a new reset token (hashed) and e-mails the link. Says nothing about whether the
   * account exists: the caller always answers 202.
   */
  async requestPasswordReset(email: string): Promise<void> {
    const user = await this.users.findByEmail(email);
    if (!user || !user.active) return;
    if (!(await this.throttle.allowResetMail(user.email))) return;

    await this.em.nativeDelete(PasswordResetToken, { user, usedAt: null });
    const resetUrl = this.addPasswordLinkToken(this.em, user, PASSWORD_RESET_TTL_MS);
    await this.em.flush();

    this.mail.sendInBackground(
      user.email,
      passwordResetMail({
        name: user.name,
        resetUrl,
        validForMinutes: PASSWORD_RESET_TTL_MS / 60_000,
      }),
    );
  }

  /**
   * Adds (persists, does not flush) a one-time token for `user`, stored as its SHA-256, and
   * returns the link that uses it: the reset link, also sent to a customer the desk created so
   * they can choose their first password. Confirming works the same for both.
   */
  addPasswordLinkToken(em: EntityManager, user: User, validForMs: number): string {
    const token = randomBytes(32).toString('base64url');
    em.persist(
      new PasswordResetToken(user, hashResetToken(token), new Date(Date.now() + validForMs)),
    );
    return `${this.config.publicUrl}/reset-password?token=${encodeURIComponent(token)}`;
  }

  /** Uses a reset token once: sets the new password and ends the user's sessions. */
  async confirmPasswordReset(token: string, password: string): Promise<void> {
    const invalid = new FieldErrorsException(
      { token: [RESET_LINK_INVALID_MESSAGE] },
      RESET_LINK_INVALID_MESSAGE,
    );
    const passwordHash = await this.hasher.hash(password);
    const owner = await this.em.transactional(async (em) => {
      const resetToken = await em.findOne(
        PasswordResetToken,
        { tokenHash: hashResetToken(token), usedAt: null, expiresAt: { $gt: new Date() } },
        { populate: ['user'] },
      );
      if (!resetToken || !resetToken.user.active) return null;
      // Claim the token with a conditional update, so two requests cannot both use it.
      const claimed = await em.nativeUpdate(
        PasswordResetToken,
        { id: resetToken.id, usedAt: null },
        { usedAt: new Date() },
      );
      if (claimed !== 1) return null;
      resetToken.user.passwordHash = passwordHash;
      return { id: resetToken.user.id, email: resetToken.user.email };
    });
    if (!owner) throw invalid;
    await this.sessions.destroyAllForUser(owner.id);
    // The owner proved access to the mailbox: earlier failed sign-ins no longer count.
    await this.throttle.recordSuccess(owner.email);
  }
}
