import express, { type Express } from 'express';
import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';
import helmet from 'helmet';
import { csrfSync } from 'csrf-sync';
import { createPool } from 'mysql2';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { DataSource } from 'typeorm';
import type { Config } from './config';
import { RouteRegistrar } from './access/route-registrar';
import { registerAnalyticsRoutes } from './analytics/analytics.router';
import { AnalyticsService } from './analytics/analytics.service';
import { configurePassport } from './auth/passport-setup';
import { registerSessionRoutes } from './auth/session.router';
import { SessionService } from './auth/session.service';
import { registerClubRoutes } from './clubs/clubs.router';
import { ClubsService } from './clubs/clubs.service';
import { registerHealthRoutes } from './health/health.router';
import { registerImportRoutes } from './imports/imports.router';
import { ImportsService } from './imports/imports.service';
import { errorHandler, notFoundHandler } from './http/error-handlers';
import { registerRabbitryRoutes } from './rabbitries/rabbitries.router';
import { RabbitriesService } from './rabbitries/rabbitries.service';
import { registerAnimalRoutes } from './animals/animals.router';
import { AnimalsService } from './animals/animals.service';
import { registerBreedRoutes } from './breeds/breeds.router';
import { BreedsService } from './breeds/breeds.service';
import { registerEvaluationRoutes } from './evaluations/evaluations.router';
import { EvaluationsService } from './evaluations/evaluations.service';
import { registerLitterRoutes } from './litters/litters.router';
import { LittersService } from './litters/litters.service';
import { registerNoteRoutes } from './notes/notes.router';
import { NotesService } from './notes/notes.service';
import { registerPedigreeRoutes } from './pedigree/pedigree.router';
import { PedigreeService } from './pedigree/pedigree.service';
import { PhotoStore } from './photos/photo-store';
import { registerPhotoRoutes } from './photos/photos.router';
import { PhotosService } from './photos/photos.service';
import { registerShowRoutes } from './shows/shows.router';
import { ShowsService } from './shows/shows.service';
import { registerWeightRoutes } from './weights/weights.router';
import { WeightsService } from './weights/weights.service';

export interface AppContext {
  app: Express;
  /** Every API route with its access rule (the access-matrix test walks this). */
  routes: RouteRegistrar['routes'];
  close(): Promise<void>;
}

/** Builds the Express app (no listen): tests import this, server.ts serves it. */
export function createApp(config: Config, db: DataSource): AppContext {
  const app = express();
  app.set('trust proxy', 'loopback');
  app.disable('x-powered-by');

  // 1. Security headers. Angular injects component styles and ECharts sets inline style
  // attributes, so styles need 'unsafe-inline'; scripts come only from our own origin.
  app.use(helmet({
    contentSecurityPolicy: {
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'", 'data:'],
        connectSrc: ["'self'"],
        objectSrc: ["'none'"],
        frameAncestors: ["'none'"],
        baseUri: ["'self'"],
        formAction: ["'self'"],
        upgradeInsecureRequests: config.COOKIE_SECURE ? [] : null,
      },
    },
    crossOriginEmbedderPolicy: false,
  }));

  // 2. Body limits (file uploads have their own limit in the imports feature).
  app.use('/api', express.json({ limit: '1mb' }));

  // 3. Sessions in MariaDB, so API processes stay stateless behind a load balancer.
  const url = new URL(config.DATABASE_URL);
  const pool = createPool({
    host: url.hostname, port: Number(url.port || 3306), user: decodeURIComponent(url.username),
    password: decodeURIComponent(url.password), database: url.pathname.slice(1), connectionLimit: 5,
  });
  const MySQLStore = MySQLStoreFactory(session as never);
  const store = new MySQLStore({ createDatabaseTable: false, clearExpired: true, checkExpirationInterval: 15 * 60_000 }, pool as never);
  app.use('/api', session({
    name: 'kl.sid',
    secret: config.SESSION_SECRET,
    store: store as unknown as session.Store,
    resave: false,
    saveUninitialized: false,
    cookie: { httpOnly: true, sameSite: 'lax', secure: config.COOKIE_SECURE, maxAge: 14 * 24 * 3600_000 },
  }));

  // 4. Authentication, then protection against cross-site requests on every state change.
  const passport = configurePassport(db);
  app.use('/api', passport.initialize(), passport.session());
  const csrf = csrfSync();
  app.use('/api', csrf.csrfSynchronisedProtection);

  // 5. Routes, each with its declared access rule.
  const api = new RouteRegistrar(db);
  registerHealthRoutes(api, db);
  registerSessionRoutes(api, {
    passport, sessions: new SessionService(db), signInLimit: config.SIGNIN_RATE_LIMIT,
    csrf: { generate: (req, overwrite) => csrf.generateToken(req, overwrite) },
  });
  registerRabbitryRoutes(api, new RabbitriesService(db));
  const photos = new PhotoStore(config.DATA_DIR);
  registerBreedRoutes(api, new BreedsService(db));
  registerAnimalRoutes(api, new AnimalsService(db, photos));
  registerPedigreeRoutes(api, new PedigreeService(db));
  registerPhotoRoutes(api, new PhotosService(db, photos));
  registerWeightRoutes(api, new WeightsService(db));
  registerEvaluationRoutes(api, new EvaluationsService(db));
  registerLitterRoutes(api, new LittersService(db));
  registerNoteRoutes(api, new NotesService(db));
  registerShowRoutes(api, new ShowsService(db));
  registerClubRoutes(api, new ClubsService(db));
  registerImportRoutes(api, new ImportsService(db, config.DATA_DIR), { dataDir: config.DATA_DIR, uploadLimitMb: config.UPLOAD_LIMIT_MB });
  registerAnalyticsRoutes(api, new AnalyticsService(db));
  app.use('/api', api.router);
  app.use('/api', notFoundHandler);

  // The built dashboard, with client-side routes falling back to index.html.
  const dist = resolve(config.DASHBOARD_DIST);
  if (existsSync(join(dist, 'index.html'))) {
    app.use(express.static(dist, { index: false, maxAge: '1h' }));
    app.get('/{*splat}', (_req, res) => res.sendFile(join(dist, 'index.html')));
  }

  // 6. Errors, last.
  app.use(notFoundHandler);
  app.use(errorHandler);

  return {
    app,
    routes: api.routes,
    close: async () => {
      await store.close();
    },
  };
}
