import path from "node:path";
import { existsSync } from "node:fs";
import express from "express";
import helmet from "helmet";
import type { Db } from "@takeup/db";
import type { AppConfig } from "./config.ts";
import { createAuth } from "./auth.ts";
import type { Deps } from "./deps.ts";
import type { Mailer } from "./lib/mailer.ts";
import { logger } from "./lib/logger.ts";
import { buildOpenApi } from "./lib/openapi.ts";
import { createSessionReader } from "./lib/session.ts";
import { SignInThrottle, type ThrottlePolicy } from "./lib/sign-in-throttle.ts";
import { HttpError } from "./lib/http-error.ts";
import { databaseProbe } from "./lib/database-probe.ts";
import { errorHandler, notFoundJson } from "./middleware/error-handler.ts";
import { sameOrigin } from "./middleware/same-origin.ts";
import { auditRouter } from "./routes/audit/audit.router.ts";
import { clientsRouter } from "./routes/clients/clients.router.ts";
import { devMailRouter } from "./routes/dev-mail/dev-mail.router.ts";
import { healthRouter } from "./routes/health/health.router.ts";
import { invitationsRouter } from "./routes/invitations/invitations.router.ts";
import { meRouter, sessionRouter } from "./routes/session/session.router.ts";
import { staffRouter } from "./routes/staff/staff.router.ts";
import { studioRouter } from "./routes/studio/studio.router.ts";
import { roomsRouter } from "./routes/rooms/rooms.router.ts";
import { equipmentRouter } from "./routes/equipment/equipment.router.ts";
import { engineerRatesRouter, engineersRouter } from "./routes/engineer-rates/engineer-rates.router.ts";
import { projectsRouter } from "./routes/projects/projects.router.ts";
import { bookingRequestsRouter, bookingsRouter, quotesRouter } from "./routes/bookings/bookings.router.ts";
import { calendarFeedsRouter, feedsRouter } from "./routes/calendar-feeds/calendar-feeds.router.ts";
import { timeClockRouter, timeEditsRouter, timeEntriesRouter } from "./routes/time-clock/time-clock.router.ts";
import { payPeriodsRouter, payRatesRouter, payrollSettingsRouter } from "./routes/payroll/payroll.router.ts";
import { tapeRouter } from "./routes/tape/tape.router.ts";
import { billableRouter, depositInvoicesRouter, invoiceSettingsRouter, invoicesRouter, receivablesRouter } from "./routes/invoices/invoices.router.ts";
import { recordersRouter, reelsRouter, vaultSettingsRouter } from "./routes/vault/vault.router.ts";

export type AppDeps = { db: Db; config: AppConfig; mailer: Mailer; throttlePolicy?: Partial<ThrottlePolicy> };

/** Every API router, in mount order; the OpenAPI document and the access tests read this list. */
export function apiRouters(deps: Deps) {
  return [
    healthRouter(deps),
    sessionRouter(deps),
    meRouter(deps),
    invitationsRouter(deps),
    studioRouter(deps),
    staffRouter(deps),
    clientsRouter(deps),
    projectsRouter(deps),
    roomsRouter(deps),
    equipmentRouter(deps),
    engineerRatesRouter(deps),
    engineersRouter(deps),
    quotesRouter(deps),
    bookingsRouter(deps),
    bookingRequestsRouter(deps),
    calendarFeedsRouter(deps),
    feedsRouter(deps),
    timeClockRouter(deps),
    timeEntriesRouter(deps),
    timeEditsRouter(deps),
    payPeriodsRouter(deps),
    payrollSettingsRouter(deps),
    payRatesRouter(deps),
    tapeRouter(deps),
    reelsRouter(deps),
    recordersRouter(deps),
    vaultSettingsRouter(deps),
    auditRouter(deps),
    invoicesRouter(deps),
    billableRouter(deps),
    depositInvoicesRouter(deps),
    receivablesRouter(deps),
    invoiceSettingsRouter(deps),
    devMailRouter(deps),
  ];
}

/** A path whose percent-encoding does not decode (`/api/clients/%`, `/assets/%`) is a 400, on every route. */
const refuseUndecodablePaths: express.RequestHandler = (req, _res, next) => {
  try {
    decodeURIComponent(req.path);
  } catch {
    throw new HttpError(400, "bad_path", "The address has a broken %-escape", [
      { field: "(path)", rule: "percent_encoding", message: "Write % as %25" },
    ]);
  }
  next();
};

/** Builds the app without listening: server.ts listens, tests drive it with supertest. */
export function createApp({ db, config, mailer, throttlePolicy }: AppDeps) {
  const throttle = new SignInThrottle(db, throttlePolicy);
  const auth = createAuth(db, config, mailer);
  const deps: Deps = { db, config, mailer, auth, throttle };
  const sessions = createSessionReader(auth, db);
  const routers = apiRouters(deps);
  const databaseReachable = databaseProbe(db);
  const openApi = buildOpenApi(routers.flatMap((r) => r.routes));

  const app = express();
  app.disable("x-powered-by");
  app.set("trust proxy", config.trustProxy);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: { "img-src": ["'self'", "data:"], "connect-src": ["'self'"], "upgrade-insecure-requests": null },
      },
      strictTransportSecurity: config.appUrl.startsWith("https://"),
    }),
  );
  app.use(refuseUndecodablePaths);
  app.use("/api", sameOrigin([config.appUrl]));
  // better-auth's own HTTP handler is not mounted at all (decision 008): our routes call auth.api.*,
  // so no spelling of a path can reach one of its endpoints past our throttle and limits.
  app.use("/api", express.json({ limit: "200kb" }));
  app.get("/api/openapi.json", (_req, res) => {
    res.json(openApi);
  });
  // Tests parse every answer against its contract, so a response that drifts fails a test.
  const checkResponses = config.checkResponses ?? process.env.NODE_ENV === "test";
  for (const router of routers) app.use(router.base, router.toExpress(sessions, { checkResponses }));
  app.use("/api", notFoundJson);

  if (config.webDist && existsSync(path.join(config.webDist, "index.html"))) {
    const indexHtml = path.join(config.webDist, "index.html");
    // The build makes no source maps (vite.config.ts); should one appear in dist, it still stays private.
    app.get(/\.map$/i, () => {
      throw new HttpError(404, "not_found", "No such file");
    });
    app.use("/assets", express.static(path.join(config.webDist, "assets"), { immutable: true, maxAge: "1y" }));
    app.use(express.static(config.webDist, { index: false }));
    // "/{*splat}" also matches "/" itself, which "/*splat" does not in Express 5.
    app.get("/{*splat}", (_req, res) => {
      res.setHeader("cache-control", "no-cache");
      res.sendFile(indexHtml);
    });
  }

  app.use(errorHandler(logger, databaseReachable));
  return Object.assign(app, { routes: routers.flatMap((r) => r.routes), auth });
}
