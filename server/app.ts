import { existsSync } from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import { authRouter } from './auth/auth.routes';
import type { AppContext } from './context';
import { health, useCommonMiddleware } from './app-middleware';
import { startChangeWatch } from './db/change-watch';
import { apiNotFound, errorMiddleware } from './lib/errors';
import { apiRoutes } from './routes';

/** Builds the Express app (no listen): the API under /api, then the web app with a deep-link fallback. */
export function createApp(ctx: AppContext): Express {
  const app = express();
  // Cached users and catalog versions are dropped on any instance's change (server/db/change-watch.ts).
  startChangeWatch(ctx.dataSource);
  useCommonMiddleware(app, ctx);
  app.get('/api/health', health);
  app.use('/api/auth', authRouter(ctx));
  for (const [prefix, build] of apiRoutes) app.use(`/api/${prefix}`, build(ctx));
  app.use('/api', apiNotFound);

  serveWebApp(app, ctx.config.webDir);
  app.use(errorMiddleware(ctx.logger));
  return app;
}

function serveWebApp(app: Express, webDir: string) {
  const indexHtml = path.join(webDir, 'index.html');
  // The service worker, manifest and index.html must be re-checked on every visit, or a new build waits an hour.
  const revalidate = /^(sw\.js|manifest\.webmanifest|index\.html)$/;
  app.use(
    express.static(webDir, {
      index: false,
      maxAge: '1h',
      setHeaders: (res, file) => revalidate.test(path.basename(file)) && res.setHeader('Cache-Control', 'no-cache'),
    }),
  );
  // Deep links (/jobs/123) load the app, which routes on the client.
  app.get('/{*splat}', (_req, res, next) => {
    if (!existsSync(indexHtml)) {
      res.status(503).type('text/plain').send('The web app has not been built yet: run npm start (or npm run build:web).');
      return;
    }
    res.sendFile(indexHtml, { headers: { 'Cache-Control': 'no-cache' } }, (err) => err && next(err));
  });
}
