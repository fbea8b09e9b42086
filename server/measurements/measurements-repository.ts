/** Drizzle queries for measurements. No HTTP, no rules: the service decides. */
import { desc, eq, sql } from 'drizzle-orm';
import type { Database } from '../db/database';
import { measurements, users } from '../db/schema';

/** What is stored for a new measurement. */
export interface NewMeasurement {
  systemId: string;
  createdBy: string;
  kind: 'csv' | 'stopwatch';
  name: string;
  originalFilename: string | null;
  original: Buffer | null;
  options: unknown;
  series: unknown;
  rejected: unknown;
  stopwatch: unknown;
}

/** A measurement without its file and series: what lists show. */
export interface MeasurementHead {
  id: string;
  systemId: string;
  kind: string;
  name: string;
  originalFilename: string | null;
  sizeBytes: number | null;
  options: unknown;
  overview: unknown;
  startTime: unknown;
  rejectedTotal: unknown;
  stopwatch: unknown;
  createdBy: string | null;
  createdByName: string | null;
  createdAt: Date;
}

const head = {
  id: measurements.id,
  systemId: measurements.systemId,
  kind: measurements.kind,
  name: measurements.name,
  originalFilename: measurements.originalFilename,
  sizeBytes: sql<number | null>`octet_length(${measurements.original})`.mapWith((v: unknown) =>
    v === null ? null : Number(v),
  ),
  options: measurements.options,
  overview: sql<unknown>`${measurements.series} -> 'overview'`,
  startTime: sql<unknown>`${measurements.series} -> 'startTime'`,
  rejectedTotal: sql<unknown>`${measurements.rejected} -> 'total'`,
  stopwatch: measurements.stopwatch,
  createdBy: measurements.createdBy,
  createdByName: users.name,
  createdAt: measurements.createdAt,
};

/** Inserts one measurement (file, parsed series and rejected rows in one row, so in one statement). */
export async function insertMeasurement(db: Database, values: NewMeasurement): Promise<string> {
  const [row] = await db.insert(measurements).values(values).returning({ id: measurements.id });
  if (!row) throw new Error('Inserting a measurement returned no row.');
  return row.id;
}

/** The measurements of a system, newest first. */
export async function listMeasurementHeads(
  db: Database,
  systemId: string,
): Promise<MeasurementHead[]> {
  return db
    .select(head)
    .from(measurements)
    .leftJoin(users, eq(users.id, measurements.createdBy))
    .where(eq(measurements.systemId, systemId))
    .orderBy(desc(measurements.createdAt), desc(measurements.id));
}

/** One measurement's head, or undefined. */
export async function findMeasurementHead(
  db: Database,
  id: string,
): Promise<MeasurementHead | undefined> {
  const [row] = await db
    .select(head)
    .from(measurements)
    .leftJoin(users, eq(users.id, measurements.createdBy))
    .where(eq(measurements.id, id));
  return row;
}

/** One part of a stored measurement: the parsed series, the rejected rows or the original file. */
export async function findMeasurementPart<K extends 'series' | 'rejected' | 'original'>(
  db: Database,
  id: string,
  part: K,
): Promise<(typeof measurements.$inferSelect)[K] | undefined> {
  const [row] = await db
    .select({ value: measurements[part] })
    .from(measurements)
    .where(eq(measurements.id, id));
  return row?.value as (typeof measurements.$inferSelect)[K] | undefined;
}

/** Deletes one measurement. */
export async function deleteMeasurementRow(db: Database, id: string): Promise<void> {
  await db.delete(measurements).where(eq(measurements.id, id));
}
