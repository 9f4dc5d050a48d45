import {
  Body,
  Controller,
  Get,
  HttpCode,
  HttpStatus,
  Post,
  Req,
  Res,
  UseGuards,
} from '@nestjs/common';
import {
  ApiAcceptedResponse,
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiTooManyRequestsResponse,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { SignedIn } from '../common/decorators/roles.decorator';
import { ErrorResponse } from '../common/filters/error.response';
import { issueCsrfToken } from '../common/guards/csrf.guard';
import { UserResponse } from '../users/dto/user.response';
import { User } from '../users/entities/user.entity';
import { AuthService } from './auth.service';
import { AuthSessionResponse } from './dto/auth-session.response';
import { ConfirmPasswordResetDto } from './dto/confirm-password-reset.dto';
import { CsrfTokenResponse } from './dto/csrf-token.response';
import { MeResponse } from './dto/me.response';
import { RegisterDto } from './dto/register.dto';
import { RequestPasswordResetDto } from './dto/request-password-reset.dto';
import { SignInDto } from './dto/sign-in.dto';
import { LocalAuthGuard } from './local-auth.guard';
import { HttpSessionService, SESSION_COOKIE_NAME } from './session/http-session.service';

@ApiTags('auth')
@ApiForbiddenResponse({ description: 'Missing or invalid CSRF token (POST)', type: ErrorResponse })
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly sessions: HttpSessionService,
  ) {}

  @Public()
  @Get('csrf')
  @ApiOperation({ summary: 'The CSRF token of this session (creates the session if needed)' })
  @ApiOkResponse({ type: CsrfTokenResponse })
  csrf(@Req() request: Request): CsrfTokenResponse {
    this.sessions.ensureStarted(request);
    return { csrfToken: issueCsrfToken(request) };
  }

  @Public()
  @Post('register')
  @ApiOperation({ summary: 'Create a customer account and sign in' })
  @ApiCreatedResponse({ type: AuthSessionResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiConflictResponse({ description: 'E-mail already registered', type: ErrorResponse })
  async register(@Body() dto: RegisterDto, @Req() request: Request): Promise<AuthSessionResponse> {
    const user = await this.auth.register(dto);
    await this.auth.logIn(request, user);
    return this.startSession(request, user);
  }

  @Public()
  @UseGuards(LocalAuthGuard)
  @Post('sign-in')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({ summary: 'Sign in; the session is regenerated and a new CSRF token returned' })
  @ApiOkResponse({ type: AuthSessionResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiUnauthorizedResponse({ description: 'E-mail or password is not right', type: ErrorResponse })
  @ApiTooManyRequestsResponse({ description: 'Throttled; see Retry-After', type: ErrorResponse })
  signIn(
    @Body() _dto: SignInDto,
    @CurrentUser() user: User,
    @Req() request: Request,
  ): AuthSessionResponse {
    return this.startSession(request, user);
  }

  @Public()
  @Post('sign-out')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiOperation({ summary: 'Sign out: the session is destroyed and the cookie cleared' })
  @ApiNoContentResponse()
  async signOut(
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<void> {
    await this.sessions.destroy(request);
    response.clearCookie(SESSION_COOKIE_NAME, this.sessions.cookieOptions);
  }

  @SignedIn()
  @Get('me')
  @ApiOperation({ summary: 'The signed-in user' })
  @ApiOkResponse({ type: MeResponse })
  me(@CurrentUser() user: User): MeResponse {
    return { user: UserResponse.from(user) };
  }

  @Public()
  @Post('password-reset')
  @HttpCode(HttpStatus.ACCEPTED)
  @ApiOperation({ summary: 'E-mail a reset link if the account exists (always 202)' })
  @ApiAcceptedResponse({ schema: { type: 'object', properties: {} } })
  @ApiBadRequestResponse({ type: ErrorResponse })
  async requestPasswordReset(@Body() dto: RequestPasswordResetDto): Promise<Record<string, never>> {
    await this.auth.requestPasswordReset(dto.email);
    return {};
  }

  @Public()
  @Post('password-reset/confirm')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiOperation({ summary: 'Choose a new password with the token from the e-mail' })
  @ApiNoContentResponse()
  @ApiBadRequestResponse({
    description: 'fieldErrors.token when the link expired or was used',
    type: ErrorResponse,
  })
  async confirmPasswordReset(@Body() dto: ConfirmPasswordResetDto): Promise<void> {
    await this.auth.confirmPasswordReset(dto.token, dto.password);
  }

  private startSession(request: Request, user: User): AuthSessionResponse {
    this.sessions.start(request);
    return { user: UserResponse.from(user), csrfToken: issueCsrfToken(request, true) };
  }
}
