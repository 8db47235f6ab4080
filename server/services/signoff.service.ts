// The sign-off chain: Draft → In review → Released (→ Retired), or back to
// Draft with the lead's comment. Each transition is one transaction that locks
// the version row, checks who and what, writes the change and its audit row,
// and queues the e-mails; mail is delivered only after the commit.
import { and, asc, eq, ne } from 'drizzle-orm';
import { alias } from 'drizzle-orm/mysql-core';
import { checkTubes } from '../../shared/rules/tube-check';
import type { RecipeDocument } from '../../shared/schemas/recipe';
import type { QueueItem, SignatureMeaning } from '../../shared/schemas/signoff';
import { SIGNATURE_MEANING_LABELS } from '../../shared/schemas/signoff';
import type { Db } from '../db/index';
import { recipes, recipeVersions, users } from '../db/schema';
import { forbidden, HttpError, notFound } from '../http-error';
import { recordAudit, type Tx } from './audit.service';
import { computeAuthoritative, summarize } from './compute.service';
import type { Mailer } from './mail/outbox.service';
import { queueMail } from './mail/outbox.service';
import { refreshRecipeListColumns, type Actor } from './recipes.service';
import { listTubes } from './tubes.service';
import { activeTubeFactors } from './calibrations.service';
import { confirmPassword } from './users.service';

type VersionRow = typeof recipeVersions.$inferSelect;

const stateName = (s: string) => s.replace('_', ' ');

async function lockVersion(tx: Tx, id: number) {
  const [row] = await tx
    .select({ v: recipeVersions, recipeName: recipes.name, authorEmail: users.email, authorName: users.name })
    .from(recipeVersions)
    .innerJoin(recipes, eq(recipes.id, recipeVersions.recipeId))
    .innerJoin(users, eq(users.id, recipeVersions.authorId))
    .where(eq(recipeVersions.id, id))
    .limit(1)
    .for('update');
  if (!row) throw notFound('The recipe version');
  return row;
}

function requireState(v: VersionRow, state: VersionRow['state'], action: string): void {
  if (v.state !== state) {
    throw new HttpError(409, 'wrong_state', `Version ${v.versionNo} is ${stateName(v.state)}; only a version ${stateName(state)} can be ${action}`);
  }
}

async function activeLeadEmails(tx: Tx, exceptId: number): Promise<string[]> {
  const rows = await tx
    .select({ email: users.email })
    .from(users)
    .where(and(eq(users.role, 'lead'), eq(users.active, true), ne(users.id, exceptId)));
  return rows.map((r) => r.email);
}

const versionLink = (appUrl: string, v: VersionRow) => `${appUrl}/recipes/${v.recipeId}?version=${v.id}`;

/** Author (or a lead) sends a draft for review; refused while tube rules or the engine object. */
export async function submitVersion(db: Db, mailer: Mailer | undefined, actor: Actor, id: number, note: string): Promise<void> {
  const tubes = await listTubes(db);
  const factors = await activeTubeFactors(db);
  await db.transaction(async (tx) => {
    const { v, recipeName } = await lockVersion(tx, id);
    requireState(v, 'draft', 'submitted');
    if (actor.role !== 'lead' && v.authorId !== actor.id) throw forbidden('Only the author of a draft (or a lead) submits it');
    const document = v.document as RecipeDocument;
    const tubeIssues = checkTubes(document, tubes);
    if (tubeIssues.length > 0) {
      throw new HttpError(422, 'tube_rules', 'Steps break their tubes\u2019 rules; fix them before submitting', tubeIssues.map(({ path, message }) => ({ path, message })));
    }
    // Recompute so the lead reviews what the current engine predicts.
    const result = computeAuthoritative(document, factors, 'document.');
    await tx
      .update(recipeVersions)
      .set({ state: 'in_review', submittedAt: new Date(), result, summary: summarize(result), engineVersion: result.engineVersion, parameterSetId: result.parameterSetId, reviewComment: null, ...(note ? { note } : {}) })
      .where(eq(recipeVersions.id, id));
    await refreshRecipeListColumns(tx, v.recipeId);
    await recordAudit(tx, { actor, action: 'version.submit', entityType: 'recipe_version', entityId: id, fromState: 'draft', toState: 'in_review', comment: note || null, contentHash: v.contentHash, details: { recipeId: v.recipeId, versionNo: v.versionNo } });
    const appUrl = mailer?.appUrl ?? '';
    await queueMail(tx, [
      {
        to: await activeLeadEmails(tx, v.authorId),
        subject: `[Tubewright] ${recipeName} v${v.versionNo} awaits your sign-off`,
        text: `${recipeName}, version ${v.versionNo}, was submitted for sign-off.\n${note ? `\nNote: ${note}\n` : ''}\nReview it: ${versionLink(appUrl, v)}\nSign-off queue: ${appUrl}/sign-off\n`,
        relatedType: 'recipe_version',
        relatedId: id,
      },
    ]);
  });
}

