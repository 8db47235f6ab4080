// E-mail goes through an outbox: messages are queued in the same transaction
// as the change that caused them, then delivered after commit. A failed
// delivery never blocks or rolls back anything; it stays visible and retries.
import { and, desc, eq, inArray, lt, lte, or } from 'drizzle-orm';
import nodemailer, { type Transporter } from 'nodemailer';
import type { OutboxRow } from '../../../shared/schemas/signoff';
import type { Db } from '../../db/index';
import { outboxMessages } from '../../db/schema';
import { notFound } from '../../http-error';
import type { Tx } from '../audit.service';

export const MAX_ATTEMPTS = 5;
/** Back-off before automatic retry n (1-based): 1, 4, 9, 16 minutes. */
const backoffMs = (attempts: number) => attempts * attempts * 60_000;

export interface Mailer {
  transport: Transporter;
  from: string;
  /** Base of links in messages, e.g. https://tubewright.example.com */
  appUrl: string;
}

export function createMailer(smtpUrl: string, from: string, appUrl: string): Mailer {
  return { transport: nodemailer.createTransport(smtpUrl), from, appUrl: appUrl.replace(/\/$/, '') };
}

export interface MailInput {
  to: string[];
  subject: string;
  text: string;
  relatedType?: string;
  relatedId?: number;
}

/** Queues messages inside the caller's transaction (none for an empty recipient list). */
export async function queueMail(tx: Tx, messages: MailInput[]): Promise<void> {
  const rows = messages.filter((m) => m.to.length > 0);
  if (rows.length === 0) return;
  await tx.insert(outboxMessages).values(
    rows.map((m) => ({
      toAddresses: m.to.join(', '),
      subject: m.subject.slice(0, 200),
      bodyText: m.text,
      relatedType: m.relatedType ?? null,
      relatedId: m.relatedId ?? null,
    })),
  );
}

/** Per mailer: the delivery run under way, and whether another was asked for meanwhile. */
const runs = new WeakMap<Mailer, { running: Promise<void> | null; again: boolean }>();

/**
 * Sends what is pending (and failed messages with attempts left). One run at a
 * time per mailer; a call during a run makes it pass once more, so a message
 * committed after the run read the queue is not left waiting.
 */
export function deliverOutbox(db: Db, mailer: Mailer | undefined): Promise<void> {
  if (!mailer) return Promise.resolve();
  let state = runs.get(mailer);
  if (!state) runs.set(mailer, (state = { running: null, again: false }));
  if (state.running) {
    state.again = true;
    return state.running;
  }
  const s = state;
  s.running = (async () => {
    try {
      do {
        s.again = false;
        await deliverDue(db, mailer);
      } while (s.again);
    } finally {
      s.running = null;
    }
  })();
  return s.running;
}

async function deliverDue(db: Db, mailer: Mailer): Promise<void> {
  const due = await db
    .select()
    .from(outboxMessages)
    .where(
      or(
        eq(outboxMessages.status, 'pending'),
        and(
          eq(outboxMessages.status, 'failed'),
          lt(outboxMessages.attempts, MAX_ATTEMPTS),
          lte(outboxMessages.nextAttemptAt, new Date()),
        ),
      ),
    )
    .orderBy(outboxMessages.id)
    .limit(50);
  for (const m of due) await sendOne(db, mailer, m);
}

async function sendOne(db: Db, mailer: Mailer, m: typeof outboxMessages.$inferSelect): Promise<void> {
  try {
    const info = await mailer.transport.sendMail({
      from: mailer.from,
      to: m.toAddresses,
      subject: m.subject,
      text: m.bodyText,
    });
    await db
      .update(outboxMessages)
      .set({ status: 'sent', attempts: m.attempts + 1, sentAt: new Date(), lastError: null, messageId: info.messageId ?? null })
      .where(eq(outboxMessages.id, m.id));
  } catch (e) {
    await db
      .update(outboxMessages)
      .set({
        status: 'failed',
        attempts: m.attempts + 1,
        lastError: e instanceof Error ? e.message : String(e),
        nextAttemptAt: new Date(Date.now() + backoffMs(m.attempts + 1)),
      })
      .where(eq(outboxMessages.id, m.id));
  }
}

function toRow(m: typeof outboxMessages.$inferSelect): OutboxRow {
  return {
    id: m.id,
    to: m.toAddresses.split(',').map((s) => s.trim()),
    subject: m.subject,
    bodyText: m.bodyText,
    status: m.status,
    attempts: m.attempts,
    lastError: m.lastError,
    nextAttemptAt: m.nextAttemptAt ? m.nextAttemptAt.toISOString() : null,
    createdAt: m.createdAt.toISOString(),
    sentAt: m.sentAt ? m.sentAt.toISOString() : null,
  };
}

export async function listOutbox(db: Db, limit = 200): Promise<OutboxRow[]> {
  return (await db.select().from(outboxMessages).orderBy(desc(outboxMessages.id)).limit(limit)).map(toRow);
}

/** Puts a failed message back in the queue (attempts start again) and delivers now. */
export async function retryMessage(db: Db, mailer: Mailer | undefined, id: number): Promise<OutboxRow> {
  const [m] = await db.select().from(outboxMessages).where(eq(outboxMessages.id, id)).limit(1);
  if (!m) throw notFound('The message');
  if (m.status !== 'sent') {
    await db.update(outboxMessages).set({ status: 'pending', attempts: 0, nextAttemptAt: null }).where(eq(outboxMessages.id, id));
    await deliverOutbox(db, mailer);
  }
  const [after] = await db.select().from(outboxMessages).where(inArray(outboxMessages.id, [id]));
  return toRow(after);
}
