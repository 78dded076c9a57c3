import { sqliteTable, text, integer, real, index, uniqueIndex, primaryKey } from 'drizzle-orm/sqlite-core';
import { sql } from 'drizzle-orm';
import type { DesignInput } from '../../lib/design/schema';
import type { MeasurementKind, ResultSummary, StoredCalibration, UnitSystem } from '../../lib/api/contracts';
import { MEMBER_ROLES } from '../../lib/api/contracts/members';
import { ATTACHMENT_KINDS } from '../../lib/api/contracts/attachments';
import { GROUP_INVITE_ROLES, GROUP_ROLES } from '../../lib/api/contracts/groups';
import { HEIGHT_DATUMS, PAUSE_REASON_IDS } from '../../lib/winding';
import { FINDING_STATUSES, REVIEW_STATES } from '../../lib/api/contracts/reviews';

const now = sql`(cast(unixepoch('subsecond') * 1000 as integer))`;
const createdAt = () => integer('created_at', { mode: 'timestamp_ms' }).default(now).notNull();
const updatedAt = () =>
  integer('updated_at', { mode: 'timestamp_ms' })
    .default(now)
    .$onUpdate(() => new Date())
    .notNull();

// better-auth's own tables keep its singular names.
export const user = sqliteTable('user', {
  id: text('id').primaryKey(),
  name: text('name').notNull(),
  email: text('email').notNull().unique(),
  emailVerified: integer('email_verified', { mode: 'boolean' }).default(false).notNull(),
  image: text('image'),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
  role: text('role').default('member'),
  banned: integer('banned', { mode: 'boolean' }).default(false),
  banReason: text('ban_reason'),
  banExpires: integer('ban_expires', { mode: 'timestamp_ms' }),
  unitSystem: text('unit_system').$type<UnitSystem>().default('metric').notNull(),
});

