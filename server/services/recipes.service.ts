// Recipes and their numbered versions. A draft saves with optimistic
// concurrency; a version that has left Draft never changes again here.
import { and, asc, count, desc, eq, gte, inArray, like, lt, max, sql, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/mysql-core';
import type { Dopant } from '../../shared/engine/dopants';
import type { RecipeResult } from '../../shared/engine/types';
import { checkTubes } from '../../shared/rules/tube-check';
import { newRecipeDocument, type RecipeDocument } from '../../shared/schemas/recipe';
import type {
  ListRecipesQuery,
  RecipeDetail,
  RecipeListPage,
  RecipeListRow,
  RecipeVersion,
  VersionState,
  VersionSummary,
} from '../../shared/schemas/recipes-api';
import { listRecipesQuerySchema } from '../../shared/schemas/recipes-api';
import type { Role } from '../../shared/schemas/users';
import type { Db } from '../db/index';
import { recipes, recipeVersions, users } from '../db/schema';
import { conflict, forbidden, HttpError, notFound } from '../http-error';
import { recordAudit, type Tx } from './audit.service';
import { computeAuthoritative, summarize } from './compute.service';
import { contentHash } from './content-hash';
import { listTubes } from './tubes.service';
import { activeTubeFactors } from './calibrations.service';

export type Actor = { id: number; role: Role };

/** Operators work from released recipes only; drafts and reviews are not theirs to see. */
const VISIBLE_TO_OPERATOR: VersionState[] = ['released', 'retired'];
const canSeeState = (viewer: Actor, state: VersionState) => viewer.role !== 'operator' || VISIBLE_TO_OPERATOR.includes(state);

const splitList = (s: string) => s.split(',').filter(Boolean);
const iso = (d: Date | null) => (d ? d.toISOString() : null);

/** A recipe as a list row; operators see the released version's dopants and tubes, never a draft's. */
function recipeRow(r: typeof recipes.$inferSelect, ownerName: string, viewer?: Actor): RecipeListRow {
  const releasedOnly = viewer?.role === 'operator';
  return {
    id: r.id,
    name: r.name,
    description: r.description,
    owner: { id: r.ownerId, name: ownerName },
    dopants: splitList(releasedOnly ? r.releasedDopants : r.dopants) as Dopant[],
    tubeIds: splitList(releasedOnly ? r.releasedTubeIds : r.tubeIds).map(Number),
    latestVersionNo: r.latestVersionNo,
    latestState: r.latestState,
    releasedVersionNo: r.releasedVersionNo,
    updatedAt: r.updatedAt.toISOString(),
  };
}

export async function listRecipes(db: Db, viewer: Actor, rawQuery: ListRecipesQuery): Promise<RecipeListPage> {
  const q = listRecipesQuerySchema.parse(rawQuery);
  const where: SQL[] = [];
  if (q.name) where.push(like(recipes.name, `%${q.name.replace(/[\\%_]/g, (c) => `\\${c}`)}%`));
  const operator = viewer.role === 'operator';
  if (q.dopant) where.push(like(operator ? recipes.releasedDopants : recipes.dopants, `%,${q.dopant},%`));
  if (q.tubeId) where.push(like(operator ? recipes.releasedTubeIds : recipes.tubeIds, `%,${q.tubeId},%`));
  if (q.changedFrom) where.push(gte(recipes.updatedAt, new Date(`${q.changedFrom}T00:00:00Z`)));
  if (q.changedTo) where.push(lt(recipes.updatedAt, new Date(new Date(`${q.changedTo}T00:00:00Z`).getTime() + 86_400_000)));
  if (q.state) where.push(eq(recipes.latestState, q.state));
  if (q.ownerId) where.push(eq(recipes.ownerId, q.ownerId));
  if (viewer.role === 'operator') where.push(sql`${recipes.releasedVersionNo} IS NOT NULL`);
  const condition = where.length ? and(...where) : undefined;
  const sortColumn = { name: recipes.name, updatedAt: recipes.updatedAt, owner: users.name, state: recipes.latestState }[q.sort];
  const [rows, [{ total }]] = await Promise.all([
    db
      .select({ r: recipes, ownerName: users.name })
      .from(recipes)
      .innerJoin(users, eq(users.id, recipes.ownerId))
      .where(condition)
      .orderBy(q.order === 'asc' ? asc(sortColumn) : desc(sortColumn), asc(recipes.id))
      .limit(q.pageSize)
      .offset((q.page - 1) * q.pageSize),
    db.select({ total: count() }).from(recipes).innerJoin(users, eq(users.id, recipes.ownerId)).where(condition),
  ]);
  return { rows: rows.map((x) => recipeRow(x.r, x.ownerName, viewer)), total, page: q.page, pageSize: q.pageSize };
}

export async function getRecipe(db: Db, viewer: Actor, id: number): Promise<RecipeDetail> {
  const [row] = await db
    .select({ r: recipes, ownerName: users.name })
    .from(recipes)
    .innerJoin(users, eq(users.id, recipes.ownerId))
    .where(eq(recipes.id, id))
    .limit(1);
  if (!row || (viewer.role === 'operator' && row.r.releasedVersionNo === null)) throw notFound('The recipe');
  const versions = await db
    .select({ v: recipeVersions, authorName: users.name })
    .from(recipeVersions)
    .innerJoin(users, eq(users.id, recipeVersions.authorId))
    .where(
      viewer.role === 'operator'
        ? and(eq(recipeVersions.recipeId, id), inArray(recipeVersions.state, VISIBLE_TO_OPERATOR))
        : eq(recipeVersions.recipeId, id),
    )
    .orderBy(desc(recipeVersions.versionNo));
  return {
    ...recipeRow(row.r, row.ownerName, viewer),
    versions: versions.map(({ v, authorName }) => ({
      id: v.id,
      versionNo: v.versionNo,
      state: v.state,
      author: { id: v.authorId, name: authorName },
      note: v.note,
      summary: (v.summary as VersionSummary | null) ?? null,
      updatedAt: v.updatedAt.toISOString(),
      releasedAt: iso(v.releasedAt),
    })),
  };
}

export async function getVersion(db: Db, viewer: Actor, id: number): Promise<RecipeVersion> {
  const releaser = alias(users, 'releaser');
  const [row] = await db
    .select({ v: recipeVersions, recipeName: recipes.name, authorName: users.name, releaserName: releaser.name })
    .from(recipeVersions)
    .innerJoin(recipes, eq(recipes.id, recipeVersions.recipeId))
    .innerJoin(users, eq(users.id, recipeVersions.authorId))
    .leftJoin(releaser, eq(releaser.id, recipeVersions.releasedById))
    .where(eq(recipeVersions.id, id))
    .limit(1);
  if (!row || !canSeeState(viewer, row.v.state)) throw notFound('The recipe version');
  const { v } = row;
  const document = v.document as RecipeDocument;
  const result = (v.result as RecipeResult | null) ?? null;
  return {
    id: v.id,
    recipeId: v.recipeId,
    recipeName: row.recipeName,
    versionNo: v.versionNo,
    state: v.state,
    revision: v.revision,
    document,
    result,
    summary: (v.summary as VersionSummary | null) ?? null,
    engineVersion: v.engineVersion,
    parameterSetId: v.parameterSetId,
    contentHash: v.contentHash,
    note: v.note,
    author: { id: v.authorId, name: row.authorName },
    basedOnVersionId: v.basedOnVersionId,
    submittedAt: iso(v.submittedAt),
    releasedAt: iso(v.releasedAt),
    releasedBy: v.releasedById && row.releaserName ? { id: v.releasedById, name: row.releaserName } : null,
    releaseMeaning: v.releaseMeaning,
    reviewComment: v.reviewComment,
    retiredAt: iso(v.retiredAt),
    createdAt: v.createdAt.toISOString(),
    updatedAt: v.updatedAt.toISOString(),
    tubeIssues: checkTubes(document, await listTubes(db)),
    warnings: result?.warnings ?? [],
  };
}

/** Columns a version stores beside its document: the authoritative result and its hash. */
async function computedColumns(db: Db, document: RecipeDocument) {
  const result = computeAuthoritative(document, await activeTubeFactors(db), 'document.');
  return {
    document,
    result,
    summary: summarize(result),
    engineVersion: result.engineVersion,
    parameterSetId: result.parameterSetId,
    contentHash: contentHash(document),
  };
}

/**
 * Fills the released-version list columns of recipes released before those
 * columns existed (migration 0005). Idempotent; touches only rows that need it.
 */
export async function backfillReleasedListColumns(db: Db): Promise<number> {
  const stale = await db
    .select({ id: recipes.id })
    .from(recipes)
    .where(and(sql`${recipes.releasedVersionNo} IS NOT NULL`, eq(recipes.releasedDopants, ''), eq(recipes.releasedTubeIds, '')));
  for (const { id } of stale) await db.transaction((tx) => refreshRecipeListColumns(tx, id));
  return stale.length;
}

/** Dopants and tube ids of a document as ",B,P," lists (commas around each for LIKE filters). */
function listColumns(doc: RecipeDocument): { dopants: string; tubeIds: string } {
  const dopants = [...new Set(doc.steps.flatMap((s) => ('dopant' in s ? [s.dopant] : [])))];
  const tubeIds = [...new Set(doc.steps.flatMap((s) => (s.tubeId ? [s.tubeId] : [])))];
  return { dopants: dopants.length ? `,${dopants.join(',')},` : '', tubeIds: tubeIds.length ? `,${tubeIds.join(',')},` : '' };
}

/** Keeps the recipe's list columns in step with its newest and released versions. */
export async function refreshRecipeListColumns(tx: Tx, recipeId: number): Promise<void> {
  const [latest] = await tx
    .select({ versionNo: recipeVersions.versionNo, state: recipeVersions.state, document: recipeVersions.document })
    .from(recipeVersions)
    .where(eq(recipeVersions.recipeId, recipeId))
    .orderBy(desc(recipeVersions.versionNo))
    .limit(1);
  const [released] = await tx
    .select({ versionNo: recipeVersions.versionNo, document: recipeVersions.document })
    .from(recipeVersions)
    .where(and(eq(recipeVersions.recipeId, recipeId), eq(recipeVersions.state, 'released')))
    .orderBy(desc(recipeVersions.versionNo))
    .limit(1);
  const latestLists = listColumns(latest.document as RecipeDocument);
  const releasedLists = released ? listColumns(released.document as RecipeDocument) : { dopants: '', tubeIds: '' };
  await tx
    .update(recipes)
    .set({
      latestVersionNo: latest.versionNo,
      latestState: latest.state,
      releasedVersionNo: released?.versionNo ?? null,
      dopants: latestLists.dopants,
      tubeIds: latestLists.tubeIds,
      releasedDopants: releasedLists.dopants,
      releasedTubeIds: releasedLists.tubeIds,
      updatedAt: new Date(),
    })
    .where(eq(recipes.id, recipeId));
}

export async function createRecipe(
  db: Db,
  actor: Actor,
  input: { name: string; description: string; document?: RecipeDocument },
): Promise<RecipeDetail> {
  const columns = await computedColumns(db, input.document ?? newRecipeDocument());
  const id = await db.transaction(async (tx) => {
    const [same] = await tx.select({ id: recipes.id }).from(recipes).where(eq(recipes.name, input.name)).limit(1);
    if (same) throw conflict(`A recipe named ${input.name} already exists`);
    const [{ id: recipeId }] = await tx
      .insert(recipes)
      .values({ name: input.name, description: input.description, ownerId: actor.id })
      .$returningId();
    const [{ id: versionId }] = await tx
      .insert(recipeVersions)
      .values({ recipeId, versionNo: 1, authorId: actor.id, note: input.document ? 'Imported' : '', ...columns })
      .$returningId();
    await refreshRecipeListColumns(tx, recipeId);
    await recordAudit(tx, {
      actor,
      action: input.document ? 'recipe.import' : 'recipe.create',
      entityType: 'recipe_version',
      entityId: versionId,
      toState: 'draft',
      contentHash: columns.contentHash,
      details: { recipeId, versionNo: 1, name: input.name },
    });
    return recipeId;
  });
  return getRecipe(db, actor, id);
}

export async function patchRecipe(db: Db, actor: Actor, id: number, input: { name?: string; description?: string }) {
  await db.transaction(async (tx) => {
    const [row] = await tx.select().from(recipes).where(eq(recipes.id, id)).limit(1).for('update');
    if (!row) throw notFound('The recipe');
    if (actor.role === 'engineer' && row.ownerId !== actor.id) throw forbidden('Only the recipe owner or a lead renames a recipe');
    if (input.name && input.name !== row.name) {
      const [same] = await tx.select({ id: recipes.id }).from(recipes).where(eq(recipes.name, input.name)).limit(1);
      if (same) throw conflict(`A recipe named ${input.name} already exists`);
    }
    await tx.update(recipes).set(input).where(eq(recipes.id, id));
    await recordAudit(tx, { actor, action: 'recipe.update', entityType: 'recipe', entityId: id, details: { ...input } });
  });
  return getRecipe(db, actor, id);
}

/** Saves a draft: only a draft, only at the revision it was read, only by its author or a lead. */
export async function saveDraft(
  db: Db,
  actor: Actor,
  id: number,
  input: { revision: number; document: RecipeDocument; note: string },
): Promise<RecipeVersion> {
  const columns = await computedColumns(db, input.document);
  await db.transaction(async (tx) => {
    const [v] = await tx.select().from(recipeVersions).where(eq(recipeVersions.id, id)).limit(1).for('update');
    if (!v) throw notFound('The recipe version');
    if (v.state !== 'draft') {
      throw new HttpError(409, 'not_draft', `Version ${v.versionNo} is ${v.state.replace('_', ' ')} and can no longer change; make a new version from it`);
    }
    if (actor.role === 'engineer' && v.authorId !== actor.id) {
      throw forbidden('Only the author of a draft (or a lead) saves it; make a new version from it instead');
    }
    if (v.revision !== input.revision) {
      throw new HttpError(409, 'stale', `Someone saved this draft after you opened it (revision ${v.revision}, yours ${input.revision}); reload it`);
    }
    await tx
      .update(recipeVersions)
      .set({ ...columns, note: input.note, revision: v.revision + 1 })
      .where(eq(recipeVersions.id, id));
    await refreshRecipeListColumns(tx, v.recipeId);
    await recordAudit(tx, {
      actor,
      action: 'version.save',
      entityType: 'recipe_version',
      entityId: id,
      contentHash: columns.contentHash,
      details: { recipeId: v.recipeId, versionNo: v.versionNo, revision: v.revision + 1 },
    });
  });
  return getVersion(db, actor, id);
}

/** "New version from this one": copies any version into the recipe's next draft. */
export async function copyVersion(db: Db, actor: Actor, id: number, note: string): Promise<RecipeVersion> {
  const source = await getVersion(db, actor, id);
  const columns = await computedColumns(db, source.document);
  const newId = await db.transaction(async (tx) => {
    // Lock the recipe row so two copies at once get distinct numbers.
    await tx.select({ id: recipes.id }).from(recipes).where(eq(recipes.id, source.recipeId)).for('update');
    const [{ top }] = await tx
      .select({ top: max(recipeVersions.versionNo) })
      .from(recipeVersions)
      .where(eq(recipeVersions.recipeId, source.recipeId));
    const [{ id: versionId }] = await tx
      .insert(recipeVersions)
      .values({
        recipeId: source.recipeId,
        versionNo: (top ?? 0) + 1,
        authorId: actor.id,
        basedOnVersionId: source.id,
        note: note || `From version ${source.versionNo}`,
        ...columns,
      })
      .$returningId();
    await refreshRecipeListColumns(tx, source.recipeId);
    await recordAudit(tx, {
      actor,
      action: 'version.copy',
      entityType: 'recipe_version',
      entityId: versionId,
      toState: 'draft',
      contentHash: columns.contentHash,
      details: { recipeId: source.recipeId, versionNo: (top ?? 0) + 1, from: source.id, fromVersionNo: source.versionNo },
    });
    return versionId;
  });
  return getVersion(db, actor, newId);
}
