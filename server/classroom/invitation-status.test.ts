import { describe, expect, it } from 'vitest';
import { invitationStatus } from './invitation-status';

const expiresAt = new Date('2030-01-15T12:00:00Z');

describe('invitationStatus', () => {
  it('is open before the expiry time and expired from it on', () => {
    expect(
      invitationStatus({ acceptedAt: null, expiresAt }, new Date('2030-01-15T11:59:59Z')),
    ).toBe('open');
    expect(invitationStatus({ acceptedAt: null, expiresAt }, expiresAt)).toBe('expired');
  });

  it('stays accepted after the expiry time', () => {
    expect(
      invitationStatus(
        { acceptedAt: new Date('2030-01-02T00:00:00Z'), expiresAt },
        new Date('2031-01-01T00:00:00Z'),
      ),
    ).toBe('accepted');
  });
});