/** A lead other than the author signs with password and stated meaning; the previous release retires. */
export async function signOffVersion(
  db: Db,
  mailer: Mailer | undefined,
  actor: Actor,
  id: number,
  input: { password: string; meaning: SignatureMeaning },
): Promise<void> {
  if (!(await confirmPassword(db, actor.id, input.password))) {
    throw new HttpError(403, 'wrong_password', 'The password is wrong; the version was not signed');
  }
  await db.transaction(async (tx) => {
    const { v, recipeName, authorEmail } = await lockVersion(tx, id);
    if (v.authorId === actor.id) throw forbidden('You wrote this version; another lead must sign it');
    requireState(v, 'in_review', 'signed');
    const now = new Date();
    const superseded = await tx
      .select({ id: recipeVersions.id, versionNo: recipeVersions.versionNo, contentHash: recipeVersions.contentHash })
      .from(recipeVersions)
      .where(and(eq(recipeVersions.recipeId, v.recipeId), eq(recipeVersions.state, 'released')))
      .for('update');
    for (const old of superseded) {
      await tx.update(recipeVersions).set({ state: 'retired', retiredAt: now }).where(eq(recipeVersions.id, old.id));
      await recordAudit(tx, { actor, action: 'version.retire', entityType: 'recipe_version', entityId: old.id, fromState: 'released', toState: 'retired', comment: `Superseded by version ${v.versionNo}`, contentHash: old.contentHash, details: { recipeId: v.recipeId, versionNo: old.versionNo } });
    }
    await tx
      .update(recipeVersions)
      .set({ state: 'released', releasedAt: now, releasedById: actor.id, releaseMeaning: input.meaning })
      .where(eq(recipeVersions.id, id));
    await refreshRecipeListColumns(tx, v.recipeId);
    await recordAudit(tx, { actor, action: 'version.release', entityType: 'recipe_version', entityId: id, fromState: 'in_review', toState: 'released', comment: SIGNATURE_MEANING_LABELS[input.meaning], contentHash: v.contentHash, details: { recipeId: v.recipeId, versionNo: v.versionNo, meaning: input.meaning } });
    const appUrl = mailer?.appUrl ?? '';
    await queueMail(tx, [
      {
        to: [authorEmail],
        subject: `[Tubewright] ${recipeName} v${v.versionNo} is released`,
        text: `${recipeName}, version ${v.versionNo}, was signed and released.\nMeaning of the signature: ${SIGNATURE_MEANING_LABELS[input.meaning]}.\n${superseded.length ? `It supersedes version ${superseded.map((s) => s.versionNo).join(', ')}, now retired.\n` : ''}\nOpen it: ${versionLink(appUrl, v)}\n`,
        relatedType: 'recipe_version',
        relatedId: id,
      },
    ]);
  });
}

/** A lead other than the author sends a version back to Draft with a comment. */
export async function returnVersion(db: Db, mailer: Mailer | undefined, actor: Actor, id: number, comment: string): Promise<void> {
  await db.transaction(async (tx) => {
    const { v, recipeName, authorEmail } = await lockVersion(tx, id);
    if (v.authorId === actor.id) throw forbidden('You wrote this version; another lead must review it');
    requireState(v, 'in_review', 'returned');
    await tx
      .update(recipeVersions)
      .set({ state: 'draft', reviewComment: comment, submittedAt: null, revision: v.revision + 1 })
      .where(eq(recipeVersions.id, id));
    await refreshRecipeListColumns(tx, v.recipeId);
    await recordAudit(tx, { actor, action: 'version.return', entityType: 'recipe_version', entityId: id, fromState: 'in_review', toState: 'draft', comment, contentHash: v.contentHash, details: { recipeId: v.recipeId, versionNo: v.versionNo } });
    const appUrl = mailer?.appUrl ?? '';
    await queueMail(tx, [
      {
        to: [authorEmail],
        subject: `[Tubewright] ${recipeName} v${v.versionNo} was returned to Draft`,
        text: `${recipeName}, version ${v.versionNo}, was returned to Draft.\n\nComment: ${comment}\n\nOpen it: ${versionLink(appUrl, v)}\n`,
        relatedType: 'recipe_version',
        relatedId: id,
      },
    ]);
  });
}

/** A lead retires a released version (no successor needed). */
export async function retireVersion(db: Db, actor: Actor, id: number, comment: string): Promise<void> {
  await db.transaction(async (tx) => {
    const { v } = await lockVersion(tx, id);
    requireState(v, 'released', 'retired');
    await tx.update(recipeVersions).set({ state: 'retired', retiredAt: new Date() }).where(eq(recipeVersions.id, id));
    await refreshRecipeListColumns(tx, v.recipeId);
    await recordAudit(tx, { actor, action: 'version.retire', entityType: 'recipe_version', entityId: id, fromState: 'released', toState: 'retired', comment: comment || null, contentHash: v.contentHash, details: { recipeId: v.recipeId, versionNo: v.versionNo } });
  });
}

/** Versions in review, oldest first, each with the released version to compare against. */
export async function reviewQueue(db: Db, viewer: Actor): Promise<QueueItem[]> {
  const released = alias(recipeVersions, 'released');
  const rows = await db
    .select({ v: recipeVersions, recipeName: recipes.name, authorName: users.name, releasedId: released.id, releasedNo: released.versionNo })
    .from(recipeVersions)
    .innerJoin(recipes, eq(recipes.id, recipeVersions.recipeId))
    .innerJoin(users, eq(users.id, recipeVersions.authorId))
    .leftJoin(released, and(eq(released.recipeId, recipeVersions.recipeId), eq(released.state, 'released')))
    .where(eq(recipeVersions.state, 'in_review'))
    .orderBy(asc(recipeVersions.submittedAt));
  return rows.map(({ v, recipeName, authorName, releasedId, releasedNo }) => ({
    versionId: v.id,
    recipeId: v.recipeId,
    recipeName,
    versionNo: v.versionNo,
    author: { id: v.authorId, name: authorName },
    submittedAt: (v.submittedAt ?? v.updatedAt).toISOString(),
    note: v.note,
    releasedVersionId: releasedId,
    releasedVersionNo: releasedNo,
    mine: v.authorId === viewer.id,
  }));
}
