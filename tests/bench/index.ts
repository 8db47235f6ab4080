// `npm run bench`: runs every tests/bench/*.bench.ts (each default-exports an async
// function that prints its figures). Benchmarks report; they never fail the build.
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const only = process.argv[2];
const files = readdirSync(here)
  .filter((f) => f.endsWith('.bench.ts'))
  .filter((f) => !only || f.includes(only))
  .sort();

for (const file of files) {
  const mod = (await import(pathToFileURL(join(here, file)).href)) as { default: () => Promise<void> };
  console.log(`\n== ${file.replace('.bench.ts', '')}`);
  await mod.default();
}
