import { Role, SessionUser } from '@shared/auth';

/** A signed-in person for specs; invented, as all test data. */
export function generateMockSessionUser(roles: Role[] = ['member'], overrides: Partial<SessionUser> = {}): SessionUser {
  return { id: 11, email: 'priya.raman@fernhollow.example', name: 'Priya Raman', roles, ...overrides };
}
