import { join } from 'node:path';
import { DATA_DIR } from '../config';
import { startLocalMariaDb, type LocalMariaDb } from '../db/local-mariadb';
import type { Env } from '../env';

/** DATABASE_URL when set; otherwise the private MariaDB under .data/mariadb. */
export async function resolveDatabase(env: Env): Promise<{ url: string; local?: LocalMariaDb }> {
  if (env.DATABASE_URL) return { url: env.DATABASE_URL };
  const local = await startLocalMariaDb({
    dataDir: join(DATA_DIR, 'mariadb'),
    port: env.TUBEWRIGHT_DB_PORT,
    installIfMissing: true,
  });
  console.log(
    local.reused
      ? `Reusing the private MariaDB already running on 127.0.0.1:${local.port}`
      : `Private MariaDB started on 127.0.0.1:${local.port} (data in .data/mariadb)`,
  );
  return { url: local.url, local };
}
