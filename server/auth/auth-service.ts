/** Registration, credential checks and profile changes; no HTTP here. */
import { randomUUID } from 'node:crypto';
import bcrypt from 'bcryptjs';
import { eq } from 'drizzle-orm';
import type { RegisterRequest, UpdateMeRequest, User } from '../../shared/contracts/auth';
import type { AppContext } from '../app-context';
import { users } from '../db/schema';
import { conflict } from '../http/http-error';
import { findUserByEmail, findUserById, insertUser, toUser } from './user-repository';

/** A hash of a random password at each cost, compared against when the e-mail is unknown. */
const decoyHashes = new Map<number, Promise<string>>();

function decoyHash(cost: number): Promise<string> {
  let hash = decoyHashes.get(cost);
  if (!hash) {
    hash = bcrypt.hash(randomUUID(), cost);
    decoyHashes.set(cost, hash);
  }
  return hash;
}

/** Creates a `member` account; 409 `EMAIL_TAKEN` when the address already has one. */
export async function registerUser(ctx: AppContext, input: RegisterRequest): Promise<User> {
  const passwordHash = await bcrypt.hash(input.password, ctx.auth.bcryptCost);
  const row = await insertUser(ctx.db, {
    email: input.email,
    name: input.name,
    passwordHash,
    role: 'member',
  });
  if (!row) {
    throw conflict(
      'An account already uses that e-mail address. Sign in, or reset its password.',
      'EMAIL_TAKEN',
    );
  }
  return toUser(row);
}

/**
 * The user whose e-mail and password these are, or null. An unknown address is compared against
 * a decoy hash of the same cost, so the answer takes as long as for a wrong password and the
 * timing does not tell which addresses have accounts. Disabled accounts fail the same way.
 */
export async function verifyCredentials(
  ctx: AppContext,
  email: string,
  password: string,
): Promise<User | null> {
  const row = await findUserByEmail(ctx.db, email);
  const hash = row?.passwordHash ?? (await decoyHash(ctx.auth.bcryptCost));
  const matches = await bcrypt.compare(password, hash);
  if (!row || !matches || row.disabled) return null;
  return toUser(row);
}

/** Changes one's own name or unit system. */
export async function updateProfile(
  ctx: AppContext,
  userId: string,
  changes: UpdateMeRequest,
): Promise<User> {
  if (changes.name !== undefined || changes.units !== undefined) {
    await ctx.db
      .update(users)
      .set({ ...changes, updatedAt: new Date() })
      .where(eq(users.id, userId));
  }
  const row = await findUserById(ctx.db, userId);
  if (!row) throw new Error(`User ${userId} vanished while updating their profile.`);
  return toUser(row);
}
