import { createHash } from "node:crypto";
import { Router, type Request, type Response, type NextFunction } from "express";
import type passport from "passport";
import { loginSchema, setPasswordSchema } from "@shared/schemas/auth";
import { emailKey } from "@shared/schemas/common";
import type { AppContext } from "../../context";
import { UserSchema } from "../../db/entities/user.entity";
import { PasswordTokenSchema } from "../../db/entities/password-token.entity";
import { HttpError, unavailable } from "../../http/errors";
import { parse } from "../../http/validate";
import { csrfTokenFor } from "../../http/security";
import { presentActor, type Actor } from "../../auth/actor";
import { abilitiesOf } from "../../policies/user.policy";
import { createLoginThrottle } from "../../auth/throttle";
import { hashPassword } from "../../auth/passwords";

/** One answer for unknown e-mail, wrong password and disabled account. */
const invalidCredentials = () =>
  new HttpError(401, "invalid_credentials", "That e-mail and password do not match an active account.");

function authenticate(
  auth: passport.PassportStatic,
  req: Request,
  res: Response,
  next: NextFunction,
): Promise<Actor | false> {
  return new Promise((resolve, reject) => {
    auth.authenticate("local", { session: false }, (err: unknown, user: Actor | false) =>
      err ? reject(err) : resolve(user),
    )(req, res, next);
  });
}

function logIn(req: Request, user: Actor): Promise<void> {
  // passport regenerates the session id here; keepSessionInfo carries the CSRF token over.
  return new Promise((resolve, reject) =>
    req.logIn(user, { session: true, keepSessionInfo: true }, (err) => (err ? reject(err) : resolve())),
  );
}

export function authRouter(ctx: AppContext, auth: passport.PassportStatic): Router {
  const router = Router();
  const throttle = createLoginThrottle(ctx.pool, ctx.env);

  // The token is only worth handing out once the session that holds it is stored: otherwise
  // every later request would be refused with a token that never works.
  router.get("/csrf", (req, res, next) => {
    const csrfToken = csrfTokenFor(req.session);
    req.session.save((err) => {
      if (err) {
        console.error("[session] could not store a session", (err as Error).message);
        return next(
          unavailable("Signing in is not possible right now: the session could not be stored. Try again in a minute."),
        );
      }
      res.json({ csrfToken });
    });
  });

  router.post("/login", async (req, res, next) => {
    const input = parse(loginSchema, req.body);
    const key = emailKey(input.email);
    const ip = req.ip ?? "unknown";
    await throttle.assertAllowed(key, ip);
    const user = await authenticate(auth, req, res, next);
    if (!user) {
      await throttle.recordFailure(key, ip);
      throw invalidCredentials();
    }
    await throttle.recordSuccess(key, ip);
    await logIn(req, user);
    req.session.createdAt = Date.now();
    req.session.lastSeenAt = Date.now();
    res.json({ user: presentActor(user) });
  });

  router.post("/logout", (req, res, next) => {
    req.logout((err) => {
      if (err) return next(err);
      req.session.destroy((destroyErr) => {
        if (destroyErr) return next(destroyErr);
        res.clearCookie(ctx.env.SECURE_COOKIES ? "__Host-hatchway" : "hatchway.sid", {
          path: "/",
          secure: ctx.env.SECURE_COOKIES,
          httpOnly: true,
          sameSite: "lax",
        });
        // The browser forgets what this session left behind: cached records, cookies, storage.
        res.setHeader("Clear-Site-Data", '"cache", "cookies", "storage"');
        res.status(204).end();
      });
    });
  });

  router.get("/me", (req, res) => {
    if (!req.user) throw new HttpError(401, "unauthenticated", "Please sign in.");
    res.json({ user: presentActor(req.user), abilities: abilitiesOf(req.user) });
  });

  // The link in an invitation e-mail: a one-time token to choose a password.
  router.post("/password", async (req, res) => {
    const input = parse(setPasswordSchema, req.body);
    const tokenHash = createHash("sha256").update(input.token).digest("hex");
    const token = await req.em.findOne(PasswordTokenSchema, { tokenHash }, { populate: ["user"] });
    if (!token || token.usedAt || token.expiresAt.getTime() < Date.now()) {
      throw new HttpError(
        400,
        "invalid_token",
        "This link has expired or was already used. Ask an administrator for a new invitation.",
        { field: "token" },
      );
    }
    const user = await req.em.findOneOrFail(UserSchema, { id: token.user.id });
    user.passwordHash = await hashPassword(input.password);
    token.usedAt = new Date();
    await req.em.flush();
    res.status(204).end();
  });

  return router;
}
