import { DuesOverview, DuesPlan, TEST_CARDS } from '@shared/dues';

/** The demo co-op's Standard plan, for specs. */
export function generateMockPlan(overrides: Partial<DuesPlan> = {}): DuesPlan {
  return { id: 1, name: 'Standard', amountCents: 1200, currency: 'EUR', period: 'month', active: true, ...overrides };
}

/** A member's dues as the Dues page gets them, for specs. */
export function generateMockOverview(overrides: Partial<DuesOverview> = {}): DuesOverview {
  return {
    plans: [generateMockPlan(), generateMockPlan({ id: 2, name: 'Supporter', amountCents: 2500 })],
    membership: { planId: null, planName: null, paidThrough: null, status: 'overdue', renewByCard: false, savedCard: null },
    payments: [],
    testMode: true,
    testCards: TEST_CARDS,
    ...overrides,
  };
}
