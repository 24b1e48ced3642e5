import { existsSync } from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import { authRouter } from './auth/auth.routes';
import type { AppContext } from './context';
import { changeScope, startChangeWatch } from './db/change-watch';
import { defaultEmptyBody, requireKnownBodyType } from './lib/body-type';
import { apiNotFound, errorMiddleware } from './lib/errors';
import { apiRoutes } from './routes';

/** Builds the Express app (no listen): the API under /api, then the web app with a deep-link fallback. */
export function createApp(ctx: AppContext): Express {
  const app = express();
  // Cached users and catalog versions are dropped on any instance's change (server/db/change-watch.ts).
  startChangeWatch(ctx.dataSource);
  app.disable('x-powered-by');
  // API answers are per-user and rarely re-fetched unchanged; hashing every body is not worth it.
  app.set('etag', false);
  // X-Forwarded-For decides the client address the sign-in limits key on: believe it only from configured proxies.
  app.set('trust proxy', ctx.config.trustProxy ?? false);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // react-native-web injects style tags; Metro's single bundle needs nothing else inline.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
          // A shop may serve Tandem on its LAN over plain HTTP: do not force HTTPS on subresources.
          'upgrade-insecure-requests': null,
        },
      },
      strictTransportSecurity: false,
    }),
  );
  app.use(
    pinoHttp({
      logger: ctx.logger,
      autoLogging: { ignore: (req) => req.url === '/api/health' },
      serializers: {
        req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: req.url }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
    }),
  );
  if (ctx.config.corsOrigin) app.use('/api', devCors(ctx.config.corsOrigin));
  app.use('/api', requireKnownBodyType, express.json({ limit: '1mb' }), defaultEmptyBody, changeScope);

  app.get('/api/health', (_req, res) => {
    res.json({ status: 'ok' });
  });
  app.use('/api/auth', authRouter(ctx));
  for (const [prefix, build] of apiRoutes) app.use(`/api/${prefix}`, build(ctx));
  app.use('/api', apiNotFound);

  serveWebApp(app, ctx.config.webDir);
  app.use(errorMiddleware(ctx.logger));
  return app;
}

/** Development only: lets the Expo dev server on another port call the API. */
function devCors(origin: string): express.RequestHandler {
  return (req, res, next) => {
    res.setHeader('Access-Control-Allow-Origin', origin);
    res.setHeader('Access-Control-Allow-Headers', 'Authorization, Content-Type');
    res.setHeader('Access-Control-Allow-Methods', 'GET, POST, PATCH, PUT, DELETE');
    if (req.method === 'OPTIONS') res.sendStatus(204);
    else next();
  };
}

function serveWebApp(app: Express, webDir: string) {
  const indexHtml = path.join(webDir, 'index.html');
  // The service worker, manifest and index.html must be re-checked on every visit, or a new build waits an hour.
  const revalidate = /^(sw\.js|manifest\.webmanifest|index\.html)$/;
  app.use(express.static(webDir, { index: false, maxAge: '1h', setHeaders: (res, file) => revalidate.test(path.basename(file)) && res.setHeader('Cache-Control', 'no-cache') }));
  // Deep links (/jobs/123) load the app, which routes on the client.
  app.get('/{*splat}', (_req, res, next) => {
    if (!existsSync(indexHtml)) {
      res.status(503).type('text/plain').send('The web app has not been built yet: run npm start (or npm run build:web).');
      return;
    }
    res.sendFile(indexHtml, { headers: { 'Cache-Control': 'no-cache' } }, (err) => err && next(err));
  });
}
