import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import type { NextFunction, Request, Response } from 'express';
import helmet from 'helmet';
import { Logger } from 'nestjs-pino';
import { AppModule } from './app.module';
import { CSRF_HEADER } from './common/guards/csrf.guard';
import { AppConfigService } from './config/app-config.service';
import { SESSION_COOKIE_NAME } from './auth/session/http-session.service';
import { serveWebApp } from './web-app';

export const API_PREFIX = 'api';

/**
 * Builds the application exactly as it runs: main.ts listens on it, the HTTP tests call it.
 * Body parsing is done by AppModule's middleware (after the request id is assigned).
 */
export async function createApp(): Promise<NestExpressApplication> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(), {
    bodyParser: false,
    bufferLogs: true,
    abortOnError: false,
  });
  app.useLogger(app.get(Logger));
  const config = app.get(AppConfigService);

  app.set('trust proxy', config.trustProxy);
  app.disable('x-powered-by');
  // API answers are no-store: an ETag (a hash of every JSON body) would only cost time. Static
  // files of the web app keep theirs (serve-static sets its own).
  app.set('etag', false);
  // API answers carry personal data: browsers and proxies must not keep copies. A handler may
  // replace it (a photo). A plain middleware, not an interceptor: it costs nothing per request.
  app.use(`/${API_PREFIX}`, (_request: Request, response: Response, next: NextFunction) => {
    response.setHeader('Cache-Control', 'no-store');
    next();
  });
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          // Emotion (MUI) injects <style> elements at run time.
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
          upgradeInsecureRequests: config.secureCookies ? [] : null,
        },
      },
      hsts: config.secureCookies,
    }),
  );
  app.setGlobalPrefix(API_PREFIX);
  if (config.webDistDir) serveWebApp(app, config.webDistDir, API_PREFIX);

  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Liftwright API')
      .setDescription(
        "Session cookie authentication. Every POST, PUT, PATCH and DELETE sends the session's CSRF token " +
          `(GET /api/auth/csrf) in the ${CSRF_HEADER} header. Route access: x-access "public" or x-roles.`,
      )
      .setVersion('0.1.0')
      .addCookieAuth(
        SESSION_COOKIE_NAME,
        { type: 'apiKey', in: 'cookie', name: SESSION_COOKIE_NAME },
        'session',
      )
      .build(),
  );
  SwaggerModule.setup(`${API_PREFIX}/docs`, app, document, {
    jsonDocumentUrl: `${API_PREFIX}/docs-json`,
  });

  app.enableShutdownHooks();
  return app;
}
