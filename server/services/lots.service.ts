// Lots: a number of wafers run in a tube against one released version.
import { and, desc, eq, type SQL } from 'drizzle-orm';
import type { CreateLotInput, Lot, LotStatus } from '../../shared/schemas/lots';
import { LOT_STATUS_LABELS, LOT_STATUS_MOVES } from '../../shared/schemas/lots';
import { createLotSchema } from '../../shared/schemas/lots';
import type { Db } from '../db/index';
import { lots, recipes, recipeVersions, tubes, users } from '../db/schema';
import { conflict, HttpError, notFound } from '../http-error';
import { recordAudit } from './audit.service';
import type { Actor } from './recipes.service';

const lotSelect = {
  l: lots,
  tubeName: tubes.name,
  recipeId: recipes.id,
  recipeName: recipes.name,
  versionNo: recipeVersions.versionNo,
  versionState: recipeVersions.state,
  openedByName: users.name,
};

function baseQuery(db: Db) {
  return db
    .select(lotSelect)
    .from(lots)
    .innerJoin(tubes, eq(tubes.id, lots.tubeId))
    .innerJoin(recipeVersions, eq(recipeVersions.id, lots.versionId))
    .innerJoin(recipes, eq(recipes.id, recipeVersions.recipeId))
    .innerJoin(users, eq(users.id, lots.openedById));
}

type LotRow = Awaited<ReturnType<ReturnType<typeof baseQuery>['execute']>>[number];

function toLot(r: LotRow): Lot {
  return {
    id: r.l.id,
    lotCode: r.l.lotCode,
    wafers: r.l.wafers,
    status: r.l.status,
    notes: r.l.notes,
    tube: { id: r.l.tubeId, name: r.tubeName },
    recipe: { id: r.recipeId, name: r.recipeName },
    version: { id: r.l.versionId, versionNo: r.versionNo, state: r.versionState },
    openedBy: { id: r.l.openedById, name: r.openedByName },
    createdAt: r.l.createdAt.toISOString(),
    updatedAt: r.l.updatedAt.toISOString(),
  };
}

export async function listLots(db: Db, q: { status?: LotStatus; versionId?: number; recipeId?: number }): Promise<Lot[]> {
  const where: SQL[] = [];
  if (q.status) where.push(eq(lots.status, q.status));
  if (q.versionId) where.push(eq(lots.versionId, q.versionId));
  if (q.recipeId) where.push(eq(recipes.id, q.recipeId));
  const rows = await baseQuery(db)
    .where(where.length ? and(...where) : undefined)
    .orderBy(desc(lots.id))
    .limit(500);
  return rows.map(toLot);
}

export async function getLot(db: Db, id: number): Promise<Lot> {
  const [row] = await baseQuery(db).where(eq(lots.id, id)).limit(1);
  if (!row) throw notFound('The lot');
  return toLot(row);
}

/** Opens a lot; only against a version that is released now. */
export async function createLot(db: Db, actor: Actor, raw: CreateLotInput): Promise<Lot> {
  const input = createLotSchema.parse(raw);
  const id = await db.transaction(async (tx) => {
    const [v] = await tx.select().from(recipeVersions).where(eq(recipeVersions.id, input.versionId)).limit(1).for('update'); // a retire waits for the lot (MariaDB has no FOR SHARE)
    if (!v) throw new HttpError(422, 'unknown_reference', 'The recipe version does not exist', [{ path: 'versionId', message: 'Choose an existing version' }]);
    if (v.state !== 'released') {
      throw new HttpError(422, 'not_released', `Version ${v.versionNo} is ${v.state.replace('_', ' ')}; lots run only against a released version`, [
        { path: 'versionId', message: 'Choose a released version' },
      ]);
    }
    const [tube] = await tx.select({ id: tubes.id }).from(tubes).where(eq(tubes.id, input.tubeId)).limit(1);
    if (!tube) throw new HttpError(422, 'unknown_reference', 'The tube does not exist', [{ path: 'tubeId', message: 'Choose an existing tube' }]);
    const [same] = await tx.select({ id: lots.id }).from(lots).where(eq(lots.lotCode, input.lotCode)).limit(1);
    if (same) throw conflict(`Lot ${input.lotCode} already exists`);
    const [{ id: lotId }] = await tx
      .insert(lots)
      .values({ lotCode: input.lotCode, wafers: input.wafers, tubeId: input.tubeId, versionId: input.versionId, notes: input.notes, openedById: actor.id })
      .$returningId();
    await recordAudit(tx, { actor, action: 'lot.open', entityType: 'lot', entityId: lotId, toState: 'open', contentHash: v.contentHash, details: { lotCode: input.lotCode, versionId: v.id, wafers: input.wafers } });
    return lotId;
  });
  return getLot(db, id);
}

export async function patchLot(db: Db, actor: Actor, id: number, input: { status?: LotStatus; notes?: string }): Promise<Lot> {
  await db.transaction(async (tx) => {
    const [l] = await tx.select().from(lots).where(eq(lots.id, id)).limit(1).for('update');
    if (!l) throw notFound('The lot');
    if (input.status && input.status !== l.status && !LOT_STATUS_MOVES[l.status].includes(input.status)) {
      throw new HttpError(409, 'wrong_state', `A lot that is ${LOT_STATUS_LABELS[l.status].toLowerCase()} cannot become ${LOT_STATUS_LABELS[input.status].toLowerCase()}`, [
        { path: 'status', message: `Allowed from ${LOT_STATUS_LABELS[l.status].toLowerCase()}: ${LOT_STATUS_MOVES[l.status].map((s) => LOT_STATUS_LABELS[s].toLowerCase()).join(', ') || 'none'}` },
      ]);
    }
    await tx.update(lots).set(input).where(eq(lots.id, id));
    await recordAudit(tx, {
      actor,
      action: 'lot.update',
      entityType: 'lot',
      entityId: id,
      fromState: input.status && input.status !== l.status ? l.status : null,
      toState: input.status && input.status !== l.status ? input.status : null,
      details: { ...input },
    });
  });
  return getLot(db, id);
}
