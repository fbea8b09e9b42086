/** Drizzle queries for calibration history and the calibration applied on a system. */
import { and, desc, eq, sql } from 'drizzle-orm';
import type { Database } from '../db/database';
import { calibrations, systems, users } from '../db/schema';

/** A calibration row and its author's name. */
export interface CalibrationRow {
  row: typeof calibrations.$inferSelect;
  createdByName: string | null;
}

/** Stores one fit (not applied). */
export async function insertCalibration(
  db: Database,
  values: {
    systemId: string;
    createdBy: string;
    measurementIds: string[];
    parameters: unknown;
    fit: unknown;
  },
): Promise<string> {
  const [row] = await db
    .insert(calibrations)
    .values({ ...values, applied: false })
    .returning({ id: calibrations.id });
  if (!row) throw new Error('Inserting a calibration returned no row.');
  return row.id;
}

/** The fits of a system, newest first. */
export async function listCalibrationRows(
  db: Database,
  systemId: string,
): Promise<CalibrationRow[]> {
  return db
    .select({ row: calibrations, createdByName: users.name })
    .from(calibrations)
    .leftJoin(users, eq(users.id, calibrations.createdBy))
    .where(eq(calibrations.systemId, systemId))
    .orderBy(desc(calibrations.createdAt), desc(calibrations.id));
}

/** One fit, or undefined. */
export async function findCalibrationRow(
  db: Database,
  id: string,
): Promise<CalibrationRow | undefined> {
  const [row] = await db
    .select({ row: calibrations, createdByName: users.name })
    .from(calibrations)
    .leftJoin(users, eq(users.id, calibrations.createdBy))
    .where(eq(calibrations.id, id));
  return row;
}

/**
 * Keeps `calibration` on the system and marks which fit is applied (`appliedId`, or none when
 * clearing), in one transaction so the flag and the values never disagree. The system's version
 * is not bumped: its scenario did not change, and an open editor should still save.
 */
export async function setSystemCalibration(
  db: Database,
  systemId: string,
  calibration: unknown,
  appliedId: string | null,
): Promise<void> {
  await db.transaction(async (tx) => {
    await tx
      .update(systems)
      .set({ calibration: calibration ?? null, updatedAt: sql`now()` })
      .where(eq(systems.id, systemId));
    await tx
      .update(calibrations)
      .set({ applied: false })
      .where(and(eq(calibrations.systemId, systemId), eq(calibrations.applied, true)));
    if (appliedId)
      await tx.update(calibrations).set({ applied: true }).where(eq(calibrations.id, appliedId));
  });
}
