// Parallel runs (two checkouts, two engineers) each name their own database and catcher port.
const db = process.env.PLACARD_TEST_DB ?? 'placard_test';
const mailPort = process.env.PLACARD_TEST_MAIL_PORT ?? '54335';

/** The environment every test process runs with: its own database and mail catcher, quiet logs. */
export const TEST_ENV = {
  NODE_ENV: 'test',
  DB_NAME: db,
  // Never the app's database: a managed server for tests comes only through TEST_DATABASE_URL.
  DATABASE_URL: process.env.TEST_DATABASE_URL ?? '',
  MAIL_CATCHER_PORT: mailPort,
  SMTP_URL: `smtp://127.0.0.1:${mailPort}`,
  DEMO_MODE: 'true',
  SIGNIN_RATE_LIMIT: '5',
  // Every test signs in from 127.0.0.1: the per-address limits would trip on the suite itself.
  SIGNIN_ADDRESS_RATE_LIMIT: '100000',
  SIGNUP_RATE_LIMIT_PER_HOUR: '100000',
  PASSWORD_RESET_ADDRESS_RATE_LIMIT_PER_HOUR: '100000',
  INVITATION_RATE_LIMIT: '100000',
  API_RATE_LIMIT_PER_MINUTE: '100000',
  PUBLIC_BASE_URL: 'http://127.0.0.1:3999',
  // Quiet unless asked: PLACARD_TEST_LOG_LEVEL=error shows what a 500 in a test was.
  LOG_LEVEL: process.env.PLACARD_TEST_LOG_LEVEL ?? 'silent',
  // Test files queue mail and the global setup's worker sends it: poll often, retry soon.
  JOB_POLL_SECONDS: '0.5',
  MAIL_RETRY_DELAY_SECONDS: '1',
  // A process stopping at the end of a file waits this long at most for a job in hand, then hands it back.
  JOB_STOP_GRACE_SECONDS: '5',
} as const;
