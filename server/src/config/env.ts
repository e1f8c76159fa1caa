import { z } from 'zod';

const flag = z.enum(['0', '1', 'true', 'false']).transform((v) => v === '1' || v === 'true');

const schema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  PUBLIC_URL: z.string().url().optional(),
  DATA_DIR: z.string().default('.data'),
  DATABASE_URL: z.string().url().optional(),
  DB_HOST: z.string().default('127.0.0.1'),
  DB_PORT: z.coerce.number().int().default(3307),
  DB_NAME: z.string().default('mendery'),
  DB_USER: z.string().default('mendery_app'),
  DB_PASSWORD: z.string().default(''),
  DB_POOL_SIZE: z.coerce.number().int().min(1).default(10),
  // Bounds on waiting for the database (db/timeouts.ts): a statement, a new connection, a free pooled connection.
  DB_QUERY_TIMEOUT_MS: z.coerce.number().int().min(100).default(10_000),
  DB_CONNECT_TIMEOUT_MS: z.coerce.number().int().min(100).default(3000),
  DB_ACQUIRE_TIMEOUT_MS: z.coerce.number().int().min(100).default(10_000),
  SESSION_SECRET: z.string().min(32, 'SESSION_SECRET must be at least 32 characters'),
  SESSION_IDLE_MINUTES: z.coerce.number().positive().default(60),
  SESSION_ABSOLUTE_HOURS: z.coerce.number().positive().default(12),
  /** `__Host-` cookie (Secure, Path=/, no Domain): set it where the site is served over HTTPS. */
  COOKIE_HOST_PREFIX: flag.optional(),
  TRUST_PROXY: z.string().optional(),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().default(2525),
  SMTP_SECURE: flag.default(false),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().default('Mendery <no-reply@mendery.local>'),
  OUTBOX_POLL_MS: z.coerce.number().int().min(0).default(2000),
  JOBS_POLL_MS: z.coerce.number().int().min(0).default(60_000),
  READ_CACHE_POLL_MS: z.coerce.number().int().min(0).default(250),
  READ_CACHE_MAX_AGE_MS: z.coerce.number().int().min(0).default(5000),
  LOGIN_RATE_MAX: z.coerce.number().int().min(1).default(10),
  AUTH_RATE_MAX: z.coerce.number().int().min(1).default(100),
  LOGIN_RATE_WINDOW_MINUTES: z.coerce.number().positive().default(15),
  FEED_RATE_MAX: z.coerce.number().int().min(1).default(300),
  /** Bookings and waiting-list joins per source address, and per e-mail address, in the sign-in window. */
  BOOKING_RATE_MAX: z.coerce.number().int().min(1).default(10),
  BOOKING_EMAIL_RATE_MAX: z.coerce.number().int().min(1).default(5),
  /** Confirmed bookings (and, apart, open waiting-list places) one e-mail address may hold in one session. */
  BOOKINGS_PER_SESSION_MAX: z.coerce.number().int().min(1).default(2),
  /** Mails an anonymous form may cause to one address in an hour. */
  VISITOR_MAIL_MAX_PER_HOUR: z.coerce.number().int().min(1).default(6),
  /** Days after its session's end that a booking's manage link still works. */
  MANAGE_LINK_DAYS: z.coerce.number().int().min(1).default(30),
  /** Requests for a fresh manage link per source address, and per e-mail address, in the sign-in window. */
  NEW_LINK_RATE_MAX: z.coerce.number().int().min(1).default(10),
  NEW_LINK_EMAIL_RATE_MAX: z.coerce.number().int().min(1).default(3),
  CLIENT_DIST: z.string().default('dist/client'),
});

export type Env = z.infer<typeof schema> & { publicUrl: string; dbUrl: string; hostPrefixCookie: boolean };

/** Reads the environment once at boot; a wrong value stops the server with a message that names it. */
export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = schema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`).join('\n');
    throw new Error(`Invalid environment:\n${lines}`);
  }
  const e = parsed.data;
  const dbUrl =
    e.DATABASE_URL ??
    `mysql://${encodeURIComponent(e.DB_USER)}:${encodeURIComponent(e.DB_PASSWORD)}@${e.DB_HOST}:${e.DB_PORT}/${e.DB_NAME}`;
  const hostPrefixCookie = e.COOKIE_HOST_PREFIX ?? false;
  return {
    ...e,
    dbUrl,
    hostPrefixCookie,
    publicUrl: (e.PUBLIC_URL ?? `http://127.0.0.1:${e.PORT}`).replace(/\/$/, ''),
  };
}
