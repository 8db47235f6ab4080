import { and, count, desc, eq, gte, lt, type SQL } from 'drizzle-orm';
import { auditQuerySchema, type AuditPage, type AuditQuery, type AuditRow } from '../../shared/schemas/signoff';
import type { Db } from '../db/index';
import { auditEvents, users } from '../db/schema';

function filters(q: ReturnType<typeof auditQuerySchema.parse>): SQL | undefined {
  const where: SQL[] = [];
  if (q.from) where.push(gte(auditEvents.at, new Date(`${q.from}T00:00:00Z`)));
  if (q.to) where.push(lt(auditEvents.at, new Date(new Date(`${q.to}T00:00:00Z`).getTime() + 86_400_000)));
  if (q.actorId) where.push(eq(auditEvents.actorId, q.actorId));
  if (q.action) where.push(eq(auditEvents.action, q.action));
  if (q.entityType) where.push(eq(auditEvents.entityType, q.entityType));
  if (q.entityId) where.push(eq(auditEvents.entityId, q.entityId));
  return where.length ? and(...where) : undefined;
}

/** Audit rows newest first, filtered; `pageSize` rows of page `page`. */
export async function listAudit(db: Db, raw: AuditQuery): Promise<AuditPage> {
  const q = auditQuerySchema.parse(raw);
  const where = filters(q);
  const [rows, [{ total }]] = await Promise.all([
    db
      .select({ e: auditEvents, actorName: users.name })
      .from(auditEvents)
      .leftJoin(users, eq(users.id, auditEvents.actorId))
      .where(where)
      .orderBy(desc(auditEvents.id))
      .limit(q.pageSize)
      .offset((q.page - 1) * q.pageSize),
    db.select({ total: count() }).from(auditEvents).where(where),
  ]);
  return {
    rows: rows.map(({ e, actorName }): AuditRow => ({
      id: e.id,
      at: e.at.toISOString(),
      actor: e.actorId && actorName ? { id: e.actorId, name: actorName } : null,
      actorRole: e.actorRole,
      action: e.action,
      entityType: e.entityType,
      entityId: e.entityId,
      fromState: e.fromState,
      toState: e.toState,
      comment: e.comment,
      contentHash: e.contentHash,
      details: (e.details as Record<string, unknown> | null) ?? null,
    })),
    total,
    page: q.page,
    pageSize: q.pageSize,
  };
}

const csvCell = (v: unknown) => {
  const s = v === null || v === undefined ? '' : typeof v === 'object' ? JSON.stringify(v) : String(v);
  // Quote everything that could break a row; defuse spreadsheet formulas.
  const safe = /^[=+\-@]/.test(s) ? `'${s}` : s;
  return /[",\n\r]/.test(safe) || safe !== s ? `"${safe.replace(/"/g, '""')}"` : safe;
};

/** The filtered audit trail as CSV (all matching rows, up to 100 000). */
export async function auditCsv(db: Db, raw: AuditQuery): Promise<string> {
  const page = await listAudit(db, { ...raw, page: 1, pageSize: 500 });
  const rows = [...page.rows];
  for (let p = 2; rows.length < page.total && p <= 200; p++) rows.push(...(await listAudit(db, { ...raw, page: p, pageSize: 500 })).rows);
  const header = ['id', 'at', 'actor', 'role', 'action', 'entity', 'entity_id', 'from', 'to', 'comment', 'content_hash', 'details'];
  const lines = rows.map((r) =>
    [r.id, r.at, r.actor?.name, r.actorRole, r.action, r.entityType, r.entityId, r.fromState, r.toState, r.comment, r.contentHash, r.details].map(csvCell).join(','),
  );
  return [header.join(','), ...lines].join('\r\n') + '\r\n';
}
