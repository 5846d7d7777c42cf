import { RateLimiterPostgres } from "rate-limiter-flexible";
import type pg from "pg";
import type { Env } from "../env";
import { HttpError } from "../http/errors";

/**
 * Failed sign-ins are counted per account and per IP address in PostgreSQL (table
 * `auth_throttle`, created by a migration), so every server shares the same counts.
 */
export function createLoginThrottle(pool: pg.Pool, env: Env) {
  const duration = env.LOGIN_BLOCK_MINUTES * 60;
  const common = {
    storeClient: pool,
    storeType: "pool",
    tableName: "auth_throttle",
    tableCreated: true,
    duration,
    blockDuration: duration,
  };
  const byAccount = new RateLimiterPostgres({
    ...common,
    keyPrefix: "acct",
    points: env.LOGIN_MAX_FAILURES_PER_ACCOUNT,
  });
  const byIp = new RateLimiterPostgres({ ...common, keyPrefix: "ip", points: env.LOGIN_MAX_FAILURES_PER_IP });

  return {
    /** Throws 429 with Retry-After when the account or the address is blocked. */
    async assertAllowed(accountKey: string, ip: string): Promise<void> {
      const [acct, addr] = await Promise.all([byAccount.get(accountKey), byIp.get(ip)]);
      const waits = [
        acct && acct.consumedPoints >= env.LOGIN_MAX_FAILURES_PER_ACCOUNT ? acct.msBeforeNext : 0,
        addr && addr.consumedPoints >= env.LOGIN_MAX_FAILURES_PER_IP ? addr.msBeforeNext : 0,
      ];
      const waitMs = Math.max(...waits);
      if (waitMs > 0) {
        const seconds = Math.max(1, Math.ceil(waitMs / 1000));
        throw new HttpError(
          429,
          "too_many_attempts",
          `Too many sign-in attempts. Try again in ${Math.ceil(seconds / 60)} minute(s).`,
          undefined,
          { "Retry-After": String(seconds) },
        );
      }
    },
    async recordFailure(accountKey: string, ip: string): Promise<void> {
      await Promise.all([byAccount.penalty(accountKey, 1), byIp.penalty(ip, 1)]);
    },
    async recordSuccess(accountKey: string): Promise<void> {
      await byAccount.delete(accountKey);
    },
  };
}

export type LoginThrottle = ReturnType<typeof createLoginThrottle>;
