import type { AppConfig } from '../../server/app';

/** App settings for tests: a fixed secret, plain HTTP, a generous sign-in limit. */
export const TEST_CONFIG: AppConfig = {
  sessionSecret: 'test-secret-test-secret-test-secret-0123',
  sessionMaxAgeHours: 1,
  cookieSecure: false,
  signInLimit: { max: 1000, windowMs: 60_000 },
  exposeStack: false,
};
