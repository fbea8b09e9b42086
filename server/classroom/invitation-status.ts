/** The state of a class invitation at a given time. */
import type { InvitationStatus } from '../../shared/contracts/classroom';

/** `accepted` once accepted, else `expired` from `expiresAt` on, else `open`. */
export function invitationStatus(
  invitation: { acceptedAt: Date | null; expiresAt: Date },
  now: Date,
): InvitationStatus {
  if (invitation.acceptedAt) return 'accepted';
  return invitation.expiresAt.getTime() <= now.getTime() ? 'expired' : 'open';
}
