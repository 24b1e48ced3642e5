import express, { type Express, type RequestHandler } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { AppContext } from './context';
import { changeScope } from './db/change-watch';
import { defaultEmptyBody, requireKnownBodyType } from './lib/body-type';

/**
 * What every request passes through before its route: security headers, the request log, and for /api the
 * body-type check, JSON parsing and the per-request change scope. Shared by createApp and the bench's
 * floor server (bench/checks-floor-server.ts), so the floor runs exactly the app's own stack.
 */
export function useCommonMiddleware(app: Express, ctx: Pick<AppContext, 'config' | 'logger'>): void {
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
}

/** GET /api/health: the liveness answer (no database, no auth). */
export const health: RequestHandler = (_req, res) => {
  res.json({ status: 'ok' });
};

/** Development only: lets the Expo dev server on another port call the API. */
function devCors(origin: string): RequestHandler {
  return (req, res, next) => {
    res.setHeader('Access-Control-Allow-Origin', origin);
    res.setHeader('Access-Control-Allow-Headers', 'Authorization, Content-Type');
    res.setHeader('Access-Control-Allow-Methods', 'GET, POST, PATCH, PUT, DELETE');
    if (req.method === 'OPTIONS') res.sendStatus(204);
    else next();
  };
}
