// The Drizzle schema: the one description of the database. Migrations in
// drizzle/ are generated from it (`npm run db:generate`) and applied at start.
import { sql } from 'drizzle-orm';
import {
  bigint,
  double,
  boolean,
  char,
  check,
  datetime,
  index,
  int,
  json,
  mediumtext,
  mysqlEnum,
  mysqlTable,
  text,
  uniqueIndex,
  varchar,
} from 'drizzle-orm/mysql-core';
import { ROLES } from '../../shared/schemas/users';
import { AMBIENTS, TUBE_DEDICATIONS } from '../../shared/schemas/tubes';

export const VERSION_STATES = ['draft', 'in_review', 'released', 'retired'] as const;

const createdAt = () => datetime('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`);
const updatedAt = () =>
  datetime('updated_at', { mode: 'date', fsp: 3 })
    .notNull()
    .default(sql`CURRENT_TIMESTAMP(3)`)
    .$onUpdate(() => new Date());

export const users = mysqlTable(
  'users',
  {
    id: int('id').autoincrement().primaryKey(),
    email: varchar('email', { length: 190 }).notNull(),
    name: varchar('name', { length: 120 }).notNull(),
    role: mysqlEnum('role', ROLES).notNull(),
    passwordHash: varchar('password_hash', { length: 100 }).notNull(),
    active: boolean('active').notNull().default(true),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex('users_email_uq').on(t.email)],
);

/** Owned by express-mysql-session (its default column names); created here so migrations own it. */
export const sessions = mysqlTable(
  'sessions',
  {
    sessionId: varchar('session_id', { length: 128 }).primaryKey(),
    expires: int('expires', { unsigned: true }).notNull(),
    data: mediumtext('data'),
  },
  (t) => [index('sessions_expires_idx').on(t.expires)],
);

export const tubes = mysqlTable(
  'tubes',
  {
    id: int('id').autoincrement().primaryKey(),
    name: varchar('name', { length: 60 }).notNull(),
    dedication: mysqlEnum('dedication', TUBE_DEDICATIONS).notNull(),
    minTempC: int('min_temp_c').notNull(),
    maxTempC: int('max_temp_c').notNull(),
    ambients: json('ambients').$type<(typeof AMBIENTS)[number][]>().notNull(),
    notes: text('notes').notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('tubes_name_uq').on(t.name),
    check('tubes_range_ck', sql`${t.minTempC} < ${t.maxTempC}`),
  ],
);

export const recipes = mysqlTable(
  'recipes',
  {
    id: int('id').autoincrement().primaryKey(),
    name: varchar('name', { length: 120 }).notNull(),
    description: text('description').notNull(),
    ownerId: int('owner_id')
      .notNull()
      .references(() => users.id),
    /** Denormalised from the newest version so the list pages, sorts and filters in SQL. */
    latestVersionNo: int('latest_version_no').notNull().default(1),
    latestState: mysqlEnum('latest_state', VERSION_STATES).notNull().default('draft'),
    releasedVersionNo: int('released_version_no'),
    /** Dopants of the newest version, e.g. ",B,P," (commas around each for LIKE filters). */
    dopants: varchar('dopants', { length: 40 }).notNull().default(''),
    /** Tube ids of the newest version, e.g. ",3,4,". */
    tubeIds: varchar('tube_ids', { length: 255 }).notNull().default(''),
    /** The same of the released version: what operators (who see no drafts) list and filter by. */
    releasedDopants: varchar('released_dopants', { length: 40 }).notNull().default(''),
    releasedTubeIds: varchar('released_tube_ids', { length: 255 }).notNull().default(''),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex('recipes_name_uq').on(t.name), index('recipes_updated_idx').on(t.updatedAt)],
);

export const recipeVersions = mysqlTable(
  'recipe_versions',
  {
    id: int('id').autoincrement().primaryKey(),
    recipeId: int('recipe_id')
      .notNull()
      .references(() => recipes.id),
    versionNo: int('version_no').notNull(),
    state: mysqlEnum('state', VERSION_STATES).notNull().default('draft'),
    /** Optimistic concurrency: every save of a draft must name the revision it read. */
    revision: int('revision').notNull().default(1),
    /** The recipe document (shared/schemas/recipe.ts), with its own schemaVersion inside. */
    document: json('document').notNull(),
    /** The server's authoritative engine result, stored with the version. */
    result: json('result'),
    /** Headline numbers of `result` for lists and compare (junctions, Rs, surface). */
    summary: json('summary'),
    engineVersion: varchar('engine_version', { length: 32 }),
    parameterSetId: varchar('parameter_set_id', { length: 64 }),
    /** SHA-256 of the canonical document; signatures and audit rows name it. */
    contentHash: char('content_hash', { length: 64 }).notNull(),
    note: text('note').notNull(),
    authorId: int('author_id')
      .notNull()
      .references(() => users.id),
    basedOnVersionId: int('based_on_version_id'),
    submittedAt: datetime('submitted_at', { mode: 'date', fsp: 3 }),
    releasedAt: datetime('released_at', { mode: 'date', fsp: 3 }),
    releasedById: int('released_by_id').references(() => users.id),
    /** The stated meaning of the release signature (see shared/schemas/signoff.ts). */
    releaseMeaning: varchar('release_meaning', { length: 60 }),
    /** The lead's comment when the version was last returned to Draft. */
    reviewComment: text('review_comment'),
    retiredAt: datetime('retired_at', { mode: 'date', fsp: 3 }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('recipe_versions_no_uq').on(t.recipeId, t.versionNo),
    index('recipe_versions_state_idx').on(t.state),
  ],
);

/** Append-only: rows are inserted in the same transaction as the change they record. */
export const auditEvents = mysqlTable(
  'audit_events',
  {
    id: bigint('id', { mode: 'number', unsigned: true }).autoincrement().primaryKey(),
    at: datetime('at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    actorId: int('actor_id').references(() => users.id),
    actorRole: varchar('actor_role', { length: 20 }),
    action: varchar('action', { length: 60 }).notNull(),
    entityType: varchar('entity_type', { length: 40 }).notNull(),
    entityId: bigint('entity_id', { mode: 'number' }),
    fromState: varchar('from_state', { length: 20 }),
    toState: varchar('to_state', { length: 20 }),
    comment: text('comment'),
    contentHash: char('content_hash', { length: 64 }),
    details: json('details'),
  },
  (t) => [index('audit_events_entity_idx').on(t.entityType, t.entityId), index('audit_events_at_idx').on(t.at)],
);

export const OUTBOX_STATUSES = ['pending', 'sent', 'failed'] as const;

/** Every e-mail the app sends, queued in the transaction of what caused it. */
export const outboxMessages = mysqlTable(
  'outbox_messages',
  {
    id: int('id').autoincrement().primaryKey(),
    toAddresses: text('to_addresses').notNull(),
    subject: varchar('subject', { length: 200 }).notNull(),
    bodyText: text('body_text').notNull(),
    status: mysqlEnum('status', OUTBOX_STATUSES).notNull().default('pending'),
    attempts: int('attempts').notNull().default(0),
    lastError: text('last_error'),
    relatedType: varchar('related_type', { length: 40 }),
    relatedId: int('related_id'),
    messageId: varchar('message_id', { length: 200 }),
    /** A failed message waits until then before the next automatic attempt. */
    nextAttemptAt: datetime('next_attempt_at', { mode: 'date', fsp: 3 }),
    createdAt: createdAt(),
    sentAt: datetime('sent_at', { mode: 'date', fsp: 3 }),
  },
  (t) => [index('outbox_status_idx').on(t.status)],
);

export const LOT_STATUSES = ['open', 'in_progress', 'complete', 'scrapped'] as const;

export const lots = mysqlTable(
  'lots',
  {
    id: int('id').autoincrement().primaryKey(),
    lotCode: varchar('lot_code', { length: 40 }).notNull(),
    wafers: int('wafers').notNull(),
    tubeId: int('tube_id')
      .notNull()
      .references(() => tubes.id),
    versionId: int('version_id')
      .notNull()
      .references(() => recipeVersions.id),
    status: mysqlEnum('status', LOT_STATUSES).notNull().default('open'),
    notes: text('notes').notNull(),
    openedById: int('opened_by_id')
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('lots_code_uq').on(t.lotCode),
    index('lots_version_idx').on(t.versionId),
    check('lots_wafers_ck', sql`${t.wafers} BETWEEN 1 AND 200`),
  ],
);

export const MEASUREMENT_KINDS = ['profile', 'sheet_resistance'] as const;

/** One uploaded file of measured values against a lot; the points stay as parsed. */
export const measurements = mysqlTable(
  'measurements',
  {
    id: int('id').autoincrement().primaryKey(),
    lotId: int('lot_id')
      .notNull()
      .references(() => lots.id),
    kind: mysqlEnum('kind', MEASUREMENT_KINDS).notNull(),
    /** e.g. 'SIMS', 'spreading resistance', 'four-point probe'. */
    method: varchar('method', { length: 40 }).notNull(),
    fileName: varchar('file_name', { length: 200 }).notNull(),
    /** Profile: { depthUm[], concentrationCm3[] }; sheet resistance: { sites[], ohmSq[] }. */
    points: json('points').notNull(),
    /** Measured junction depth or Rs statistics (see shared/schemas/measurements.ts). */
    summary: json('summary').notNull(),
    notes: text('notes').notNull(),
    uploadedById: int('uploaded_by_id')
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [index('measurements_lot_idx').on(t.lotId)],
);

/** A fitted per-tube diffusivity factor; the newest row of a tube is in force. */
export const calibrations = mysqlTable(
  'calibrations',
  {
    id: int('id').autoincrement().primaryKey(),
    tubeId: int('tube_id')
      .notNull()
      .references(() => tubes.id),
    factor: double('factor').notNull(),
    /** Standard error of ln(factor) from the fit's residuals. */
    lnFactorStdErr: double('ln_factor_std_err').notNull(),
    /** RMS of ln(measured/predicted) junction depth, before and after the correction. */
    rmsLogErrorBefore: double('rms_log_error_before').notNull(),
    rmsLogErrorAfter: double('rms_log_error_after').notNull(),
    points: int('points').notNull(),
    /** Per lot: measured and predicted junction depths used by the fit. */
    data: json('data').notNull(),
    note: text('note').notNull(),
    fittedById: int('fitted_by_id')
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [index('calibrations_tube_idx').on(t.tubeId)],
);
