import { loadEnv, type Env } from '../../server/src/config/env';
import { startServer, type RunningServer } from '../../server/src/server';
import type { MailSender } from '../../server/src/mail/transport';

export const TEST_SECRET = 'test-session-secret-that-is-long-enough-0123456789';

/**
 * The limits on anonymous bookings, waiting-list joins and mails to one address, raised for tests whose load comes
 * from one address: tests/api/booking-limits.test.ts tests the shipped values (`opts.shippedLimits`).
 */
const LOAD_LIMITS = {
  BOOKING_RATE_MAX: '100000',
  BOOKING_EMAIL_RATE_MAX: '100000',
  BOOKINGS_PER_SESSION_MAX: '100000',
  VISITOR_MAIL_MAX_PER_HOUR: '100000',
};

/** Starts the real app in-process on a free port against a test database. */
export function startTestServer(
  dbUrl: string,
  overrides: Partial<Record<keyof Env, string>> = {},
  opts: { sender?: MailSender | 'smtp'; log?: (line: string) => void; shippedLimits?: boolean } = {},
): Promise<RunningServer> {
  const env = loadEnv({
    NODE_ENV: 'test',
    DATABASE_URL: dbUrl,
    PORT: '0',
    SESSION_SECRET: TEST_SECRET,
    OUTBOX_POLL_MS: '0',
    SMTP_PORT: '1',
    CLIENT_DIST: 'dist/client',
    JOBS_POLL_MS: '0',
    ...(opts.shippedLimits ? {} : LOAD_LIMITS),
    ...overrides,
  });
  // 'smtp' sends through the real SMTP path (to a local mailbox the test started).
  const sender = opts.sender === 'smtp' ? undefined : (opts.sender ?? { send: async () => {} });
  return startServer(env, { sender, log: opts.log ?? (() => {}) });
}

/** A mail sender that keeps what it was given, for tests that read the links in a mail. */
export function memorySender() {
  const sent: { to: string; subject: string; text: string; html: string }[] = [];
  return { sent, send: async (m: { to: string; subject: string; text: string; html: string }) => void sent.push(m) };
}
