import { auditEvents } from '../db/schema';
import type { Db } from '../db/index';
import type { Role } from '../../shared/schemas/users';

/** A Drizzle handle or a transaction: audit rows go into the caller's transaction. */
type Tx = Db | Parameters<Parameters<Db['transaction']>[0]>[0];

export interface AuditInput {
  actor: { id: number; role: Role } | null;
  action: string;
  entityType: string;
  entityId?: number | null;
  fromState?: string | null;
  toState?: string | null;
  comment?: string | null;
  contentHash?: string | null;
  details?: Record<string, unknown> | null;
}

/** Appends one audit row; call it inside the transaction of the change it records. */
export async function recordAudit(tx: Tx, e: AuditInput): Promise<void> {
  await tx.insert(auditEvents).values({
    actorId: e.actor?.id ?? null,
    actorRole: e.actor?.role ?? null,
    action: e.action,
    entityType: e.entityType,
    entityId: e.entityId ?? null,
    fromState: e.fromState ?? null,
    toState: e.toState ?? null,
    comment: e.comment ?? null,
    contentHash: e.contentHash ?? null,
    details: e.details ?? null,
  });
}

export type { Tx };
