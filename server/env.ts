// Parses process.env once, with zod, and stops the process with field errors
// when it is wrong: a misconfigured server should not half-start.
import { z } from 'zod';

const bool = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'])
  .transform((v) => v === 'true' || v === '1' || v === 'yes');

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(1).max(65535).default(5480),
  /** Public base URL used in e-mail links. */
  APP_URL: z.string().url().optional(),
  /** An existing MariaDB; when unset the start command runs a private one under .data/. */
  DATABASE_URL: z.string().url().optional(),
  /** Port of the private development MariaDB (not 3306, to stay out of a system server's way). */
  TUBEWRIGHT_DB_PORT: z.coerce.number().int().min(1024).max(65535).default(3391),
  SESSION_SECRET: z.string().min(32, 'Use at least 32 random characters').optional(),
  SESSION_MAX_AGE_HOURS: z.coerce.number().positive().max(24 * 30).default(12),
  COOKIE_SECURE: bool.default(false),
  /** Express "trust proxy" setting, e.g. 1 behind one load balancer. */
  TRUST_PROXY: z.string().optional(),
  SIGN_IN_LIMIT_MAX: z.coerce.number().int().positive().default(10),
  SIGN_IN_LIMIT_WINDOW_MIN: z.coerce.number().positive().default(15),
  /** SMTP for e-mail; when unset outside production an in-process fake receives the mail. */
  SMTP_URL: z.string().optional(),
  MAIL_FROM: z.string().default('Tubewright <tubewright@pilotline.example>'),
});

export type Env = z.infer<typeof envSchema>;

export function parseEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    console.error(`Invalid environment:\n${lines.join('\n')}`);
    process.exit(1);
  }
  if (parsed.data.NODE_ENV === 'production' && !parsed.data.SESSION_SECRET) {
    console.error('Invalid environment:\n  SESSION_SECRET: required in production');
    process.exit(1);
  }
  return parsed.data;
}
