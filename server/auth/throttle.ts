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

/** The account requests that are limited: sign-up, confirming a sign-up, asking for a new password. */
export type AccountAction = "signup" | "confirm" | "reset";

const ACCOUNT_WINDOW_S = 3600;

/**
 * Sign-up, confirmation and password-reset requests, limited like sign-in (D22) in the same
 * PostgreSQL table: per e-mail address (an address cannot be flooded with mail) and per network
 * address (one machine cannot create organisations or try tokens in bulk), each per hour. Every
 * request counts, success or not: the answer is the same either way, so there is no failure to
 * count. OWASP Forgot Password Cheat Sheet, "implement rate limiting" [published].
 */
export function createAccountThrottle(pool: pg.Pool, env: Env) {
  const common = { storeClient: pool, storeType: "pool", tableName: "auth_throttle", tableCreated: true };
  const limiters = new Map<string, RateLimiterPostgres>();
  const limiter = (prefix: string, points: number) => {
    const key = `${prefix}:${points}`;
    let found = limiters.get(key);
    if (!found) {
      found = new RateLimiterPostgres({ ...common, keyPrefix: prefix, points, duration: ACCOUNT_WINDOW_S });
      limiters.set(key, found);
    }
    return found;
  };

  return {
    /** Counts one request of `action` and throws 429 with Retry-After when the address or the network is over its limit. */
    async consume(action: AccountAction, ip: string, accountKey: string | null): Promise<void> {
      const checks: [RateLimiterPostgres, string, string][] = [
        [limiter(`${action}-ip`, env.ACCOUNT_REQUESTS_PER_IP_PER_HOUR), ip, "from this network"],
      ];
      if (accountKey)
        checks.push([
          limiter(`${action}-acct`, env.ACCOUNT_REQUESTS_PER_ADDRESS_PER_HOUR),
          accountKey,
          "for this e-mail address",
        ]);
      for (const [limit, key, where] of checks) {
        try {
          await limit.consume(key, 1);
        } catch (rejection) {
          if (rejection instanceof Error) throw rejection;
          const ms = (rejection as { msBeforeNext: number }).msBeforeNext;
          const minutes = Math.max(1, Math.ceil(ms / 60_000));
          throw new HttpError(
            429,
            "too_many_attempts",
            `Too many requests ${where}. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`,
            undefined,
            { "Retry-After": String(Math.max(1, Math.ceil(ms / 1000))) },
          );
        }
      }
    },
  };
}

export type AccountThrottle = ReturnType<typeof createAccountThrottle>;
