import { extname, join, sep } from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import type { RequestHandler } from 'express';

/**
 * Serves the built web app from `rootPath`: its files as they are (hashed files under assets/
 * cached for a year), and index.html for every other GET outside /api, so client-side routes
 * work on reload. Paths with a file extension that no file matches stay 404.
 */
export function serveWebApp(
  app: NestExpressApplication,
  rootPath: string,
  apiPrefix: string,
): void {
  app.useStaticAssets(rootPath, {
    index: false,
    setHeaders: (response, filePath) => {
      response.setHeader(
        'Cache-Control',
        filePath.includes(`${sep}assets${sep}`)
          ? 'public, max-age=31536000, immutable'
          : 'no-cache',
      );
    },
  });
  const indexHtml = join(rootPath, 'index.html');
  const spaFallback: RequestHandler = (request, response, next) => {
    const isApi = request.path === `/${apiPrefix}` || request.path.startsWith(`/${apiPrefix}/`);
    if (
      (request.method !== 'GET' && request.method !== 'HEAD') ||
      isApi ||
      extname(request.path) !== ''
    ) {
      return next();
    }
    response.setHeader('Cache-Control', 'no-cache');
    response.sendFile(indexHtml, (error?: Error) => {
      if (error) next(error);
    });
  };
  app.use(spaFallback);
}
