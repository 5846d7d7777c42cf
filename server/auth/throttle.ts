import { RateLimiterPostgres } from "rate-limiter-flexible";
import type pg from "pg";
import type { Env } from "../env";
import { HttpError } from "../http/errors";

/** The window in which failures from one address are counted towards slowing it down. */
const ADDRESS_WINDOW_S = 3600;

/**
 * Failed sign-ins, counted in PostgreSQL (table `auth_throttle`) so every server shares them,
 * as the OWASP Authentication Cheat Sheet ("Account Lockout", "Protect against automated
 * attacks") [published] suggests (D22):
 * - per account and address: after LOGIN_MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS failures, that
 *   address may not try that account for LOGIN_BLOCK_MINUTES — the guesser is stopped, the
 *   account's owner elsewhere is not;
 * - per account, from anywhere: after LOGIN_MAX_FAILURES_PER_ACCOUNT failures (a guess spread
 *   over many addresses) the account is locked for LOGIN_BLOCK_MINUTES;
 * - per address, across accounts: after LOGIN_MAX_FAILURES_PER_IP failures in an hour, each
 *   further failure makes the address wait twice as long as the last one before its next
 *   attempt (1 s, 2 s, 4 s … up to LOGIN_ADDRESS_DELAY_MAX_SECONDS). A school or office behind
 *   one address is slowed, never locked out of every account for the full block.
 * The right password during any of these waits does not sign in.
 */
export function createLoginThrottle(pool: pg.Pool, env: Env) {
  const block = env.LOGIN_BLOCK_MINUTES * 60;
  const common = { storeClient: pool, storeType: "pool", tableName: "auth_throttle", tableCreated: true };
  const byAccount = new RateLimiterPostgres({
    ...common,
    keyPrefix: "acct",
    points: env.LOGIN_MAX_FAILURES_PER_ACCOUNT,
    duration: block,
  });
  const byAccountAndAddress = new RateLimiterPostgres({
    ...common,
    keyPrefix: "acctip",
    points: env.LOGIN_MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS,
    duration: block,
  });
  const byAddress = new RateLimiterPostgres({
    ...common,
    keyPrefix: "ip",
    points: env.LOGIN_MAX_FAILURES_PER_IP,
    duration: ADDRESS_WINDOW_S,
  });
  const addressWait = new RateLimiterPostgres({ ...common, keyPrefix: "ipwait", points: 1, duration: 1 });
  const pair = (accountKey: string, ip: string) => `${ip}|${accountKey}`;

  const waitFor = async (limiter: RateLimiterPostgres, key: string, limit: number) => {
    const state = await limiter.get(key);
    return state && state.consumedPoints >= limit ? state.msBeforeNext : 0;
  };

  return {
    /** Throws 429 with Retry-After while the account, the pair or the address must wait. */
    async assertAllowed(accountKey: string, ip: string): Promise<void> {
      const [account, accountAndAddress, address] = await Promise.all([
        waitFor(byAccount, accountKey, env.LOGIN_MAX_FAILURES_PER_ACCOUNT),
        waitFor(byAccountAndAddress, pair(accountKey, ip), env.LOGIN_MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS),
        waitFor(addressWait, ip, 1),
      ]);
      const waitMs = Math.max(account, accountAndAddress, address);
      if (waitMs <= 0) return;
      const seconds = Math.max(1, Math.ceil(waitMs / 1000));
      const when = seconds < 90 ? `${seconds} second${seconds === 1 ? "" : "s"}` : `${Math.ceil(seconds / 60)} minutes`;
      const why =
        address === waitMs
          ? "Too many failed sign-ins from this network."
          : "Too many failed sign-ins for this e-mail address.";
      throw new HttpError(429, "too_many_attempts", `${why} Try again in ${when}.`, undefined, {
        "Retry-After": String(seconds),
      });
    },

    async recordFailure(accountKey: string, ip: string): Promise<void> {
      const [, , address] = await Promise.all([
        byAccount.penalty(accountKey, 1),
        byAccountAndAddress.penalty(pair(accountKey, ip), 1),
        byAddress.penalty(ip, 1),
      ]);
      const beyond = address.consumedPoints - env.LOGIN_MAX_FAILURES_PER_IP;
      if (beyond > 0) {
        const delay = Math.min(2 ** Math.min(beyond - 1, 30), env.LOGIN_ADDRESS_DELAY_MAX_SECONDS);
        await addressWait.block(ip, delay);
      }
    },

    /** A success clears the account's counts; the address's count stays (a guesser's own account must not reset it). */
    async recordSuccess(accountKey: string, ip: string): Promise<void> {
      await Promise.all([byAccount.delete(accountKey), byAccountAndAddress.delete(pair(accountKey, ip))]);
    },
  };
}

export type LoginThrottle = ReturnType<typeof createLoginThrottle>;
