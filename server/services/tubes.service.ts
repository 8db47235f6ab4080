import { asc, eq } from 'drizzle-orm';
import type { CreateTubeInput, PatchTubeInput, Tube } from '../../shared/schemas/tubes';
import type { Role } from '../../shared/schemas/users';
import type { Db } from '../db/index';
import { tubes } from '../db/schema';
import { conflict, HttpError, notFound } from '../http-error';
import { recordAudit } from './audit.service';

type TubeRow = typeof tubes.$inferSelect;
type Actor = { id: number; role: Role };

export function toTube(row: TubeRow): Tube {
  return {
    id: row.id,
    name: row.name,
    dedication: row.dedication,
    minTempC: row.minTempC,
    maxTempC: row.maxTempC,
    ambients: row.ambients,
    notes: row.notes,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export async function listTubes(db: Db): Promise<Tube[]> {
  return (await db.select().from(tubes).orderBy(asc(tubes.name))).map(toTube);
}

export async function getTube(db: Db, id: number): Promise<Tube> {
  const [row] = await db.select().from(tubes).where(eq(tubes.id, id)).limit(1);
  if (!row) throw notFound('The tube');
  return toTube(row);
}

export async function createTube(db: Db, actor: Actor | null, input: CreateTubeInput): Promise<Tube> {
  return db.transaction(async (tx) => {
    const [same] = await tx.select({ id: tubes.id }).from(tubes).where(eq(tubes.name, input.name)).limit(1);
    if (same) throw conflict(`A tube named ${input.name} already exists`);
    const [{ id }] = await tx.insert(tubes).values(input).$returningId();
    await recordAudit(tx, { actor, action: 'tube.create', entityType: 'tube', entityId: id, details: { ...input } });
    const [row] = await tx.select().from(tubes).where(eq(tubes.id, id));
    return toTube(row);
  });
}

export async function patchTube(db: Db, actor: Actor, id: number, input: PatchTubeInput): Promise<Tube> {
  return db.transaction(async (tx) => {
    const [before] = await tx.select().from(tubes).where(eq(tubes.id, id)).limit(1).for('update');
    if (!before) throw notFound('The tube');
    const min = input.minTempC ?? before.minTempC;
    const max = input.maxTempC ?? before.maxTempC;
    if (min >= max) {
      throw new HttpError(400, 'invalid_input', 'The request body is not valid', [
        { path: 'maxTempC', message: 'The lowest temperature must be below the highest' },
      ]);
    }
    await tx.update(tubes).set(input).where(eq(tubes.id, id));
    await recordAudit(tx, { actor, action: 'tube.update', entityType: 'tube', entityId: id, details: { ...input } });
    const [row] = await tx.select().from(tubes).where(eq(tubes.id, id));
    return toTube(row);
  });
}
