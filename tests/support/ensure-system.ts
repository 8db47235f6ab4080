// Installs the Debian packages the test suite needs when they are missing
// (MariaDB server, Chromium for browser tests, poppler for PDF text), as root.
import { existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';

const needs: Array<{ pkg: string; present: () => boolean }> = [
  { pkg: 'mariadb-server', present: () => existsSync('/usr/sbin/mariadbd') || existsSync('/usr/bin/mariadbd') },
  { pkg: 'chromium', present: () => existsSync('/usr/bin/chromium') },
  { pkg: 'poppler-utils', present: () => existsSync('/usr/bin/pdftotext') },
];

const missing = needs.filter((n) => !n.present()).map((n) => n.pkg);
if (missing.length > 0) {
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!isRoot) {
    console.error(`Missing Debian packages: ${missing.join(' ')}\nInstall them with: sudo apt-get install -y ${missing.join(' ')}`);
    process.exit(1);
  }
  console.log(`Installing Debian packages: ${missing.join(' ')} …`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [['update', '-qq'], ['install', '-y', '-qq', ...missing]]) {
    const r = spawnSync('apt-get', args, { stdio: 'inherit', env });
    if (r.status !== 0) {
      console.error(`apt-get ${args.join(' ')} failed (${r.status})`);
      process.exit(1);
    }
  }
}
