// Measured results against a lot. An upload is parsed and checked whole
// before anything is written; then file, points and summary go in with an
// audit row in one transaction.
import { desc, eq, type SQL } from 'drizzle-orm';
import { summarizeProfile, summarizeSheet } from '../../shared/analysis/measured';
import type { RecipeResult } from '../../shared/engine/types';
import { DOPANTS } from '../../shared/engine/dopants';
import type {
  LotComparison,
  Measurement,
  ProfilePoints,
  ProfileSummary,
  SheetPoints,
  SheetSummary,
} from '../../shared/schemas/measurements';
import { uploadFieldsSchema, type UploadFields } from '../../shared/schemas/measurements';
import type { Db } from '../db/index';
import { lots, measurements, recipeVersions, users } from '../db/schema';
import { HttpError, notFound } from '../http-error';
import { recordAudit } from './audit.service';
import { parseProfileCsv, parseSheetCsv } from './measurements/parse-measurement-csv';
import type { Actor } from './recipes.service';

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
}

async function lotWithResult(db: Db, lotId: number) {
  const [row] = await db
    .select({ lot: lots, result: recipeVersions.result })
    .from(lots)
    .innerJoin(recipeVersions, eq(recipeVersions.id, lots.versionId))
    .where(eq(lots.id, lotId))
    .limit(1);
  if (!row) throw notFound('The lot');
  return { lot: row.lot, result: row.result as RecipeResult | null };
}

export async function storeUpload(db: Db, actor: Actor, lotId: number, rawFields: UploadFields, file: UploadedFile | undefined): Promise<Measurement> {
  const fields = uploadFieldsSchema.parse(rawFields);
  const { result } = await lotWithResult(db, lotId);
  if (!file) throw new HttpError(400, 'invalid_input', 'Choose a CSV file to upload', [{ path: 'file', message: 'Choose a CSV file' }]);
  const text = file.buffer.toString('utf8');
  const parsed = fields.kind === 'profile' ? parseProfileCsv(text, fields) : parseSheetCsv(text, fields);
  if (!parsed.ok) {
    throw new HttpError(400, 'invalid_file', `${file.originalname} was not stored: ${parsed.issues.length} problem${parsed.issues.length > 1 ? 's' : ''} in the file`, parsed.issues);
  }
  const background = result?.substrate.backgroundCm3;
  if (fields.kind === 'profile' && background === undefined) throw new HttpError(409, 'no_prediction', 'The lot\u2019s recipe version has no stored result to compare with');
  const species = DOPANTS.find((d) => d.toLowerCase() === parsed.declared.species?.trim().toLowerCase());
  const summary =
    fields.kind === 'profile'
      ? { ...summarizeProfile(parsed.points as ProfilePoints, background!), ...(species ? { species } : {}) }
      : summarizeSheet(parsed.points as SheetPoints);
  const id = await db.transaction(async (tx) => {
    const [{ id: mId }] = await tx
      .insert(measurements)
      .values({
        lotId,
        kind: fields.kind,
        method: fields.method,
        fileName: file.originalname.slice(0, 200),
        points: parsed.points,
        summary,
        notes: fields.notes,
        uploadedById: actor.id,
      })
      .$returningId();
    await recordAudit(tx, { actor, action: 'measurement.upload', entityType: 'lot', entityId: lotId, details: { measurementId: mId, kind: fields.kind, file: file.originalname, units: parsed.units } });
    return mId;
  });
  const [stored] = await selectMeasurements(db, eq(measurements.id, id));
  return stored;
}

export function listMeasurements(db: Db, lotId: number): Promise<Measurement[]> {
  return selectMeasurements(db, eq(measurements.lotId, lotId));
}

async function selectMeasurements(db: Db, where: SQL): Promise<Measurement[]> {
  const rows = await db
    .select({ m: measurements, name: users.name })
    .from(measurements)
    .innerJoin(users, eq(users.id, measurements.uploadedById))
    .where(where)
    .orderBy(desc(measurements.id));
  return rows.map(({ m, name }) => ({
    id: m.id,
    lotId: m.lotId,
    kind: m.kind,
    method: m.method,
    fileName: m.fileName,
    notes: m.notes,
    points: m.points as ProfilePoints | SheetPoints,
    summary: m.summary as ProfileSummary | SheetSummary,
    uploadedBy: { id: m.uploadedById, name },
    createdAt: m.createdAt.toISOString(),
  }));
}

const pct = (measured: number | null, predicted: number | null) =>
  measured === null || predicted === null || predicted === 0 ? null : ((measured - predicted) / predicted) * 100;

/** The newest measured profile and four-point-probe set against the stored prediction. */
export async function compareLot(db: Db, lotId: number, list?: Measurement[]): Promise<LotComparison | null> {
  const { result } = await lotWithResult(db, lotId);
  if (!result) return null;
  const all = list ?? (await listMeasurements(db, lotId));
  const profile = all.find((m) => m.kind === 'profile')?.summary as ProfileSummary | undefined;
  const sheet = all.find((m) => m.kind === 'sheet_resistance')?.summary as SheetSummary | undefined;
  const pXj = result.final.junctionDepthsUm[0] ?? null;
  const pRs = result.final.sheetResistanceOhmSq;
  const mXj = profile?.junctionDepthsUm[0] ?? null;
  const mRs = sheet?.meanOhmSq ?? null;
  return {
    predicted: { junctionDepthUm: pXj, sheetResistanceOhmSq: pRs, surfaceConcentrationCm3: result.final.surfaceNetCm3 },
    measured: { junctionDepthUm: mXj, sheetResistanceOhmSq: mRs },
    delta: {
      junctionDepthUm: mXj !== null && pXj !== null ? mXj - pXj : null,
      junctionDepthPct: pct(mXj, pXj),
      sheetResistanceOhmSq: mRs !== null && pRs !== null ? mRs - pRs : null,
      sheetResistancePct: pct(mRs, pRs),
    },
  };
}
