import { and, asc, eq } from 'drizzle-orm';
import type { CreateUserInput, PatchUserInput, PersonSummary, Role, User } from '../../shared/schemas/users';
import type { Db } from '../db/index';
import { users } from '../db/schema';
import { conflict, notFound } from '../http-error';
import { recordAudit } from './audit.service';
import { DUMMY_HASH, hashPassword, verifyPassword } from './passwords';

type UserRow = typeof users.$inferSelect;
type Actor = { id: number; role: Role };

export function toUser(row: UserRow): User {
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: row.role,
    active: row.active,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export async function findActiveUser(db: Db, id: number) {
  const [row] = await db
    .select({ id: users.id, email: users.email, name: users.name, role: users.role })
    .from(users)
    .where(and(eq(users.id, id), eq(users.active, true)))
    .limit(1);
  return row;
}

/** The person with these credentials, or undefined (unknown, wrong password, or inactive). */
export async function authenticate(db: Db, email: string, password: string): Promise<User | undefined> {
  const [row] = await db.select().from(users).where(eq(users.email, email)).limit(1);
  const ok = await verifyPassword(password, row?.passwordHash ?? DUMMY_HASH);
  return row && ok && row.active ? toUser(row) : undefined;
}

/** Checks a signed-in person's password again (signatures ask for it). */
export async function confirmPassword(db: Db, id: number, password: string): Promise<boolean> {
  const [row] = await db.select({ hash: users.passwordHash }).from(users).where(eq(users.id, id)).limit(1);
  return verifyPassword(password, row?.hash ?? DUMMY_HASH);
}

export async function listUsers(db: Db): Promise<User[]> {
  const rows = await db.select().from(users).orderBy(asc(users.name));
  return rows.map(toUser);
}

/** Names and roles of everyone, for filters and pickers (no e-mail addresses). */
export async function listPeopleDirectory(db: Db): Promise<PersonSummary[]> {
  return db.select({ id: users.id, name: users.name, role: users.role, active: users.active }).from(users).orderBy(asc(users.name));
}

export async function getUser(db: Db, id: number): Promise<User> {
  const [row] = await db.select().from(users).where(eq(users.id, id)).limit(1);
  if (!row) throw notFound('The person');
  return toUser(row);
}

export async function createUser(db: Db, actor: Actor | null, input: CreateUserInput): Promise<User> {
  const passwordHash = await hashPassword(input.password);
  return db.transaction(async (tx) => {
    const [exists] = await tx.select({ id: users.id }).from(users).where(eq(users.email, input.email)).limit(1);
    if (exists) throw conflict(`${input.email} already has an account`);
    const [{ id }] = await tx
      .insert(users)
      .values({ email: input.email, name: input.name, role: input.role, passwordHash })
      .$returningId();
    await recordAudit(tx, {
      actor,
      action: 'person.create',
      entityType: 'user',
      entityId: id,
      details: { email: input.email, role: input.role },
    });
    const [row] = await tx.select().from(users).where(eq(users.id, id));
    return toUser(row);
  });
}

export async function patchUser(db: Db, actor: Actor, id: number, input: PatchUserInput): Promise<User> {
  if (id === actor.id && (input.active === false || (input.role && input.role !== 'admin'))) {
    throw conflict('You cannot deactivate yourself or give up your own admin role; ask another admin');
  }
  const passwordHash = input.password ? await hashPassword(input.password) : undefined;
  return db.transaction(async (tx) => {
    const [before] = await tx.select().from(users).where(eq(users.id, id)).limit(1).for('update');
    if (!before) throw notFound('The person');
    await tx
      .update(users)
      .set({
        ...(input.name !== undefined ? { name: input.name } : {}),
        ...(input.role !== undefined ? { role: input.role } : {}),
        ...(input.active !== undefined ? { active: input.active } : {}),
        ...(passwordHash ? { passwordHash } : {}),
      })
      .where(eq(users.id, id));
    const changed = Object.keys(input).filter((k) => k !== 'password');
    await recordAudit(tx, {
      actor,
      action: input.active === false ? 'person.deactivate' : input.active === true ? 'person.reactivate' : 'person.update',
      entityType: 'user',
      entityId: id,
      details: {
        changed: input.password ? [...changed, 'password'] : changed,
        ...(input.role && input.role !== before.role ? { role: { from: before.role, to: input.role } } : {}),
      },
    });
    const [row] = await tx.select().from(users).where(eq(users.id, id));
    return toUser(row);
  });
}
