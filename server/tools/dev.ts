// `npm run dev`: API with the private MariaDB and demo data, plus Vite's dev
// server (hot reload) proxying /api to it. Ctrl-C stops everything.
import { createServer } from 'vite';
import { DEMO_PEOPLE } from '../db/seed';
import { parseEnv } from '../env';
import { onShutdown, serve } from '../serve';
import { PROJECT_ROOT } from '../config';
import { resolveDatabase } from './local-database';

const env = parseEnv();
const database = await resolveDatabase(env);
const running = await serve(env, database.url, { seed: true, serveClient: false });
const vite = await createServer({ root: PROJECT_ROOT });
await vite.listen();
onShutdown(async () => {
  await vite.close();
  await running.stop();
  await database.local?.stop();
});
console.log(`API on ${running.url}; open the client at http://127.0.0.1:${vite.config.server.port}`);
for (const p of DEMO_PEOPLE) console.log(`  ${p.role.padEnd(9)} ${p.email.padEnd(30)} ${p.password}`);
