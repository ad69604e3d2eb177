import { generateMockBooking } from '@app/testing/booking-mock';
import { holdsOnDay } from './day-holds';

const zone = 'Europe/Berlin';

describe('holdsOnDay', () => {
  const booking = generateMockBooking();

  it('labels the first, middle and last day of a booking with its wall-clock times', () => {
    expect(holdsOnDay([booking], '2026-12-09', zone)[0].label).toBe('F2 · Priya Raman · from 10:00');
    expect(holdsOnDay([booking], '2026-12-10', zone)[0].label).toBe('F2 · Priya Raman · all day');
    expect(holdsOnDay([booking], '2026-12-11', zone)[0].label).toBe('F2 · Priya Raman · until 10:00');
  });

  it('shows the day after as cleaning only, and nothing once the turnaround is over', () => {
    expect(holdsOnDay([booking], '2026-12-12', zone)).toEqual([{ booking, label: 'F2 · Priya Raman · cleaning until 10:00', cleaningOnly: true }]);
    expect(holdsOnDay([booking], '2026-12-13', zone)).toEqual([]);
  });
});
