import { Invitation, Member } from '@shared/members';

/** A member as the Members page lists them, for specs. */
export function generateMockMember(overrides: Partial<Member> = {}): Member {
  return {
    id: 21,
    email: 'jonah.weiss@fernhollow.example',
    name: 'Jonah Weiss',
    roles: ['member'],
    active: true,
    createdAt: '2026-11-02T09:00:00.000Z',
    passwordResetRequestedAt: null,
    ...overrides,
  };
}

/** A pending invitation, for specs. */
export function generateMockInvitation(overrides: Partial<Invitation> = {}): Invitation {
  return {
    id: 31,
    email: 'new.brewer@fernhollow.example',
    roles: ['member', 'brewer'],
    invitedBy: 'Ada Okafor',
    createdAt: '2026-11-30T18:00:00.000Z',
    expiresAt: '2026-12-07T18:00:00.000Z',
    ...overrides,
  };
}
