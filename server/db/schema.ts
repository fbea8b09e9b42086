/**
 * The database schema: one definition for PGlite and PostgreSQL. Migrations in `drizzle/` are
 * generated from it by drizzle-kit and only ever add.
 */
import { sql } from 'drizzle-orm';
import {
  boolean,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
  varchar,
  customType,
} from 'drizzle-orm/pg-core';

/** Raw bytes (PostgreSQL `bytea`), used for compact run series and uploaded files. */
export const bytea = customType<{ data: Buffer; driverData: Buffer | Uint8Array }>({
  dataType: () => 'bytea',
  fromDriver: (value) => (Buffer.isBuffer(value) ? value : Buffer.from(value)),
  toDriver: (value) => value,
});

/** People who sign in. `role` is admin, instructor or member; `units` is metric or us. */
export const users = pgTable(
  'users',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    email: varchar('email', { length: 254 }).notNull(),
    name: varchar('name', { length: 120 }).notNull(),
    passwordHash: text('password_hash').notNull(),
    role: varchar('role', { length: 16 }).notNull().default('member'),
    units: varchar('units', { length: 8 }).notNull().default('metric'),
    disabled: boolean('disabled').notNull().default(false),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('users_email_unique').on(sql`lower(${t.email})`)],
);

/** express-session rows. */
export const sessions = pgTable(
  'sessions',
  {
    sid: varchar('sid', { length: 128 }).primaryKey(),
    sess: jsonb('sess').notNull(),
    expire: timestamp('expire', { withTimezone: true, precision: 6 }).notNull(),
  },
  (t) => [index('sessions_expire_idx').on(t.expire)],
);

/** Single-use password reset tokens, stored as a SHA-256 hash of the token. */
export const passwordResets = pgTable(
  'password_resets',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    tokenHash: varchar('token_hash', { length: 64 }).notNull(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('password_resets_token_unique').on(t.tokenHash)],
);

/** Mail received by the local SMTP server (development, test and demo runs). */
export const mailMessages = pgTable('mail_messages', {
  id: uuid('id').primaryKey().defaultRandom(),
  fromAddress: text('from_address').notNull(),
  toAddresses: text('to_addresses').notNull(),
  subject: text('subject').notNull().default(''),
  textBody: text('text_body').notNull().default(''),
  htmlBody: text('html_body'),
  raw: text('raw').notNull(),
  receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
});

/** A designed system: its scenario (the file format) and an optimistic-lock version. */
export const systems = pgTable(
  'systems',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    ownerId: uuid('owner_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    name: varchar('name', { length: 200 }).notNull(),
    scenario: jsonb('scenario').notNull(),
    version: integer('version').notNull().default(1),
    calibration: jsonb('calibration'),
    lastVerdict: varchar('last_verdict', { length: 16 }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('systems_owner_idx').on(t.ownerId)],
);

/** A system shared with a named user as `viewer` or `editor`. */
export const systemShares = pgTable(
  'system_shares',
  {
    systemId: uuid('system_id')
      .notNull()
      .references(() => systems.id, { onDelete: 'cascade' }),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    access: varchar('access', { length: 8 }).notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.systemId, t.userId] })],
);

/** A stored simulation run: the normalised scenario snapshot, results and the compact series. */
export const runs = pgTable(
  'runs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    systemId: uuid('system_id')
      .notNull()
      .references(() => systems.id, { onDelete: 'cascade' }),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    status: varchar('status', { length: 16 }).notNull(),
    durationS: doublePrecision('duration_s').notNull(),
    systemVersion: integer('system_version').notNull(),
    scenario: jsonb('scenario').notNull(),
    summary: jsonb('summary'),
    verdicts: jsonb('verdicts'),
    events: jsonb('events'),
    stats: jsonb('stats'),
    verdict: varchar('verdict', { length: 16 }),
    error: text('error'),
    series: bytea('series'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    finishedAt: timestamp('finished_at', { withTimezone: true }),
  },
  (t) => [index('runs_system_idx').on(t.systemId, t.createdAt)],
);

