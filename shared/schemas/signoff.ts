// Sign-off contracts: submit, sign (release), return to Draft, retire; the
// review queue; the audit trail and its filters.
import { z } from 'zod';

/** What a lead's signature means; printed on the traveller beside the name. */
export const SIGNATURE_MEANINGS = ['approved-for-production', 'approved-for-engineering-lots'] as const;
export type SignatureMeaning = (typeof SIGNATURE_MEANINGS)[number];
export const SIGNATURE_MEANING_LABELS: Record<SignatureMeaning, string> = {
  'approved-for-production': 'Reviewed and approved for production lots',
  'approved-for-engineering-lots': 'Reviewed and approved for engineering lots only',
};

export const submitSchema = z.object({ note: z.string().trim().max(2000).default('') });

export const signOffSchema = z.object({
  password: z.string().min(1, 'Re-enter your password to sign').max(200),
  meaning: z.enum(SIGNATURE_MEANINGS, { error: 'State what your signature means' }),
});
export type SignOffInput = z.infer<typeof signOffSchema>;

export const returnSchema = z.object({
  comment: z.string().trim().min(3, 'Say what needs to change (at least 3 characters)').max(4000),
});

export const retireSchema = z.object({ comment: z.string().trim().max(4000).default('') });

export interface QueueItem {
  versionId: number;
  recipeId: number;
  recipeName: string;
  versionNo: number;
  author: { id: number; name: string };
  submittedAt: string;
  note: string;
  /** The recipe's currently released version, to compare against (null when none). */
  releasedVersionId: number | null;
  releasedVersionNo: number | null;
  /** True when the signed-in lead wrote this version (they may not sign it). */
  mine: boolean;
}

export const auditQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(500).default(50),
  from: z.iso.date({ error: 'From must be a date (YYYY-MM-DD)' }).optional(),
  to: z.iso.date({ error: 'To must be a date (YYYY-MM-DD)' }).optional(),
  actorId: z.coerce.number().int().positive().optional(),
  action: z.string().trim().max(60).optional(),
  entityType: z.string().trim().max(40).optional(),
  entityId: z.coerce.number().int().positive().optional(),
});
export type AuditQuery = z.input<typeof auditQuerySchema>;

export interface AuditRow {
  id: number;
  at: string;
  actor: { id: number; name: string } | null;
  actorRole: string | null;
  action: string;
  entityType: string;
  entityId: number | null;
  fromState: string | null;
  toState: string | null;
  comment: string | null;
  contentHash: string | null;
  details: Record<string, unknown> | null;
}

export interface AuditPage {
  rows: AuditRow[];
  total: number;
  page: number;
  pageSize: number;
}

export interface OutboxRow {
  id: number;
  to: string[];
  subject: string;
  bodyText: string;
  status: 'pending' | 'sent' | 'failed';
  attempts: number;
  lastError: string | null;
  /** When a failed message is tried again automatically (null: not scheduled). */
  nextAttemptAt: string | null;
  createdAt: string;
  sentAt: string | null;
}
