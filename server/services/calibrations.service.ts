// Per-tube calibration: fit a diffusivity factor from the tube's lots'
// measured junction depths, keep every fit as history, apply the newest one
// to recipes that opt in.
import { desc, eq, inArray } from 'drizzle-orm';
import { CalibrationFitError, fitDiffusivityFactor, type FitCase } from '../../shared/analysis/calibration-fit';
import { computeRecipe } from '../../shared/engine/index';
import type { TubeFactors } from '../../shared/engine/step-plan';
import type { RecipeDocument } from '../../shared/schemas/recipe';
import type { Calibration, CalibrationPoint, ProfileSummary } from '../../shared/schemas/measurements';
import type { Db } from '../db/index';
import { calibrations, lots, measurements, recipeVersions, tubes, users } from '../db/schema';
import { HttpError, notFound } from '../http-error';
import { recordAudit } from './audit.service';
import type { Actor } from './recipes.service';

function toCalibration(c: typeof calibrations.$inferSelect, fittedByName: string): Calibration {
  return {
    id: c.id,
    tubeId: c.tubeId,
    factor: c.factor,
    factorRange: [c.factor * Math.exp(-c.lnFactorStdErr), c.factor * Math.exp(c.lnFactorStdErr)],
    rmsLogErrorBefore: c.rmsLogErrorBefore,
    rmsLogErrorAfter: c.rmsLogErrorAfter,
    points: c.points,
    data: c.data as CalibrationPoint[],
    note: c.note,
    fittedBy: { id: c.fittedById, name: fittedByName },
    createdAt: c.createdAt.toISOString(),
  };
}

/** Every fit of a tube, newest (the one in force) first. */
export async function listCalibrations(db: Db, tubeId: number): Promise<Calibration[]> {
  const rows = await db
    .select({ c: calibrations, name: users.name })
    .from(calibrations)
    .innerJoin(users, eq(users.id, calibrations.fittedById))
    .where(eq(calibrations.tubeId, tubeId))
    .orderBy(desc(calibrations.id));
  return rows.map((r) => toCalibration(r.c, r.name));
}

/** The factor in force per tube (its newest fit). */
export async function activeTubeFactors(db: Db): Promise<TubeFactors> {
  const rows = await db.select({ id: calibrations.id, tubeId: calibrations.tubeId, factor: calibrations.factor }).from(calibrations).orderBy(calibrations.id);
  const out: TubeFactors = {};
  for (const r of rows) out[r.tubeId] = r.factor;
  return out;
}

/** The lots of a tube with a measured junction: the fit's data. */
async function fitCases(db: Db, tubeId: number) {
  const rows = await db
    .select({ lotId: lots.id, lotCode: lots.lotCode, versionId: lots.versionId, document: recipeVersions.document, summary: measurements.summary })
    .from(measurements)
    .innerJoin(lots, eq(lots.id, measurements.lotId))
    .innerJoin(recipeVersions, eq(recipeVersions.id, lots.versionId))
    .where(eq(lots.tubeId, tubeId))
    .orderBy(measurements.id);
  // One case per lot: its newest profile with a junction.
  const byLot = new Map<number, (typeof rows)[number]>();
  for (const r of rows) {
    const s = r.summary as Partial<ProfileSummary>;
    if (Array.isArray(s.junctionDepthsUm) && s.junctionDepthsUm.length > 0) byLot.set(r.lotId, r);
  }
  return [...byLot.values()].map((r) => {
    // Predict as if the recipe opted in, with this tube's factor varied and no other.
    const doc = { ...(r.document as RecipeDocument), options: { ...(r.document as RecipeDocument).options, useTubeCalibration: true } };
    const measured = (r.summary as ProfileSummary).junctionDepthsUm[0];
    const fitCase: FitCase = {
      measuredUm: measured,
      predict: (factor) => computeRecipe(doc, { tubeFactors: { [tubeId]: factor } }).final.junctionDepthsUm[0] ?? null,
    };
    return { ...r, measured, fitCase };
  });
}

export async function fitCalibration(db: Db, actor: Actor, tubeId: number, note: string): Promise<Calibration> {
  const [tube] = await db.select({ id: tubes.id }).from(tubes).where(eq(tubes.id, tubeId)).limit(1);
  if (!tube) throw notFound('The tube');
  const cases = await fitCases(db, tubeId);
  let fit;
  try {
    fit = fitDiffusivityFactor(cases.map((c) => c.fitCase));
  } catch (e) {
    if (e instanceof CalibrationFitError) throw new HttpError(422, 'cannot_fit', e.message);
    throw e;
  }
  const data: CalibrationPoint[] = cases.map((c, i) => ({
    lotId: c.lotId,
    lotCode: c.lotCode,
    versionId: c.versionId,
    measuredUm: c.measured,
    predictedUm: fit.predictedUm[i],
    correctedUm: fit.correctedUm[i],
  }));
  const id = await db.transaction(async (tx) => {
    const [{ id: calId }] = await tx
      .insert(calibrations)
      .values({
        tubeId,
        factor: fit.factor,
        lnFactorStdErr: fit.lnFactorStdErr,
        rmsLogErrorBefore: fit.rmsLogErrorBefore,
        rmsLogErrorAfter: fit.rmsLogErrorAfter,
        points: cases.length,
        data,
        note,
        fittedById: actor.id,
      })
      .$returningId();
    await recordAudit(tx, { actor, action: 'tube.calibrate', entityType: 'tube', entityId: tubeId, comment: note || null, details: { factor: fit.factor, lots: cases.length, calibrationId: calId } });
    return calId;
  });
  const [row] = await db.select({ c: calibrations, name: users.name }).from(calibrations).innerJoin(users, eq(users.id, calibrations.fittedById)).where(inArray(calibrations.id, [id]));
  return toCalibration(row.c, row.name);
}
