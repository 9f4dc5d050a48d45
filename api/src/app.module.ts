import { MikroOrmModule } from '@mikro-orm/nestjs';
import { PostgreSqlDriver } from '@mikro-orm/postgresql';
import {
  type DynamicModule,
  type MiddlewareConsumer,
  Module,
  type NestModule,
  RequestMethod,
} from '@nestjs/common';
import { APP_FILTER, APP_GUARD, APP_PIPE } from '@nestjs/core';
import { json, type Request, type RequestHandler } from 'express';
import { LoggerModule } from 'nestjs-pino';
import { BookingsModule } from './bookings/bookings.module';
import { AuthModule } from './auth/auth.module';
import { CatalogueModule } from './catalogue/catalogue.module';
import { HttpSessionService } from './auth/session/http-session.service';
import { AllExceptionsFilter } from './common/filters/all-exceptions.filter';
import { CsrfGuard } from './common/guards/csrf.guard';
import { RolesGuard } from './common/guards/roles.guard';
import { createValidationPipe } from './common/pipes/validation.pipe';
import { requestIdFor } from './common/request-id';
import { AppConfigModule } from './config/app-config.module';
import { AppConfigService } from './config/app-config.service';
import { CustomerVehiclesModule } from './customer-vehicles/customer-vehicles.module';
import { CustomersModule } from './customers/customers.module';
import { PgPoolModule } from './database/pg-pool.module';
import { FitReportsModule } from './fit-reports/fit-reports.module';
import { HealthModule } from './health/health.module';
import { MailModule } from './mail/mail.module';
import { NotificationsModule } from './notifications/notifications.module';
import { createOrmConfig } from './mikro-orm.config';
import { PaymentsModule } from './payments/payments.module';
import { PAYMENTS_WEBHOOK_PATH } from './payments/payments-webhook.path';
import { QuotesModule } from './quotes/quotes.module';
import { RuleSetsModule } from './rule-sets/rule-sets.module';
import { StaffModule } from './staff/staff.module';
import { UploadsModule } from './uploads/uploads.module';
import { UsersModule } from './users/users.module';
import { VehiclesModule } from './vehicles/vehicles.module';
import { WorkshopModule } from './workshop/workshop.module';

/** Every path below the global prefix (Nest 11 / path-to-regexp 8 wildcard). */
const ALL_ROUTES = { path: '{*path}', method: RequestMethod.ALL };

/** JSON bodies of every route but the payment provider's webhook. */
const jsonBody = json({ limit: '100kb' });

/**
 * The provider's events: parsed as JSON too, but with the exact bytes kept as `rawBody`, which
 * the signature is checked against. Larger than ordinary requests: an event carries whole objects.
 */
const webhookBody = json({
  limit: '1mb',
  verify: (request, _response, bytes) => {
    (request as Request & { rawBody?: Buffer }).rawBody = Buffer.from(bytes);
  },
});

function isWebhookPath(request: Request): boolean {
  const url = request.originalUrl;
  const query = url.indexOf('?');
  return (query === -1 ? url : url.slice(0, query)) === PAYMENTS_WEBHOOK_PATH;
}

const bodyParser: RequestHandler = (request, response, next) =>
  isWebhookPath(request) ? webhookBody(request, response, next) : jsonBody(request, response, next);

/**
 * Runs an Express middleware so that an error it passes to next() is thrown inside Nest and
 * reaches the global exception filter (with the request id) instead of Express's handlers.
 */
function insideNest(handler: RequestHandler): RequestHandler {
  return (request, response, next) =>
    new Promise<void>((resolve, reject) => {
      void handler(request, response, (error?: unknown) => (error ? reject(error) : resolve()));
    }).then(() => next());
}

@Module({
  imports: [
    LoggerModule.forRootAsync({
      inject: [AppConfigService],
      useFactory: (config: AppConfigService) => ({
        pinoHttp: {
          level: config.logLevel,
          genReqId: requestIdFor,
          customLogLevel: (_request, response, error) =>
            error || response.statusCode >= 500 ? 'error' : 'info',
          // Short request lines; cookies and CSRF tokens never reach the log.
          serializers: {
            req: (request: { id: unknown; method: string; url: string }) => ({
              id: request.id,
              method: request.method,
              url: request.url,
            }),
            res: (response: { statusCode: number }) => ({ statusCode: response.statusCode }),
          },
          redact: [
            'req.headers.cookie',
            'req.headers["x-csrf-token"]',
            'res.headers["set-cookie"]',
          ],
        },
        forRoutes: [ALL_ROUTES],
      }),
    }),
    MikroOrmModule.forRootAsync({
      driver: PostgreSqlDriver,
      inject: [AppConfigService],
      useFactory: (config: AppConfigService) => ({
        ...createOrmConfig(config.databaseUrl),
        registerRequestContext: true,
        autoLoadEntities: false,
      }),
    }),
    PgPoolModule,
    UsersModule,
    AuthModule,
    StaffModule,
    HealthModule,
    MailModule,
    NotificationsModule,
    VehiclesModule,
    CustomerVehiclesModule,
    CatalogueModule,
    RuleSetsModule,
    FitReportsModule,
    WorkshopModule,
    QuotesModule,
    UploadsModule,
    CustomersModule,
    BookingsModule,
    PaymentsModule,
  ],
  providers: [
    { provide: APP_FILTER, useClass: AllExceptionsFilter },
    { provide: APP_PIPE, useFactory: createValidationPipe },
    { provide: APP_GUARD, useClass: CsrfGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
  ],
})
export class AppModule implements NestModule {
  constructor(private readonly sessions: HttpSessionService) {}

  /** The application with its validated configuration (read from the environment now). */
  static forRoot(): DynamicModule {
    return { module: AppModule, imports: [AppConfigModule.forRoot()] };
  }

  /**
   * After the global request-id logger and the ORM request context: JSON bodies (the webhook's
   * with its raw bytes kept), the session,
   * its absolute lifetime, then passport (which loads the user inside the request context).
   */
  configure(consumer: MiddlewareConsumer): void {
    consumer
      .apply(...[bodyParser, ...this.sessions.middleware()].map(insideNest))
      .forRoutes(ALL_ROUTES);
  }
}
