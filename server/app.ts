import express, { type Express } from "express";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { AppBase, AppContext } from "./context";
import { composeApp, isComposed } from "./composition";
import { correlationId, errorHandler, notFoundApi } from "./http/errors";
import { csrfProtection, noSourceMaps, noStore, requireJsonBody, securityHeaders } from "./http/security";
import { jsonBody, wellFormedAddress } from "./http/well-formed-text";
import { configurePassport, sessionMiddleware } from "./auth/session";
import { healthRouter } from "./routes/health/health.router";
import { signupRouter } from "./routes/signup/signup.router";
import { accountRouter } from "./routes/account/account.router";
import { authRouter } from "./routes/auth/auth.router";
import { usersRouter } from "./routes/users/users.router";
import { organizationsRouter } from "./routes/organizations/organizations.router";
import { caughtMailRouter } from "./routes/mail/mail.router";
import { queryCounter } from "./http/query-count";
import { clientFiles } from "./http/client-files";
import { taxaRouter } from "./routes/taxa/taxa.router";
import { transfersRouter } from "./routes/transfers/transfers.router";
import { runsRouter } from "./routes/runs/runs.router";
import {
  isRegisterImport,
  REGISTER_IMPORT_TYPES,
  registerCsvRoute,
  registerRouter,
} from "./routes/register/register.router";
import { directoryRouter } from "./routes/directory/directory.router";
import { complianceRouter } from "./routes/compliance/compliance.router";
import { temperatureRouter } from "./routes/temperature/temperature.router";
import { isScanUpload, SCAN_UPLOAD_TYPES } from "./routes/documents/scan-upload";
import { isPhotoUpload, PHOTO_UPLOAD_TYPES } from "./routes/transfers/photo-upload";

/**
 * Builds the Express app (no listen): the API under /api and the built client for everything else.
 * Give it a context from `composeApp` (server/composition.ts), or the bare environment and database
 * clients and it composes one; either way the routers only read what the context holds.
 */
export function createApp(input: AppContext | AppBase): Express {
  const ctx = isComposed(input) ? input : composeApp(input);
  const app = express();
  app.disable("x-powered-by");
  app.locals.ctx = ctx;
  if (ctx.env.TRUST_PROXY_HOPS > 0) app.set("trust proxy", ctx.env.TRUST_PROXY_HOPS);

  app.use(correlationId);
  app.use(securityHeaders({ https: ctx.env.SECURE_COOKIES }));

  const api = express.Router();
  if (ctx.env.BENCH_ROUTES) api.use(queryCounter(ctx));
  api.use(noStore);
  api.use(wellFormedAddress);
  api.use("/health", healthRouter(ctx));
  if (ctx.env.BENCH_ROUTES) {
    // The benchmark's ceiling: Express plus one pg round trip, no session, no ORM.
    api.get("/__bench/select1", async (_req, res) => {
      const { rows } = await ctx.pool.query("SELECT 1 AS one");
      res.json(rows[0]);
    });
  }
  const json = jsonBody();
  const onlyJson = requireJsonBody();
  const scanUploadBody = requireJsonBody(SCAN_UPLOAD_TYPES);
  const photoUploadBody = requireJsonBody(PHOTO_UPLOAD_TYPES);
  const registerImportBody = requireJsonBody(REGISTER_IMPORT_TYPES);
  api.use((req, res, next) =>
    (isScanUpload(req)
      ? scanUploadBody
      : isPhotoUpload(req)
        ? photoUploadBody
        : isRegisterImport(req)
          ? registerImportBody
          : onlyJson)(req, res, next),
  );
  api.use(json);
  // One EntityManager per request (MikroORM's request context), forked on first use only; the
  // getter lives on this app's request prototype, so a request that needs no ORM pays nothing.
  Object.defineProperty(app.request, "em", {
    get(this: express.Request & { _em?: EntityManager }) {
      return (this._em ??= ctx.orm.em.fork());
    },
    configurable: true,
  });
  api.use((req, _res, next) => {
    req.ctx = ctx;
    next();
  });
  const auth = configurePassport(ctx);
  api.use(sessionMiddleware(ctx));
  api.use(auth.initialize());
  api.use(auth.session());
  api.use(csrfProtection([new URL(ctx.env.PUBLIC_URL).origin]));

  api.use("/auth", authRouter(ctx, auth));
  api.use("/signup", signupRouter(ctx));
  api.use("/account", accountRouter(ctx));
  api.use("/users", usersRouter(ctx));
  api.use("/organizations", organizationsRouter(ctx));
  api.use("/dev/mail", caughtMailRouter(ctx));
  api.use("/taxa", taxaRouter(ctx));
  api.use("/transfers", transfersRouter());
  api.use("/runs", runsRouter());
  api.use(registerCsvRoute());
  api.use("/register", registerRouter(ctx));
  api.use("/directory", directoryRouter());
  api.use(complianceRouter(ctx));
  api.use(temperatureRouter(ctx));
  api.use(notFoundApi);
  app.use("/api", api);

  const client = clientFiles(ctx.env.CLIENT_DIST);
  // Source maps are never served, however the path is spelled (D22).
  if (client) app.use(noSourceMaps, client);

  app.use(errorHandler);
  return app;
}
