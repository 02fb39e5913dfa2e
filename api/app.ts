// Builds the Express application: security headers, sessions in PostgreSQL, CSRF protection,
// the /api routes, the built client, and the one error handler.
import path from 'node:path';
import express, { type Express } from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import helmet from 'helmet';
import type { Knex } from 'knex';
import pg from 'pg';
import type { Env } from './config/env';
import { configurePassport } from './auth/passport';
import { csrfProtection } from './middleware/csrf';
import { errorHandler, notFoundHandler } from './middleware/error-handler';
import { adminRoutes } from './routes/admin';
import { authRoutes } from './routes/auth';
import { figureRoutes } from './routes/figures';
import { projectRoutes } from './routes/projects';
import { reviewRoutes } from './routes/review';
import { exportRoutes, projectExportRoutes } from './routes/exports';
import { figureBundleRoutes, projectBundleRoutes } from './routes/bundles';
import { datasetRoutes, projectDatasetRoutes } from './routes/datasets';
import { invitationRoutes } from './routes/invitations';
import { accountRoutes } from './routes/account';
import { createMailer, type Mailer } from './mail/mailer';
import type { Jobs } from './jobs/jobs';

export interface AppDeps {
  env: Env;
  db: Knex;
  mailer?: Mailer;
  /** The job queue; absent where none runs (exports then answer 503, re-renders are skipped). */
  jobs?: Pick<Jobs, 'enqueueExport' | 'enqueueRerender'>;
}

export interface BuiltApp {
  app: Express;
  close(): Promise<void>;
}

export function createApp({ env, db, mailer = createMailer(env), jobs }: AppDeps): BuiltApp {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'img-src': ["'self'", 'data:', 'blob:'],
          'worker-src': ["'self'", 'blob:'],
        },
      },
    }),
  );

  const sessionPool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 5 });
  const PgStore = connectPgSimple(session);
  const secure = env.PUBLIC_URL?.startsWith('https:') ?? false;
  app.use(
    '/api',
    session({
      name: 'lobewright.sid',
      store: new PgStore({ pool: sessionPool, tableName: 'session', createTableIfMissing: false }),
      secret: env.SESSION_SECRET,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: { httpOnly: true, sameSite: 'strict', secure, maxAge: 14 * 24 * 3600 * 1000 },
    }),
  );
  const p = configurePassport(db);
  app.use('/api', p.initialize(), p.session());
  app.use('/api', express.json({ limit: '1mb' }));
  app.use('/api', csrfProtection);

  app.use('/api/auth', authRoutes(db, env, p, mailer));
  app.use('/api/account', accountRoutes(db, env, mailer));
  const invitations = invitationRoutes(db, env, mailer);
  app.use('/api/projects', invitations.project);
  app.use('/api/invitations', invitations.invitation);
  app.use('/api/admin', adminRoutes(db));
  app.use('/api/projects', projectRoutes(db, jobs?.enqueueRerender ?? null));
  app.use('/api/projects', projectExportRoutes(db, jobs?.enqueueExport ?? null));
  app.use('/api/projects', projectBundleRoutes(db));
  app.use('/api/projects', projectDatasetRoutes(db));
  app.use('/api/datasets', datasetRoutes(db));
  app.use('/api/exports', exportRoutes(db));
  app.use('/api/figures', figureRoutes(db));
  app.use('/api/figures', reviewRoutes(db, env, mailer));
  app.use('/api/figures', figureBundleRoutes(db));
  app.use('/api', notFoundHandler);

  if (env.CLIENT_DIST) {
    const dist = path.resolve(env.CLIENT_DIST);
    app.use(express.static(dist, { index: false, maxAge: '1h' }));
    app.get(/^\/(?!api\/).*/, (_req, res) => res.sendFile(path.join(dist, 'index.html')));
  }
  app.use(errorHandler);

  return {
    app,
    close: async () => {
      await sessionPool.end();
    },
  };
}
