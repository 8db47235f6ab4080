// The demo scenario's recipes and lots: invented work of the invented
// "Harbourside Pilot Line" (names, choices and lots are made up; the physics
// comes from the engine). Built through the same services the API uses, so
// versions, results, sign-offs and audit rows are what the app itself writes.
import { eq } from 'drizzle-orm';
import { parseRecipeDocument, type RecipeDocumentInput } from '../../shared/schemas/recipe';
import type { Role } from '../../shared/schemas/users';
import type { Db } from './index';
import { recipes, tubes, users } from './schema';
import { DEMO_PEOPLE } from './seed';
import { createLot, patchLot } from '../services/lots.service';
import { copyVersion, createRecipe, getRecipe, getVersion, saveDraft } from '../services/recipes.service';
import { returnVersion, signOffVersion, submitVersion } from '../services/signoff.service';
import { storeUpload } from '../services/measurements.service';
import { fitCalibration } from '../services/calibrations.service';
import { syntheticProfileCsv, syntheticSheetCsv } from './demo-measurements';

type Actor = { id: number; role: Role };
type Step = RecipeDocumentInput['steps'][number];
type Tubes = Record<'boron' | 'phos' | 'anneal' | 'ox', number>;

const ramps = { loadTempC: 800, rampUpCPerMin: 10, rampDownCPerMin: 5 };

function doc(type: 'n' | 'p', background: number, steps: Step[]): RecipeDocumentInput {
  return { schemaVersion: 1, substrate: { type, background: { concentration: background }, orientation: '100' }, steps };
}

/** Each demo recipe: its versions as documents, and what happens to each. */
function scenario(t: Tubes) {
  const boron = (driveMin: number): RecipeDocumentInput =>
    doc('n', 2e15, [
      { id: 'b-predep', label: 'Boron predeposition', kind: 'predeposition', dopant: 'B', tempC: 950, timeMin: 30, surface: { mode: 'solubility' }, tubeId: t.boron, ...ramps },
      { id: 'b-drive', label: 'Drive-in', kind: 'anneal', tempC: 1100, timeMin: driveMin, ambient: 'inert', tubeId: t.anneal, ...ramps },
    ]);
  const phos = (predepMin: number): RecipeDocumentInput =>
    doc('p', 5e15, [
      { id: 'p-predep', label: 'POCl3 emitter predeposition', kind: 'predeposition', dopant: 'P', tempC: 900, timeMin: predepMin, surface: { mode: 'solubility' }, tubeId: t.phos, ...ramps },
      { id: 'p-drive', label: 'Emitter drive-in', kind: 'anneal', tempC: 1000, timeMin: 30, ambient: 'dry-o2', tubeId: t.phos, ...ramps },
    ]);
  return [
    {
      name: 'Base diffusion · boron 1.5 µm',
      description: 'p-base of the demo bipolar test chip: boron predeposition and drive-in. Demo data (invented).',
      author: 'engineer@pilotline.example',
      versions: [
        { document: boron(45), then: 'release' as const },
        { document: boron(60), then: 'release' as const },
        { document: boron(75), then: 'draft' as const, note: 'Deeper junction for the 2027 mask set' },
      ],
      lots: [{ lotCode: 'HPL-26-0412', wafers: 25, tube: 'anneal' as const, status: 'in_progress' as const, measured: true }],
    },
    {
      name: 'Emitter · POCl3 phosphorus',
      description: 'n+ emitter into the p-base, POCl3 source. Demo data (invented).',
      author: 'engineer2@pilotline.example',
      versions: [
        { document: phos(20), then: 'release' as const },
        { document: phos(25), then: 'review' as const, note: 'Lower emitter sheet resistance' },
      ],
      lots: [{ lotCode: 'HPL-26-0415', wafers: 12, tube: 'phos' as const, status: 'open' as const, measured: false }],
    },
    {
      name: 'Source/drain · arsenic implant and anneal',
      description: 'Shallow n+ source/drain: As implant 5e15 cm⁻² at 50 keV, then a short anneal. Demo data (invented).',
      author: 'engineer@pilotline.example',
      versions: [
        {
          document: doc('p', 1e16, [
            { id: 'as-imp', label: 'As implant', kind: 'implant', dopant: 'As', doseCm2: 5e15, energyKeV: 50, rpUm: 0.0322, dRpUm: 0.0118, tubeId: null },
            { id: 'as-ann', label: 'Activation anneal', kind: 'anneal', tempC: 1000, timeMin: 20, ambient: 'inert', tubeId: t.anneal, ...ramps },
          ]),
          then: 'returned' as const,
          note: 'First pass',
        },
      ],
      lots: [],
    },
    {
      name: 'Buried layer · antimony',
      description: 'n+ buried layer: Sb implant and a long drive-in before epitaxy. Demo data (invented).',
      author: 'engineer2@pilotline.example',
      versions: [
        {
          document: doc('p', 1e15, [
            { id: 'sb-imp', label: 'Sb implant', kind: 'implant', dopant: 'Sb', doseCm2: 2e15, energyKeV: 60, rpUm: 0.0311, dRpUm: 0.0093, tubeId: null },
            { id: 'sb-drive', label: 'Buried layer drive-in', kind: 'anneal', tempC: 1150, timeMin: 240, ambient: 'inert', tubeId: t.anneal, ...ramps },
          ]),
          then: 'release' as const,
        },
      ],
      lots: [
        { lotCode: 'HPL-26-0398', wafers: 25, tube: 'anneal' as const, status: 'complete' as const, measured: true },
        { lotCode: 'HPL-26-0401', wafers: 24, tube: 'anneal' as const, status: 'complete' as const, measured: true },
      ],
    },
    {
      name: 'Field oxide · wet 1000 °C',
      description: 'Isolation oxide grown in pyrogenic steam after a boron channel-stop implant. Demo data (invented).',
      author: 'engineer@pilotline.example',
      versions: [
        {
          document: doc('p', 1e15, [
            { id: 'cs-imp', label: 'Channel-stop implant', kind: 'implant', dopant: 'B', doseCm2: 5e13, energyKeV: 40, rpUm: 0.1302, dRpUm: 0.0443, tubeId: null },
            { id: 'fox', label: 'Field oxidation', kind: 'oxidation', tempC: 1000, timeMin: 90, ambient: 'wet-o2', tubeId: t.ox, ...ramps },
          ]),
          then: 'draft' as const,
        },
      ],
      lots: [],
    },
  ];
}

