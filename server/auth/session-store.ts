import session from "express-session";
import connectPgSimple from "connect-pg-simple";
import type { Request } from "express";
import type pg from "pg";
import { ACTOR_COLUMNS, actorFromRow, type Actor, type ActorRow } from "./actor";

/** Where the store hands the signed-in user to passport; non-enumerable, so never written back to the row. */
export const ACTOR_KEY = "__actor";

declare module "express-session" {
  interface SessionData {
    [ACTOR_KEY]?: Actor | null;
  }
}

const PgStore = connectPgSimple(session);
type PgStoreOptions = ConstructorParameters<typeof PgStore>[0];

/**
 * connect-pg-simple, except that reading a session also reads its user and organisation
 * in the same query: one database round trip per signed-in request instead of three.
 */
export class SessionStore extends PgStore {
  private readonly db: pg.Pool;

  constructor(options: PgStoreOptions & { pool: pg.Pool }) {
    super(options);
    this.db = options.pool;
  }

  override get(sid: string, callback: (err: unknown, session?: session.SessionData | null) => void): void {
    this.db
      .query<{ sess: session.SessionData } & ActorRow>({
        // Named: PostgreSQL parses and plans it once per connection, not once per request.
        name: "hatchway_session_get",
        text: `SELECT s.sess, ${ACTOR_COLUMNS}
           FROM session s
           LEFT JOIN app_user u ON u.id = (s.sess->'passport'->>'user')::uuid
           LEFT JOIN organization o ON o.id = u.organization_id
          WHERE s.sid = $1 AND s.expire >= now()`,
        values: [sid],
      })
      .then(({ rows }) => {
        const row = rows[0];
        if (!row) return callback(null, null);
        callback(null, { ...row.sess, [ACTOR_KEY]: actorFromRow(row) });
      })
      .catch((err) => callback(err));
  }

  /**
   * The user read with the session rides on the request's session as a non-enumerable property:
   * express-session hashes the enumerable data twice per request to see whether it changed, and
   * the user is not session data.
   */
  override createSession(req: Request, sess: session.SessionData): session.Session & Partial<session.SessionData> {
    const actor = sess[ACTOR_KEY];
    delete sess[ACTOR_KEY];
    const created = super.createSession(req, sess);
    if (actor !== undefined)
      Object.defineProperty(created, ACTOR_KEY, {
        value: actor,
        enumerable: false,
        writable: true,
        configurable: true,
      });
    return created;
  }
}
