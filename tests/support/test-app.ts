// One real app over the throwaway MariaDB for a test file: tables emptied and
// the demo people seeded before the file, agents signed in per role.
import { afterAll, beforeAll, inject } from 'vitest';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { createApp, type AppConfig, type CreatedApp } from '../../server/app';
import { connectDatabase, type Database } from '../../server/db/index';
import { DEMO_PEOPLE, seedDemo } from '../../server/db/seed';
import type { Role } from '../../shared/schemas/users';
import { TEST_CONFIG } from './test-config';
import { createMailer } from '../../server/services/mail/outbox.service';
import { startSmtpFake, type SmtpFake } from '../../server/services/mail/smtp-fake';

export { TEST_CONFIG };

export type Agent = TestAgent;

/** Empties every table the migrations made (not the migrations journal). */
export async function resetDatabase(database: Database): Promise<void> {
  const conn = await database.pool.getConnection();
  try {
    const [rows] = await conn.query<Array<{ t: string } & import('mysql2').RowDataPacket>>(
      "SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE() AND table_name <> '__drizzle_migrations'",
    );
    await conn.query('SET FOREIGN_KEY_CHECKS = 0');
    for (const { t } of rows) await conn.query(`TRUNCATE TABLE \`${t}\``);
    await conn.query('SET FOREIGN_KEY_CHECKS = 1');
  } finally {
    conn.release();
  }
}

export function personOf(role: Role) {
  const p = DEMO_PEOPLE.find((x) => x.role === role);
  if (!p) throw new Error(`no demo person with role ${role}`);
  return p;
}

export interface TestContext {
  database: Database;
  created: CreatedApp;
  /** A fresh agent signed in as the demo person of that role (or the given e-mail). */
  signIn(role: Role, email?: string, password?: string): Promise<Agent>;
  anonymous(): Agent;
  /** Another app instance over the same database (a second server process). */
  newInstance(config?: Partial<AppConfig>): CreatedApp;
  /** The in-process SMTP fake every instance mails to. */
  smtp: SmtpFake;
}

export const TEST_APP_URL = 'http://tubewright.test';

export function useTestApp(config: Partial<AppConfig> = {}): TestContext {
  const instances: CreatedApp[] = [];
  const ctx = {} as TestContext;
  beforeAll(async () => {
    ctx.database = connectDatabase(inject('databaseUrl'), 4);
    await resetDatabase(ctx.database);
    await seedDemo(ctx.database.db);
    ctx.smtp = await startSmtpFake();
    const mailer = createMailer(ctx.smtp.url, 'Tubewright <tubewright@pilotline.example>', TEST_APP_URL);
    ctx.newInstance = (more = {}) => {
      const c = createApp(ctx.database, { ...TEST_CONFIG, ...config, ...more }, { mailer });
      instances.push(c);
      return c;
    };
    ctx.created = ctx.newInstance();
    ctx.anonymous = () => request.agent(ctx.created.app);
    ctx.signIn = async (role, email, password) => {
      const person = personOf(role);
      const agent = request.agent(ctx.created.app);
      const res = await agent
        .post('/api/auth/sign-in')
        .send({ email: email ?? person.email, password: password ?? person.password });
      if (res.status !== 200) throw new Error(`sign-in as ${role} failed: ${res.status} ${JSON.stringify(res.body)}`);
      return agent;
    };
  });
  afterAll(async () => {
    for (const c of instances) await c.close();
    await ctx.database?.close();
    await ctx.smtp?.stop();
  });
  return ctx;
}
