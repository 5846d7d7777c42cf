import type { RequestHandler } from "express";
import type pg from "pg";
import session from "express-session";
import passport from "passport";
import { Strategy as LocalStrategy } from "passport-local";
import type { AppContext } from "../context";
import { UserSchema } from "../db/entities/user.entity";
import { emailKey } from "@shared/schemas/common";
import { verifyPassword } from "./passwords";
import { actorFromUser, ACTOR_COLUMNS, actorFromRow, type Actor, type ActorRow } from "./actor";
import { ACTOR_KEY, SessionStore } from "./session-store";

declare module "express-session" {
  interface SessionData {
    lastSeenAt?: number;
  }
}

/** Server-side sessions in PostgreSQL, with idle and absolute timeouts enforced here. */
export function sessionMiddleware(ctx: AppContext): RequestHandler[] {
  const { env } = ctx;
  const store = new SessionStore({
    pool: ctx.pool,
    tableName: "session",
    createTableIfMissing: false,
    // No UPDATE per request: the idle timeout is kept in the session itself (lastSeenAt,
    // written at most once a minute) and the row's expiry is the absolute lifetime.
    disableTouch: true,
    pruneSessionInterval: env.NODE_ENV === "test" ? false : 15 * 60,
  });
  const absoluteMs = env.SESSION_ABSOLUTE_HOURS * 3600_000;
  const idleMs = env.SESSION_IDLE_MINUTES * 60_000;

  const base = session({
    name: env.SECURE_COOKIES ? "__Host-hatchway" : "hatchway.sid",
    secret: env.SESSION_SECRET,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: false,
    proxy: env.SECURE_COOKIES,
    cookie: { httpOnly: true, sameSite: "lax", secure: env.SECURE_COOKIES, path: "/", maxAge: absoluteMs },
  });

  const timeouts: RequestHandler = (req, _res, next) => {
    const s = req.session;
    if (!s) return next();
    const now = Date.now();
    const expired = (s.createdAt && now - s.createdAt > absoluteMs) || (s.lastSeenAt && now - s.lastSeenAt > idleMs);
    if (expired) {
      return s.regenerate((err) => next(err));
    }
    // Touch at most once a minute: saves a write per request and still enforces idle time.
    if (s.createdAt && (!s.lastSeenAt || now - s.lastSeenAt > 60_000)) s.lastSeenAt = now;
    next();
  };
  return [base, timeouts];
}

/** passport-local against our users; every failure looks the same to the caller. */
export function configurePassport(ctx: AppContext): passport.PassportStatic {
  const instance = new passport.Passport() as unknown as passport.PassportStatic;
  instance.use(
    new LocalStrategy({ usernameField: "email", passwordField: "password", session: true }, (email, password, done) => {
      const em = ctx.orm.em.fork();
      em.findOne(UserSchema, { emailKey: emailKey(email) }, { populate: ["organization"] })
        .then(async (user) => {
          const ok = await verifyPassword(user?.passwordHash, password);
          // A sign-up whose address is not yet confirmed cannot sign in (issue 14, §1).
          if (!user || !ok || user.disabled || user.awaitingConfirmation) return done(null, false);
          done(null, actorFromUser(user));
        })
        .catch(done);
    }),
  );
  instance.serializeUser((user, done) => done(null, (user as Actor).id));
  // Arity 3 makes passport pass the request. The session store already read the user in the
  // session's own query; only a session written in this very request needs a lookup.
  const deserialize = (req: Express.Request, id: string, done: (err: unknown, user?: Express.User | false) => void) => {
    const loaded = req.session?.[ACTOR_KEY];
    if (loaded !== undefined) {
      // Left in place: removing it would mark the session modified and cost a write.
      return done(null, loaded && loaded.id === id && !loaded.disabled ? loaded : false);
    }
    ctx.pool
      .query<ActorRow>(
        `SELECT ${ACTOR_COLUMNS} FROM app_user u LEFT JOIN organization o ON o.id = u.organization_id WHERE u.id = $1`,
        [id],
      )
      .then(({ rows }) => {
        const actor = rows[0] ? actorFromRow(rows[0]) : null;
        done(null, actor && !actor.disabled ? actor : false);
      })
      .catch(done);
  };
  instance.deserializeUser(deserialize as never);
  return instance;
}

/**
 * Signs `actor` in on this request's session: passport regenerates the session id (fixation
 * defence) and keepSessionInfo carries the CSRF token over (D5); the timeouts start now.
 */
export async function signInSession(req: Express.Request, actor: Actor): Promise<void> {
  await new Promise<void>((resolve, reject) =>
    req.logIn(actor, { session: true, keepSessionInfo: true }, (err) => (err ? reject(err) : resolve())),
  );
  const now = Date.now();
  if (req.session) {
    req.session.createdAt = now;
    req.session.lastSeenAt = now;
  }
}

/**
 * Ends every stored session of a user except `keepSessionId` (after a password is set by a
 * link or changed): whoever knew the old password is signed out everywhere.
 */
export async function endOtherSessions(pool: pg.Pool, userId: string, keepSessionId: string | null): Promise<number> {
  const { rowCount } = await pool.query(
    `DELETE FROM session WHERE sess->'passport'->>'user' = $1 AND ($2::text IS NULL OR sid <> $2)`,
    [userId, keepSessionId],
  );
  return rowCount ?? 0;
}
