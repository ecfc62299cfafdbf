import { inject } from 'vitest';

/**
 * The test run's database, mail catcher and search service, and the test settings (a short retry
 * delay so a test can watch a retry), as environment entries: for an app built in the test's own
 * process and for a server started as a child process alike.
 */
export function testServicesEnv(): Record<string, string> {
  return {
    NODE_ENV: 'test',
    DATABASE_URL: inject('databaseUrl'),
    SMTP_URL: inject('smtpUrl'),
    MAIL_CATCHER_URL: inject('mailCatcherUrl'),
    MEILI_HOST: inject('meiliHost'),
    MEILI_API_KEY: inject('meiliApiKey'),
    MEILI_INDEX: 'parts',
    APP_URL: 'http://localhost:3999',
    SESSION_SECRET: 'arcwise-test-secret-0123456789',
    JOB_RETRY_DELAY_SECONDS: '1',
    JOB_POLL_SECONDS: '0.5',
  };
}
