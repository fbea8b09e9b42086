/** Invitation tokens: 256 random bits in the link, only their SHA-256 hash in the database. */
import { createHash, randomBytes } from 'node:crypto';

/** A new token (43 URL-safe characters) and the hash to store. */
export function newInvitationToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashInvitationToken(token) };
}

/** The stored form of a token: its SHA-256 as 64 hex digits. */
export function hashInvitationToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
