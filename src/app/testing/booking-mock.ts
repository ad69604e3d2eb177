import { Booking } from '@shared/bookings';
import { KitItemSummary } from '@shared/kit';

/** F2 booked by a demo member for two days in December 2026 (Berlin, UTC+1), 24 h turnaround. */
export function generateMockBooking(overrides: Partial<Booking> = {}): Booking {
  return {
    id: 41,
    kitItemId: 2,
    kitItemCode: 'F2',
    kitItemName: 'Conical fermenter 2',
    userId: 7,
    userName: 'Priya Raman',
    purpose: 'use',
    startsAt: '2026-12-09T09:00:00.000Z',
    endsAt: '2026-12-11T09:00:00.000Z',
    heldUntil: '2026-12-12T09:00:00.000Z',
    startLocal: '2026-12-09T10:00',
    endLocal: '2026-12-11T10:00',
    timeZone: 'Europe/Berlin',
    batchId: null,
    note: '',
    createdAt: '2026-12-02T08:00:00.000Z',
    ...overrides,
  };
}

export function generateMockKitItem(overrides: Partial<KitItemSummary> = {}): KitItemSummary {
  return {
    id: 2,
    code: 'F2',
    name: 'Conical fermenter 2',
    kind: 'fermenter',
    capacityLitres: 30,
    state: 'in_service',
    turnaroundHours: 24,
    notes: '',
    nextMaintenanceDueOn: null,
    ...overrides,
  };
}
