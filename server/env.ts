import { z } from "zod";

const bool = z.enum(["true", "false", "1", "0"]).transform((v) => v === "true" || v === "1");

/**
 * The environment, parsed once at boot. A bad value stops the process with a message
 * naming the variable, instead of failing later in a request.
 */
const fields = z.object({
  NODE_ENV: z.enum(["development", "test", "production"]).default("development"),
  HOST: z.string().default("127.0.0.1"),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  PUBLIC_URL: z.url().default("http://127.0.0.1:3000"),
  DATABASE_URL: z.string().regex(/^postgres(ql)?:\/\//, "must be a postgres:// URL"),
  SESSION_SECRET: z.string().min(32, "must be at least 32 characters"),
  /**
   * Served over HTTPS (behind a proxy that terminates TLS): cookies are Secure with the
   * `__Host-` prefix and HSTS is sent. On by default in production; a production run on plain
   * HTTP (the benchmark on loopback) must say `false` out loud.
   */
  SECURE_COOKIES: bool.optional(),
  /** Proxies in front of the server whose X-Forwarded-* headers are believed; 1 when SECURE_COOKIES, else 0. */
  TRUST_PROXY_HOPS: z.coerce.number().int().min(0).max(10).optional(),
  SESSION_IDLE_MINUTES: z.coerce
    .number()
    .int()
    .min(1)
    .max(24 * 60)
    .default(30),
  SESSION_ABSOLUTE_HOURS: z.coerce
    .number()
    .int()
    .min(1)
    .max(24 * 30)
    .default(12),
  SMTP_URL: z.string().regex(/^smtps?:\/\//, "must be an smtp:// URL"),
  MAIL_FROM: z.string().default("Hatchway <no-reply@hatchway.test>"),
  /** The SMTP fake's HTTP inbox; set in development so admins can read caught mail. */
  MAIL_FAKE_INBOX_URL: z.url().optional(),
  S3_ENDPOINT: z.url(),
  S3_REGION: z.string().default("us-east-1"),
  S3_BUCKET: z.string().min(3),
  S3_ACCESS_KEY_ID: z.string().min(1),
  S3_SECRET_ACCESS_KEY: z.string().min(1),
  WEATHER_URL: z.url(),
  /** The weather fake's control URL; when set, admins can pick a weather scenario for the demo. */
  WEATHER_FAKE_CONTROL_URL: z.url().optional(),
  CLIENT_DIST: z.string().default("dist"),
  WORKERS: bool.default(true),
  /** Mounts /api/__bench routes (the bare SELECT 1 baseline); only the benchmark sets it. */
  BENCH_ROUTES: bool.default(false),
  /** Sign-in throttling (server/auth/throttle.ts, D22): failures on one account from anywhere before it is locked. */
  LOGIN_MAX_FAILURES_PER_ACCOUNT: z.coerce.number().int().min(1).default(20),
  /** Failures on one account from one address before that address may not try it. */
  LOGIN_MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS: z.coerce.number().int().min(1).default(5),
  /** Failures from one address in an hour, across accounts, before each further one slows it down. */
  LOGIN_MAX_FAILURES_PER_IP: z.coerce.number().int().min(1).default(30),
  /** The longest an address is made to wait between attempts once it is being slowed. */
  LOGIN_ADDRESS_DELAY_MAX_SECONDS: z.coerce.number().int().min(1).max(3600).default(60),
  LOGIN_BLOCK_MINUTES: z.coerce.number().int().min(1).default(15),
  /** Sign-up, confirmation and reset requests per e-mail address per hour (server/auth/throttle.ts). */
  ACCOUNT_REQUESTS_PER_ADDRESS_PER_HOUR: z.coerce.number().int().min(1).default(5),
  /** The same requests per network address per hour, each kind counted apart. */
  ACCOUNT_REQUESTS_PER_IP_PER_HOUR: z.coerce.number().int().min(1).default(30),
});

export const envSchema = fields
  .transform((env) => {
    const secure = env.SECURE_COOKIES ?? env.NODE_ENV === "production";
    return { ...env, SECURE_COOKIES: secure, TRUST_PROXY_HOPS: env.TRUST_PROXY_HOPS ?? (secure ? 1 : 0) };
  })
  .refine((env) => !env.SECURE_COOKIES || env.PUBLIC_URL.startsWith("https://"), {
    path: ["PUBLIC_URL"],
    message: "must be an https:// address when cookies are Secure (SECURE_COOKIES, on by default in production)",
  });

export type Env = z.output<typeof envSchema>;

export function parseEnv(source: Record<string, string | undefined> = process.env): Env {
  const result = envSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Hatchway cannot start: the environment is not valid.\n${lines.join("\n")}`);
  }
  return result.data;
}
