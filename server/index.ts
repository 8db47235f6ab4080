// Production entry: `node --import tsx server/index.ts` with DATABASE_URL set
// (and SESSION_SECRET). Serves the API and the built client from dist/client.
import { parseEnv } from './env';
import { onShutdown, serve } from './serve';

const env = parseEnv();
if (!env.DATABASE_URL) {
  console.error('DATABASE_URL is required here; `npm start` runs a private MariaDB for local use.');
  process.exit(1);
}
const running = await serve(env, env.DATABASE_URL, { seed: process.env.SEED_DEMO === 'true', serveClient: true });
console.log(`Tubewright listening on ${running.url}`);
onShutdown(() => running.stop());
