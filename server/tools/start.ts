// `npm start`: the whole app on this machine with demo data. Starts (or reuses)
// the private MariaDB unless DATABASE_URL is set, builds the client, migrates,
// seeds the invented demo scenario, serves, and stops MariaDB on Ctrl-C.
import { build } from 'vite';
import { DEMO_PEOPLE } from '../db/seed';
import { parseEnv } from '../env';
import { onShutdown, serve } from '../serve';
import { PROJECT_ROOT } from '../config';
import { resolveDatabase } from './local-database';

const env = parseEnv();
const database = await resolveDatabase(env);
const state: { running?: Awaited<ReturnType<typeof serve>> } = {};
onShutdown(async () => {
  console.log('\nStopping …');
  await state.running?.stop();
  await database.local?.stop();
});

console.log('Building the client …');
await build({ root: PROJECT_ROOT, logLevel: 'warn' });
const running = await serve(env, database.url, { seed: true, serveClient: true });
state.running = running;

console.log(`\nTubewright is running at ${running.url}\n`);
console.log('Demo sign-ins (invented people of the demo pilot line):');
for (const p of DEMO_PEOPLE) console.log(`  ${p.role.padEnd(9)} ${p.email.padEnd(30)} ${p.password}`);
console.log('\nCtrl-C stops the app and its private MariaDB.');
