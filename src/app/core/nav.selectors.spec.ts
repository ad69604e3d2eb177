import { SessionUser } from '@shared/auth';
import { initialAuthState } from '@app/auth/state/auth.feature';
import { NAV_ITEMS } from './nav-items';
import { selectVisibleNavItems } from './nav.selectors';

const stateFor = (user: SessionUser | null) => ({ auth: { ...initialAuthState, sessionLoaded: true, user } });
const person = (roles: SessionUser['roles']): SessionUser => ({ id: 1, email: 'p@example.org', name: 'Priya', roles });

describe('selectVisibleNavItems', () => {
  it('shows a member only the built areas open to everyone', () => {
    const labels = selectVisibleNavItems(stateFor(person(['member']))).map((item) => item.label);

    expect(labels).toEqual(['Today', 'Recipes', 'Batches', 'Gravity log', 'Strength check', 'Reference tables', 'Kit room', 'Brew plan', 'Stock', 'Dues']);
  });

  it('adds Members and Outbox for an admin', () => {
    const labels = selectVisibleNavItems(stateFor(person(['member', 'admin']))).map((item) => item.label);

    expect(labels).toEqual(['Today', 'Recipes', 'Batches', 'Gravity log', 'Strength check', 'Reference tables', 'Kit room', 'Brew plan', 'Stock', 'Dues', 'Members', 'Outbox']);
  });

  it('keeps every area of the brief in the config, in order', () => {
    expect(NAV_ITEMS.map((item) => item.label)).toEqual([
      'Today', 'Recipes', 'Batches', 'Gravity log', 'Strength check',
      'Reference tables', 'Kit room', 'Brew plan', 'Stock', 'Dues', 'Members', 'Outbox',
    ]);
  });
});