async function actorByEmail(db: Db, email: string): Promise<Actor> {
  const [u] = await db.select({ id: users.id, role: users.role }).from(users).where(eq(users.email, email)).limit(1);
  if (!u) throw new Error(`demo person ${email} is missing; seed the people first`);
  return u;
}

/** Adds the demo recipes and lots that are missing; running it again changes nothing. */
export async function seedScenario(db: Db): Promise<{ created: number }> {
  const tubeRows = await db.select({ id: tubes.id, name: tubes.name }).from(tubes);
  const tube = (part: string) => tubeRows.find((r) => r.name.includes(part))?.id;
  const t = { boron: tube('boron'), phos: tube('phosphorus'), anneal: tube('anneal'), ox: tube('oxidation') };
  if (Object.values(t).some((id) => id === undefined)) return { created: 0 };
  const lead = DEMO_PEOPLE.find((p) => p.email === 'lead@pilotline.example')!;
  const leadActor = await actorByEmail(db, lead.email);
  const operator = await actorByEmail(db, 'operator@pilotline.example');
  let created = 0;

  for (const r of scenario(t as Tubes)) {
    const [exists] = await db.select({ id: recipes.id }).from(recipes).where(eq(recipes.name, r.name)).limit(1);
    if (exists) continue;
    const author = await actorByEmail(db, r.author);
    let versionId = 0;
    for (const [i, v] of r.versions.entries()) {
      const parsed = parseRecipeDocument(v.document);
      if (!parsed.ok) throw new Error(`demo recipe ${r.name} v${i + 1} is invalid: ${JSON.stringify(parsed.issues)}`);
      if (i === 0) {
        const recipe = await createRecipe(db, author, { name: r.name, description: r.description, document: parsed.doc });
        versionId = recipe.versions[0].id;
      } else {
        versionId = (await copyVersion(db, author, versionId, '')).id;
      }
      const note = 'note' in v && v.note ? v.note : '';
      if (i > 0 || note) {
        const current = await getVersion(db, author, versionId);
        await saveDraft(db, author, versionId, { revision: current.revision, document: parsed.doc, note });
      }
      if (v.then === 'draft') continue;
      await submitVersion(db, undefined, author, versionId, '');
      if (v.then === 'release') {
        await signOffVersion(db, undefined, leadActor, versionId, { password: lead.password, meaning: 'approved-for-production' });
      } else if (v.then === 'returned') {
        await returnVersion(db, undefined, leadActor, versionId, 'Check the anneal against the activation spec before submitting again.');
      }
    }
    const detail = await getRecipe(db, author, (await getVersion(db, author, versionId)).recipeId);
    const released = detail.versions.find((v) => v.state === 'released');
    for (const lot of r.lots) {
      if (!released) break;
      const made = await createLot(db, operator, { lotCode: lot.lotCode, wafers: lot.wafers, tubeId: t[lot.tube]!, versionId: released.id, notes: 'Demo lot (invented).' });
      if (lot.status !== 'open') await patchLot(db, operator, made.id, { status: 'in_progress' });
      if (lot.status === 'complete') await patchLot(db, operator, made.id, { status: 'complete' });
      if (lot.measured) await attachInventedMeasurements(db, operator, made.id, released.id, t[lot.tube]!);
    }
    created++;
  }
  if (created > 0) await fitCalibration(db, leadActor, t.anneal!, 'First fit from the demo lots (invented data).').catch(() => undefined);
  return { created };
}

/**
 * The demo's anneal tube runs a little hot: its invented measured files are
 * made with D × 1.18 and ±4 % noise, so its calibration has something to find.
 */
const DEMO_TUBE_FACTOR = 1.18;

async function attachInventedMeasurements(db: Db, operator: Actor, lotId: number, versionId: number, tubeId: number): Promise<void> {
  const version = await getVersion(db, operator, versionId);
  const options = { factor: DEMO_TUBE_FACTOR, tubeId, noisePct: 4, seed: lotId * 7 };
  const profile = syntheticProfileCsv(version.document, options);
  const sheet = syntheticSheetCsv(version.document, options);
  const notes = 'INVENTED DEMO DATA generated from the model with noise; not a measurement.';
  await storeUpload(db, operator, lotId, { kind: 'profile', method: 'SIMS', notes }, { originalname: `demo-sims-lot${lotId}.csv`, buffer: Buffer.from(profile) });
  await storeUpload(db, operator, lotId, { kind: 'sheet_resistance', notes }, { originalname: `demo-4pp-lot${lotId}.csv`, buffer: Buffer.from(sheet) });
}
