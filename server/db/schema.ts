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
