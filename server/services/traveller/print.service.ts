// Gathers what a traveller needs from the database and renders it. A lot's
// traveller is runnable only while its version is released; anything else
// prints with the NOT RELEASED mark (the renderer decides from the state).
import type { Db } from '../../db/index';
import { recordAudit } from '../audit.service';
import { getLot } from '../lots.service';
import { getVersion, type Actor } from '../recipes.service';
import { listTubes } from '../tubes.service';
import { renderTraveller, renderTravellerBatch, type BatchProgress } from './render-traveller';
import { travellerInput } from './traveller-input';
import type { TravellerInput } from './types';

type Viewer = Actor & { name: string };

async function tubeNames(db: Db) {
  return new Map((await listTubes(db)).map((t) => [t.id, t.name]));
}

async function lotInput(db: Db, viewer: Viewer, lotId: number, names: Map<number, string>): Promise<TravellerInput> {
  const lot = await getLot(db, lotId);
  const version = await getVersion(db, viewer, lot.version.id);
  return travellerInput({
    version,
    lot: { lotCode: lot.lotCode, wafers: lot.wafers, tubeName: lot.tube.name, openedBy: lot.openedBy.name, openedAt: lot.createdAt },
    tubeNames: names,
    printedBy: `${viewer.name} (${viewer.role})`,
  });
}

export async function printLotTraveller(db: Db, viewer: Viewer, lotId: number): Promise<{ pdf: Buffer; fileName: string }> {
  const input = await lotInput(db, viewer, lotId, await tubeNames(db));
  const pdf = await renderTraveller(input);
  await recordAudit(db, { actor: viewer, action: 'lot.print', entityType: 'lot', entityId: lotId, details: { state: input.recipe.state } });
  return { pdf, fileName: `traveller-${input.lot!.lotId}.pdf` };
}

/** A preview of any version without a lot (marked NOT RELEASED unless released). */
export async function printVersionTraveller(db: Db, viewer: Viewer, versionId: number): Promise<{ pdf: Buffer; fileName: string }> {
  const version = await getVersion(db, viewer, versionId);
  const input = travellerInput({ version, lot: null, tubeNames: await tubeNames(db), printedBy: `${viewer.name} (${viewer.role})` });
  const safeName = version.recipeName.replace(/[^A-Za-z0-9._-]+/g, '-');
  return { pdf: await renderTraveller(input), fileName: `traveller-${safeName}-v${version.versionNo}.pdf` };
}

/** Many lots in one PDF; `onProgress` reports after each lot is laid out. */
export async function printLotBatch(db: Db, viewer: Viewer, lotIds: number[], onProgress: BatchProgress): Promise<Buffer> {
  const names = await tubeNames(db);
  const inputs: TravellerInput[] = [];
  for (const id of lotIds) inputs.push(await lotInput(db, viewer, id, names));
  const pdf = await renderTravellerBatch(inputs, onProgress);
  for (const id of lotIds) await recordAudit(db, { actor: viewer, action: 'lot.print', entityType: 'lot', entityId: id, details: { batch: lotIds.length } });
  return pdf;
}
