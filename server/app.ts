import express from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { AppConfig } from './config';
import type { ServiceContext } from './context';
import { authRouter } from './features/auth/auth.router';
import { healthRouter } from './features/health/health.router';
import { runQueuedAction } from './features/idempotency/queued-action';
import { offlineRouter } from './features/offline/offline.router';
import { invitationsRouter } from './features/invitations/invitations.router';
import { labelsRouter } from './features/labels/labels.router';
import { binsRouter } from './features/stock/bins.router';
import { estimateRouter } from './features/estimate/estimate.router';
import { assembliesRouter, buildsRouter, preferencesRouter } from './features/planning/planning.router';
import { alertsRouter } from './features/planning/alerts.router';
import { forecastRouter, planningSettingsRouter, wasteRouter } from './features/planning/forecast.router';
import { placeHold } from './features/tools/holds.service';
import { binCsvRouter, binImportBodyParsers } from './features/stock/stock-csv.router';
import { stockMoneyRouter } from './features/stock/money.router';
import { paymentSettingsRouter } from './features/payments/payment-settings.router';
import { paymentsRouter, paymentsWebhookRouter } from './features/payments/payments.router';
import { mailRouter } from './features/mail/mail.router';
import { passwordResetRouter } from './features/password-reset/password-reset.router';
import { myPinRouter, peopleRouter } from './features/people/people.router';
import { referenceRouter } from './features/reference/reference.router';
import { cribSettingsRouter } from './features/tools/crib-settings.router';
import { loansRouter } from './features/tools/loans.router';
import { overdueRouter } from './features/tools/overdue.router';
import { serviceDueRouter } from './features/tools/service-due.router';
import { photosRouter, toolPhotosRouter } from './features/tools/photos.router';
import { signoffsRouter } from './features/tools/signoffs.router';
import { stationSessionRouter, stationsRouter } from './features/stations/stations.router';
import { toolsRouter } from './features/tools/tools.router';
import { certificateRouter } from './lan/certificate.router';
import { todayRouter } from './today/today.router';
import { loadUser, requireRole } from './middleware/auth';
import { csrf } from './middleware/csrf';
import { noStore } from './middleware/cache-control';
import { compressJson } from './middleware/compress-json';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { signInLimiters } from './middleware/rate-limit';
import { sessionMiddleware } from './middleware/session';
import { stationSession } from './middleware/station-session';
import { wellFormedPath } from './middleware/well-formed-path';
import { clientStatic } from './static/client-static';
import { installReactions } from './events/reactions';

/** Link tokens never reach the logs. */
const hideTokens = (url: string) => url.replace(/[A-Za-z0-9_-]{43}/g, '[token]');

/** Builds the whole app from a config; it does not listen (server/index.ts does). */
export function createApp(config: AppConfig) {
  installReactions();
  const app = express();
  if (config.trustProxyHops > 0) app.set('trust proxy', config.trustProxyHops);
  app.disable('x-powered-by');

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // The station checks a badge and PIN against its copy with WebAssembly (SHA-256, argon2id); no other eval.
          'script-src': ["'self'", "'wasm-unsafe-eval'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'media-src': ["'self'", 'blob:'],
          'upgrade-insecure-requests': config.secureCookies ? [] : null,
        },
      },
      strictTransportSecurity: config.secureCookies,
    }),
  );
  app.use(
    pinoHttp({
      logger: config.logger,
      serializers: {
        req: (req: { method: string; url: string }) => ({ method: req.method, url: hideTokens(req.url) }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
    }),
  );
  app.use(wellFormedPath);

  const ctx: ServiceContext = {
    db: config.db,
    publicUrl: config.publicUrl,
    now: config.now ?? (() => new Date()),
  };
  const { middleware: session, store } = sessionMiddleware(config);

  // The provider's webhook reads its raw body and carries no session: it goes ahead of the API stack.
  app.use('/api/payments/webhook', noStore, paymentsWebhookRouter(ctx, config.payments));

  const api = express.Router();
  api.use(noStore);
  api.use(compressJson());
  api.use((req, _res, next) => {
    req.ctx = ctx;
    next();
  });
  api.use('/health', healthRouter());
  api.use(session);
  api.use(loadUser(config.db));
  // A station session answers only the station's own list of requests.
  api.use(stationSession);
  // CSV imports may be large: only a signed-in quartermaster's body is read past the usual limit.
  api.use('/bins/import', requireRole('quartermaster'), binImportBodyParsers());
  api.use(express.json({ limit: '100kb' }));
  api.use(csrf.csrfSynchronisedProtection);
  api.use('/auth', authRouter(signInLimiters(config.rateLimit)));
  api.use('/auth/password-reset', passwordResetRouter());
  api.use('/invitations', invitationsRouter());
  api.use('/users', peopleRouter());
  api.use('/stations', stationsRouter());
  api.use('/station', stationSessionRouter());
  api.use('/mail', mailRouter(config.catchingMail));
  api.use('/reference', referenceRouter());
  api.use('/tools', toolPhotosRouter());
  // Check out, return, draw and return unused may be replayed from a phone's offline queue.
  api.use('/tools', toolsRouter({ runQueuedAction }));
  api.use('/photos', photosRouter());
  api.use('/loans', loansRouter());
  api.use('/overdue', overdueRouter());
  api.use('/service-due', serviceDueRouter());
  api.use('/signoffs', signoffsRouter());
  api.use('/settings/planning', planningSettingsRouter());
  api.use('/settings', cribSettingsRouter());
  api.use('/labels', labelsRouter());
  api.use('/bins', binCsvRouter());
  api.use('/bins', binsRouter({ runQueuedAction }));
  api.use('/stock', stockMoneyRouter());
  api.use('/payments/settings', paymentSettingsRouter(config.payments));
  api.use('/payments', paymentsRouter(config.payments));
  api.use('/estimate', estimateRouter());
  api.use('/builds', buildsRouter());
  // Holds belong to the crib: the app hands its rule to the planning feature.
  api.use('/assemblies', assembliesRouter({ placeHold }));
  api.use('/me', preferencesRouter());
  api.use('/me', myPinRouter());
  api.use('/forecast', forecastRouter());
  api.use('/alerts', alertsRouter());
  api.use('/waste', wasteRouter());
  api.use('/today', todayRouter());
  api.use('/offline', offlineRouter());
  api.use(apiNotFound);
  app.use('/api', api);
  app.use(certificateRouter(config.certificateDownload));

  if (config.clientDir) app.use(clientStatic(config.clientDir));

  app.use(errorHandler);
  return Object.assign(app, { sessionStore: store });
}

export type App = ReturnType<typeof createApp>;
