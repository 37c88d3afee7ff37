// createApp(): builds the Express app from its dependencies and never listens (tests use it
// in-process; server/index.ts starts it).
import fs from 'node:fs';
import path from 'node:path';
import connectPgSimple from 'connect-pg-simple';
import express, { type ErrorRequestHandler, type Router } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import type pg from 'pg';
import { csrfGuard } from './auth/csrf';
import { loadCurrentUser } from './auth/current-user';
import type { AppContext } from './context';
import { AppError } from './errors';
import { registerAdminRoutes } from './routes/admin';
import { registerAnalysisRoutes } from './routes/analysis';
import { registerAssayRoutes } from './routes/assays';
import { registerAuthRoutes } from './routes/auth';
import { registerBufferSeriesRoutes } from './routes/buffer-series';
import { registerBufferRoutes } from './routes/buffers';
import { registerComparisonRoutes } from './routes/comparisons';
import { registerEnzymeRoutes } from './routes/enzymes';
import { registerHealthRoutes } from './routes/health';
import { registerPlateRoutes } from './routes/plates';
import { registerReviewRoutes } from './routes/review';
import { registerStudyRoutes } from './routes/studies';

export type AppDeps = AppContext & { pool: pg.Pool };

export const sessionCookieName = 'bw.sid';

/** Every resource registers its routes on the one /api router (the role-matrix test walks it). */
const routeModules: ((api: Router, ctx: AppContext) => void)[] = [
  registerHealthRoutes,
  registerAuthRoutes,
  registerAdminRoutes,
  registerEnzymeRoutes,
  registerAssayRoutes,
  registerStudyRoutes,
  registerPlateRoutes,
  registerReviewRoutes,
  registerBufferRoutes,
  registerBufferSeriesRoutes,
  registerAnalysisRoutes,
  registerComparisonRoutes,
];

function sessionMiddleware({ pool, config }: AppDeps) {
  const PgStore = connectPgSimple(session);
  return session({
    name: sessionCookieName,
    secret: config.sessionSecret,
    store: new PgStore({
      pool,
      tableName: 'session',
      createTableIfMissing: false,
      pruneSessionInterval: config.pruneSessions ? 15 * 60 : false,
    }),
    resave: false,
    saveUninitialized: false,
    rolling: true, // idle expiry: each request pushes the end of the session forward
    proxy: config.trustProxy,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: 'auto', // Secure whenever the request came over https (behind a trusted proxy too)
      maxAge: config.sessionIdleMinutes * 60_000,
      path: '/',
    },
  });
}

const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const send = (status: number, code: string, message: string, fields?: Record<string, string>, currentVersion?: number) =>
    res.status(status).json({ error: { code, message, ...(fields ? { fields } : {}), ...(currentVersion !== undefined ? { currentVersion } : {}) } });
  if (error instanceof AppError) return send(error.status, error.code, error.message, error.fields, error.currentVersion);
  const e = error as { type?: string; status?: number; message?: string };
  if (e.type === 'entity.parse.failed') return send(400, 'malformed_json', 'The request body is not valid JSON.');
  if (e.type === 'entity.too.large') return send(413, 'too_large', 'The request is too large.');
  if (e.type === 'encoding.unsupported' || e.type === 'charset.unsupported') {
    return send(415, 'unsupported_encoding', 'Send the request as UTF-8 JSON.');
  }
  if (typeof e.status === 'number' && e.status >= 400 && e.status < 500) {
    return send(e.status, 'bad_request', e.message ?? 'Bad request.');
  }
  (req.app.locals.log as AppContext['log'] | undefined)?.warn(
    `Unexpected error on ${req.method} ${req.originalUrl}: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`,
  );
  return send(500, 'internal', 'Something went wrong on the server. Try again; if it persists, tell an admin.');
};

export function createApp(deps: AppDeps) {
  const { config } = deps;
  const app = express();
  app.locals.log = deps.log;
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxy ? 1 : false);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'default-src': ["'self'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'script-src': ["'self'"],
          'upgrade-insecure-requests': null,
        },
      },
    }),
  );

  const api = express.Router();
  for (const register of routeModules) register(api, deps);
  api.use((req) => {
    throw new AppError('not_found', `There is no API route ${req.method} ${req.path}.`, 404);
  });

  app.use(
    '/api',
    express.json({ limit: '1mb' }),
    sessionMiddleware(deps),
    loadCurrentUser(deps.db),
    csrfGuard,
    api,
  );

  if (config.clientDir && fs.existsSync(path.join(config.clientDir, 'index.html'))) {
    const clientDir = config.clientDir;
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    app.get('/{*splat}', (_req, res) => res.sendFile(path.join(clientDir, 'index.html')));
  }

  app.use(errorHandler);
  return app;
}

/** The /api router, for tests that list every route. */
export function apiRouteList(app: ReturnType<typeof createApp>): { method: string; path: string }[] {
  type Layer = { name?: string; handle?: { stack?: Layer[] }; route?: { path: string; methods: Record<string, boolean> } };
  const stack = (app as unknown as { router: { stack: Layer[] } }).router.stack;
  const apiLayer = stack.filter((l) => l.name === 'router').at(-1);
  const routes: { method: string; path: string }[] = [];
  for (const layer of apiLayer?.handle?.stack ?? []) {
    if (!layer.route) continue;
    for (const method of Object.keys(layer.route.methods)) {
      if (method !== '_all') routes.push({ method: method.toUpperCase(), path: `/api${layer.route.path}` });
    }
  }
  return routes;
}
