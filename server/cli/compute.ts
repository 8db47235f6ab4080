// `npm run compute -- recipe.json` (or `-` for stdin): validates a recipe document and
// prints the engine's result JSON. Invalid input: the issues on stderr, exit code 1.
import '../../shared/schemas/unit-reader';
import { readFileSync } from 'node:fs';
import { computeRecipe } from '../../shared/engine/index';
import { EngineInputError } from '../../shared/engine/errors';
import { parseRecipeDocument } from '../../shared/schemas/recipe';

function fail(lines: string[]): never {
  for (const line of lines) process.stderr.write(line + '\n');
  process.exit(1);
}

const arg = process.argv[2];
if (!arg) fail(['usage: npm run compute -- <recipe.json | ->']);

let text: string;
try {
  text = readFileSync(arg === '-' ? 0 : arg, 'utf8');
} catch (e) {
  fail([`cannot read ${arg}: ${(e as Error).message}`]);
}

let input: unknown;
try {
  input = JSON.parse(text);
} catch (e) {
  fail([`${arg} is not valid JSON: ${(e as Error).message}`]);
}

const parsed = parseRecipeDocument(input);
if (!parsed.ok) fail(parsed.issues.map((i) => `${i.path || '(document)'}: ${i.message}`));

try {
  process.stdout.write(JSON.stringify(computeRecipe(parsed.doc), null, 2) + '\n');
} catch (e) {
  if (e instanceof EngineInputError) fail([`${e.path}: ${e.message}`]);
  throw e;
}
