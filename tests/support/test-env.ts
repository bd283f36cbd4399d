/** The environment every test process runs with: its own database and mail catcher, quiet logs. */
export const TEST_ENV = {
  NODE_ENV: 'test',
  DB_NAME: 'placard_test',
  MAIL_CATCHER_PORT: '54335',
  SMTP_URL: 'smtp://127.0.0.1:54335',
  DEMO_MODE: 'true',
  SIGNIN_RATE_LIMIT: '5',
  API_RATE_LIMIT_PER_MINUTE: '100000',
  PUBLIC_BASE_URL: 'http://127.0.0.1:3999',
  LOG_LEVEL: 'silent',
} as const;
