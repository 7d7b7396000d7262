import cookieParser from 'cookie-parser';
import express, { type Express } from 'express';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import type { DataSource } from 'typeorm';
import { apiRoutes } from '@gelpoint/contracts';
import type { Config } from './config';
import { createLogger } from './logger';
import { compressAnswers } from './http/compress-answers';
import { AppError, errorHandler } from './http/errors';
import { openApiDocument } from './http/openapi';
import { originCheck } from './http/origin-check';
import { perMemberLimit } from './http/rate-limits';
import { RouteRegistry } from './http/route-registry';
import { securityHeaders } from './http/security-headers';
import { staticWeb } from './http/static-web';
import { auditRoutes } from './modules/audit/audit.routes';
import { resetLimits, signInLimits } from './modules/auth/auth-rate-limit';
import { authRoutes } from './modules/auth/auth.routes';
import { healthRoutes } from './modules/health/health.routes';
import { mailDomainOf } from '@gelpoint/db';
import { pieceRoutes } from './modules/pieces/pieces.routes';
import { moldRoutes } from './modules/molds/molds.routes';
import { MoldProgressHub } from './modules/molds/mold-progress-hub';
import { Molds } from './modules/molds/molds.service';
import { StlChecker } from './modules/molds/stl-check';
import { pourPlanRoutes } from './modules/pour-plans/pour-plans.routes';
import { exothermRoutes } from './modules/exotherm/exotherm.routes';
import { PourPlans } from './modules/pour-plans/pour-plans.service';
import { pourRoutes } from './modules/pours/pours.routes';
import { calendarRoutes } from './modules/calendar/calendar.routes';
import { CalendarFeeds } from './modules/calendar/calendar.service';
import { pourExportRoutes } from './modules/pours/pour-export.routes';
import { PourLog } from './modules/pours/pour-log.service';
import { Pours } from './modules/pours/pours.service';
import { shelfRoutes } from './modules/shelf/shelf.routes';
import { shopRoutes } from './modules/shop/shop.routes';
import { teamRoutes } from './modules/team/team.routes';
import { UploadQuota } from './modules/uploads/upload-quota';

export interface AppDeps {
  ds: DataSource;
  config: Config;
  logger?: Logger;
}

export interface GelpointApp {
  app: Express;
  registry: RouteRegistry;
  /** Ends the event streams (browsers reconnect elsewhere) and their database connection: call it on shutdown. */
  close(): void;
}

/** The whole HTTP application, without listening: tests mount it on port 0. */
export function createApp({ ds, config, logger = createLogger(config.logLevel) }: AppDeps): GelpointApp {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxy);
  app.use(securityHeaders());
  app.use(pinoHttp({ logger, autoLogging: { ignore: (req) => req.url === '/api/health' } }));

  const api = express.Router();
  api.use(compressAnswers());
  api.use(express.json({ limit: '100kb', strict: true }));
  api.use(cookieParser());
  api.use(originCheck());
  api.use((_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  });

  const signIn = signInLimits(ds, config.authRatePer15Min);
  api.post(['/auth/login', '/auth/register', '/auth/password-reset/confirm', '/invitations/:token/accept'], signIn.perAddress, signIn.perAccount);
  const resets = resetLimits(ds, config.authRatePer15Min);
  api.post('/auth/password-reset', resets.perAddress, resets.perAccount);

  const settings = {
    jwtSecret: config.jwtSecret,
    sessionHours: config.sessionHours,
    secureCookies: config.publicUrl.startsWith('https://'),
    publicUrl: config.publicUrl,
    mailDomain: mailDomainOf(config.publicUrl),
    resetMinutes: config.resetMinutes,
    invitationDays: config.invitationDays,
  };
  const registry = new RouteRegistry(api, ds, config.jwtSecret);
  healthRoutes(registry, ds);
  authRoutes(registry, ds, settings);
  shopRoutes(registry, ds);
  teamRoutes(registry, ds, settings);
  pieceRoutes(registry, ds);
  auditRoutes(registry, ds);
  shelfRoutes(registry, ds);
  const quota = new UploadQuota(config.uploadQuotaBytes);
  const uploadLimit = perMemberLimit(ds, config.uploadsPerHour);
  const molds = new Molds(ds, new StlChecker(config.maxStlTriangles, config.maxUnpackedBytes), quota, config.analyseOnUpload, logger);
  const progress = new MoldProgressHub(config.databaseUrl, logger);
  moldRoutes(registry, molds, config.maxStlBytes, uploadLimit, { ds, hub: progress, heartbeatMs: config.eventsHeartbeatMs });
  pourPlanRoutes(registry, new PourPlans(ds, molds.cavityForPlan));
  exothermRoutes(registry);
  pourRoutes(registry, new Pours(ds, undefined, quota), new PourLog(ds), uploadLimit);
  pourExportRoutes(registry, ds);
  calendarRoutes(registry, ds, new CalendarFeeds(ds, config.publicUrl), settings);
  registry.assertServes(apiRoutes);

  api.get('/openapi.json', (_req, res) => {
    res.json(openApiDocument(registry.routes, `${config.publicUrl}`));
  });
  api.use((req, _res, next) => next(new AppError('not_found', 'no_such_route', `there is no ${req.method} /api${req.path}; see /api/openapi.json`)));
  api.use(errorHandler(logger));

  app.use('/api', api);
  app.use(staticWeb(config.webDist));
  app.use(errorHandler(logger));
  return { app, registry, close: () => progress.close() };
}
