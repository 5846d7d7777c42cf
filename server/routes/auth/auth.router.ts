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
import { createAccountThrottle, createLoginThrottle } from "../../auth/throttle";
import { consumeAccountToken } from "../../auth/tokens";
import { endOtherSessions, signInSession } from "../../auth/session";
import { requestPasswordReset } from "../../services/signup";
import { passwordResetRequestSchema } from "@shared/schemas/account";
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

export function authRouter(ctx: AppContext, auth: passport.PassportStatic): Router {
  const router = Router();
  const throttle = createLoginThrottle(ctx.pool, ctx.env);
  const accountThrottle = createAccountThrottle(ctx.pool, ctx.env);

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
    await signInSession(req, user);
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

  // "Forgot your password?": the same 202 for every address, known or not (issue 14, §1).
  router.post("/password-reset", async (req, res) => {
    const { email } = parse(passwordResetRequestSchema, req.body);
    await accountThrottle.consume("reset", req.ip ?? "unknown", emailKey(email));
    await requestPasswordReset({ em: req.em, email, links: ctx.links });
    ctx.kickOutbox();
    res.status(202).json({ status: "check_your_email" });
  });

  // The link in an invitation or a reset e-mail: a one-time token to choose a password. Every
  // other session of the account ends, so whoever knew the old password is signed out.
  router.post("/password", async (req, res) => {
    const input = parse(setPasswordSchema, req.body);
    await accountThrottle.consume("reset", req.ip ?? "unknown", null);
    const passwordHash = await hashPassword(input.password);
    const userId = await req.em.transactional(async (tx) => {
      const token = await consumeAccountToken(tx, input.token, ["set_password", "reset_password"]);
      const user = await tx.findOneOrFail(UserSchema, { id: token.user!.id });
      user.passwordHash = passwordHash;
      // The link came to this address: it is confirmed now.
      user.awaitingConfirmation = false;
      await tx.nativeUpdate(
        PasswordTokenSchema,
        { user: user.id, purpose: { $in: ["set_password", "reset_password"] }, usedAt: null, id: { $ne: token.id } },
        { usedAt: new Date() },
      );
      return user.id;
    });
    await endOtherSessions(ctx.pool, userId, req.user?.id === userId ? req.sessionID : null);
    res.status(204).end();
  });

  return router;
}
