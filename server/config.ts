import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { AppConfig } from './app';
import type { Env } from './env';

export const PROJECT_ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..');
export const DATA_DIR = join(PROJECT_ROOT, '.data');

/** Development keeps a random session secret in .data/ so restarts keep sessions. */
function localSessionSecret(): string {
  const file = join(DATA_DIR, 'session-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(DATA_DIR, { recursive: true });
  const secret = randomBytes(32).toString('base64url');
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}

export function appConfigFromEnv(env: Env, clientDir?: string): AppConfig {
  return {
    sessionSecret: env.SESSION_SECRET ?? localSessionSecret(),
    sessionMaxAgeHours: env.SESSION_MAX_AGE_HOURS,
    cookieSecure: env.COOKIE_SECURE,
    trustProxy: env.TRUST_PROXY,
    signInLimit: { max: env.SIGN_IN_LIMIT_MAX, windowMs: env.SIGN_IN_LIMIT_WINDOW_MIN * 60_000 },
    exposeStack: env.NODE_ENV === 'development',
    clientDir,
  };
}