export const session = sqliteTable(
  'session',
  {
    id: text('id').primaryKey(),
    expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
    token: text('token').notNull().unique(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    ipAddress: text('ip_address'),
    userAgent: text('user_agent'),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    impersonatedBy: text('impersonated_by'),
  },
  (t) => [index('session_user_id_idx').on(t.userId)],
);

export const account = sqliteTable(
  'account',
  {
    id: text('id').primaryKey(),
    accountId: text('account_id').notNull(),
    providerId: text('provider_id').notNull(),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    accessToken: text('access_token'),
    refreshToken: text('refresh_token'),
    idToken: text('id_token'),
    accessTokenExpiresAt: integer('access_token_expires_at', { mode: 'timestamp_ms' }),
    refreshTokenExpiresAt: integer('refresh_token_expires_at', { mode: 'timestamp_ms' }),
    scope: text('scope'),
    password: text('password'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('account_user_id_idx').on(t.userId)],
);

export const verification = sqliteTable(
  'verification',
  {
    id: text('id').primaryKey(),
    identifier: text('identifier').notNull(),
    value: text('value').notNull(),
    expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('verification_identifier_idx').on(t.identifier)],
);

// Coilwright's tables.
export const groups = sqliteTable('groups', {
  id: text('id').primaryKey(),
  name: text('name').notNull(),
  createdBy: text('created_by').references(() => user.id, { onDelete: 'set null' }),
  createdAt: createdAt(),
});

export const groupMembers = sqliteTable(
  'group_members',
  {
    groupId: text('group_id')
      .notNull()
      .references(() => groups.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    role: text('role', { enum: GROUP_ROLES }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.groupId, t.userId] }), index('group_members_user_idx').on(t.userId)],
);

export const groupInvitations = sqliteTable(
  'group_invitations',
  {
    id: text('id').primaryKey(),
    groupId: text('group_id')
      .notNull()
      .references(() => groups.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: text('role', { enum: GROUP_INVITE_ROLES }).notNull(),
    tokenHash: text('token_hash').notNull().unique(),
    invitedBy: text('invited_by').references(() => user.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    acceptedAt: integer('accepted_at', { mode: 'timestamp_ms' }),
    acceptedBy: text('accepted_by').references(() => user.id, { onDelete: 'set null' }),
  },
  (t) => [index('group_invitations_group_idx').on(t.groupId)],
);

export const designs = sqliteTable(
  'designs',
  {
    id: text('id').primaryKey(),
    ownerId: text('owner_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    // The input exactly as given; a design saved before a schema change may no longer validate.
    design: text('design', { mode: 'json' }).$type<DesignInput>().notNull(),
    revision: integer('revision').notNull().default(1),
    // Measured values a builder adopted in place of predictions.
    calibration: text('calibration', { mode: 'json' }).$type<StoredCalibration>(),
    // The group whose members reach the design; when the group goes, the design stays with its owner.
    groupId: text('group_id').references(() => groups.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('designs_owner_idx').on(t.ownerId), index('designs_group_idx').on(t.groupId)],
);

export const designRevisions = sqliteTable(
  'design_revisions',
  {
    id: text('id').primaryKey(),
    designId: text('design_id')
      .notNull()
      .references(() => designs.id, { onDelete: 'cascade' }),
    revision: integer('revision').notNull(),
    name: text('name').notNull(),
    design: text('design', { mode: 'json' }).$type<DesignInput>().notNull(),
    resultSummary: text('result_summary', { mode: 'json' }).$type<ResultSummary>(),
    authorId: text('author_id').references(() => user.id, { onDelete: 'set null' }),
    message: text('message'),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('design_revisions_design_rev_idx').on(t.designId, t.revision)],
);

export const designMembers = sqliteTable(
  'design_members',
  {
    designId: text('design_id')
      .notNull()
      .references(() => designs.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    role: text('role', { enum: MEMBER_ROLES }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.designId, t.userId] })],
);

export const designInvitations = sqliteTable(
  'design_invitations',
  {
    id: text('id').primaryKey(),
    designId: text('design_id')
      .notNull()
      .references(() => designs.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: text('role', { enum: MEMBER_ROLES }).notNull(),
    tokenHash: text('token_hash').notNull().unique(),
    invitedBy: text('invited_by').references(() => user.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    acceptedAt: integer('accepted_at', { mode: 'timestamp_ms' }),
    acceptedBy: text('accepted_by').references(() => user.id, { onDelete: 'set null' }),
  },
  (t) => [index('design_invitations_design_idx').on(t.designId)],
);

export const designShares = sqliteTable(
  'design_shares',
  {
    token: text('token').primaryKey(),
    designId: text('design_id')
      .notNull()
      .references(() => designs.id, { onDelete: 'cascade' }),
    createdBy: text('created_by').references(() => user.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    revokedAt: integer('revoked_at', { mode: 'timestamp_ms' }),
  },
  (t) => [index('design_shares_design_idx').on(t.designId)],
);

export const measurements = sqliteTable(
  'measurements',
  {
    id: text('id').primaryKey(),
    designId: text('design_id')
      .notNull()
      .references(() => designs.id, { onDelete: 'cascade' }),
    kind: text('kind').$type<MeasurementKind>().notNull(),
    value: real('value').notNull(),
    unit: text('unit').notNull(),
    measuredAt: integer('measured_at', { mode: 'timestamp_ms' }).notNull(),
    instrument: text('instrument'),
    notes: text('notes'),
    authorId: text('author_id').references(() => user.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [index('measurements_design_idx').on(t.designId)],
);

export const attachments = sqliteTable(
  'attachments',
  {
    id: text('id').primaryKey(),
    designId: text('design_id')
      .notNull()
      .references(() => designs.id, { onDelete: 'cascade' }),
    fileName: text('file_name').notNull(),
    contentType: text('content_type').notNull(),
    size: integer('size').notNull(),
    kind: text('kind', { enum: ATTACHMENT_KINDS }).notNull(),
    storageKey: text('storage_key').notNull(),
    thumbnailKey: text('thumbnail_key'),
    uploadedBy: text('uploaded_by').references(() => user.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [index('attachments_design_idx').on(t.designId)],
);

/** A first-light review of one revision of a design, asked of a named reviewer or of the design's group supervisors. */
export const reviews = sqliteTable(
  'reviews',
  {
    id: text('id').primaryKey(),
    designId: text('design_id')
      .notNull()
      .references(() => designs.id, { onDelete: 'cascade' }),
    revision: integer('revision').notNull(),
    state: text('state', { enum: REVIEW_STATES }).notNull().default('requested'),
    requestedBy: text('requested_by').references(() => user.id, { onDelete: 'set null' }),
    // null: any supervisor of the design's group may decide
    reviewerId: text('reviewer_id').references(() => user.id, { onDelete: 'set null' }),
    decidedBy: text('decided_by').references(() => user.id, { onDelete: 'set null' }),
    requestNote: text('request_note'),
    decisionNote: text('decision_note'),
    requestedAt: integer('requested_at', { mode: 'timestamp_ms' }).default(now).notNull(),
    decidedAt: integer('decided_at', { mode: 'timestamp_ms' }),
  },
  (t) => [index('reviews_design_idx').on(t.designId)],
);

export const reviewFindings = sqliteTable(
  'review_findings',
  {
    reviewId: text('review_id')
      .notNull()
      .references(() => reviews.id, { onDelete: 'cascade' }),
    item: text('item').notNull(),
    status: text('status', { enum: FINDING_STATUSES }).notNull(),
    note: text('note').notNull().default(''),
  },
  (t) => [primaryKey({ columns: [t.reviewId, t.item] })],
);

// A winding session at the jig: the winder speed, the spool, the readings, the pauses and what was wound.
export const windingSessions = sqliteTable(
  'winding_sessions',
  {
    id: text('id').primaryKey(),
    designId: text('design_id')
      .notNull()
      .references(() => designs.id, { onDelete: 'cascade' }),
    /** the design revision the session winds */
    revision: integer('revision').notNull(),
    startedBy: text('started_by').references(() => user.id, { onDelete: 'set null' }),
    status: text('status', { enum: ['running', 'paused', 'finished'] }).notNull(),
    rpm: real('rpm').notNull(),
    /** wire on the spool at the start, m */
    spoolLength: real('spool_length'),
    /** bare form below the first turn, m */
    startOffset: real('start_offset').notNull(),
    formLength: real('form_length').notNull(),
    /** the plan taken from the design at the start */
    plannedTurns: integer('planned_turns').notNull(),
    pitch: real('pitch').notNull(),
    pitchSource: text('pitch_source', { enum: ['insulated-diameter', 'design-spacing'] }).notNull(),
    windingDiameter: real('winding_diameter').notNull(),
    insulatedDiameter: real('insulated_diameter').notNull(),
    plannedLength: real('planned_length').notNull(),
    plannedWire: real('planned_wire').notNull(),
    startedAt: integer('started_at', { mode: 'timestamp_ms' }).notNull(),
    finishedAt: integer('finished_at', { mode: 'timestamp_ms' }),
    woundTurns: integer('wound_turns'),
    /** measured winding length, m */
    windingLength: real('winding_length'),
    notes: text('notes'),
    adoptedRevision: integer('adopted_revision'),
    createdAt: createdAt(),
  },
  (t) => [index('winding_sessions_design_idx').on(t.designId)],
);

export const windingReadings = sqliteTable(
  'winding_readings',
  {
    /** made by the client, so a reading sent twice (offline, then again) is stored once */
    id: text('id').primaryKey(),
    sessionId: text('session_id')
      .notNull()
      .references(() => windingSessions.id, { onDelete: 'cascade' }),
    at: integer('at', { mode: 'timestamp_ms' }).notNull(),
    counter: integer('counter').notNull(),
    /** m, by its datum */
    height: real('height'),
    datum: text('datum', { enum: HEIGHT_DATUMS }),
    createdAt: createdAt(),
  },
  (t) => [index('winding_readings_session_idx').on(t.sessionId, t.at)],
);

export const windingPauses = sqliteTable(
  'winding_pauses',
  {
    id: text('id').primaryKey(),
    sessionId: text('session_id')
      .notNull()
      .references(() => windingSessions.id, { onDelete: 'cascade' }),
    reason: text('reason', { enum: PAUSE_REASON_IDS }).notNull(),
    note: text('note'),
    startedAt: integer('started_at', { mode: 'timestamp_ms' }).notNull(),
    endedAt: integer('ended_at', { mode: 'timestamp_ms' }),
  },
  (t) => [index('winding_pauses_session_idx').on(t.sessionId)],
);

export const windingChecklists = sqliteTable('winding_checklists', {
  sessionId: text('session_id')
    .primaryKey()
    .references(() => windingSessions.id, { onDelete: 'cascade' }),
  baseEndFastened: integer('base_end_fastened', { mode: 'boolean' }).notNull().default(false),
  topEndFastened: integer('top_end_fastened', { mode: 'boolean' }).notNull().default(false),
  coating: text('coating'),
  coats: integer('coats'),
  /** between coats, hours */
  dryingHours: real('drying_hours'),
  notes: text('notes'),
  updatedAt: updatedAt(),
});