/** An uploaded CSV of logged levels or a stopwatch log, with its parsed series. */
export const measurements = pgTable(
  'measurements',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    systemId: uuid('system_id')
      .notNull()
      .references(() => systems.id, { onDelete: 'cascade' }),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    kind: varchar('kind', { length: 16 }).notNull(),
    name: varchar('name', { length: 200 }).notNull(),
    originalFilename: varchar('original_filename', { length: 255 }),
    original: bytea('original'),
    options: jsonb('options'),
    series: jsonb('series'),
    rejected: jsonb('rejected'),
    stopwatch: jsonb('stopwatch'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('measurements_system_idx').on(t.systemId)],
);

/** One calibration fit of a system's coefficients against measurements (history; the latest applied is on systems.calibration). */
export const calibrations = pgTable(
  'calibrations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    systemId: uuid('system_id')
      .notNull()
      .references(() => systems.id, { onDelete: 'cascade' }),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    measurementIds: jsonb('measurement_ids').notNull(),
    parameters: jsonb('parameters').notNull(),
    fit: jsonb('fit').notNull(),
    applied: boolean('applied').notNull().default(false),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('calibrations_system_idx').on(t.systemId)],
);

/** A parameter sweep (operating window) over a system, with its grid of results. */
export const sweeps = pgTable(
  'sweeps',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    systemId: uuid('system_id')
      .notNull()
      .references(() => systems.id, { onDelete: 'cascade' }),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    status: varchar('status', { length: 16 }).notNull(),
    parameters: jsonb('parameters').notNull(),
    scenario: jsonb('scenario').notNull(),
    cellsTotal: integer('cells_total').notNull(),
    cellsDone: integer('cells_done').notNull().default(0),
    cells: jsonb('cells'),
    error: text('error'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    finishedAt: timestamp('finished_at', { withTimezone: true }),
  },
  (t) => [index('sweeps_system_idx').on(t.systemId, t.createdAt)],
);

/** A class an instructor teaches. */
export const classes = pgTable('classes', {
  id: uuid('id').primaryKey().defaultRandom(),
  instructorId: uuid('instructor_id')
    .notNull()
    .references(() => users.id, { onDelete: 'cascade' }),
  name: varchar('name', { length: 200 }).notNull(),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});

/** A student in a class. */
export const classMembers = pgTable(
  'class_members',
  {
    classId: uuid('class_id')
      .notNull()
      .references(() => classes.id, { onDelete: 'cascade' }),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    joinedAt: timestamp('joined_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.classId, t.userId] })],
);

/** An e-mailed invitation to a class; the token is stored as its SHA-256 hash. */
export const classInvitations = pgTable(
  'class_invitations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    classId: uuid('class_id')
      .notNull()
      .references(() => classes.id, { onDelete: 'cascade' }),
    email: varchar('email', { length: 254 }).notNull(),
    tokenHash: varchar('token_hash', { length: 64 }).notNull(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    acceptedBy: uuid('accepted_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('class_invitations_token_unique').on(t.tokenHash)],
);

/** A lesson: a system snapshot plus questions; in an instructor's library or published to a class. */
export const lessons = pgTable('lessons', {
  id: uuid('id').primaryKey().defaultRandom(),
  ownerId: uuid('owner_id')
    .notNull()
    .references(() => users.id, { onDelete: 'cascade' }),
  classId: uuid('class_id').references(() => classes.id, { onDelete: 'cascade' }),
  title: varchar('title', { length: 200 }).notNull(),
  introduction: text('introduction').notNull().default(''),
  scenario: jsonb('scenario').notNull(),
  questions: jsonb('questions').notNull(),
  published: boolean('published').notNull().default(false),
  revealed: boolean('revealed').notNull().default(false),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});

/** A student's predictions for a lesson, and the simulated values once they ran it. */
export const lessonAnswers = pgTable(
  'lesson_answers',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    lessonId: uuid('lesson_id')
      .notNull()
      .references(() => lessons.id, { onDelete: 'cascade' }),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    answers: jsonb('answers').notNull(),
    results: jsonb('results'),
    runId: uuid('run_id').references(() => runs.id, { onDelete: 'set null' }),
    submittedAt: timestamp('submitted_at', { withTimezone: true }).notNull().defaultNow(),
    ranAt: timestamp('ran_at', { withTimezone: true }),
  },
  (t) => [uniqueIndex('lesson_answers_unique').on(t.lessonId, t.userId)],
);
