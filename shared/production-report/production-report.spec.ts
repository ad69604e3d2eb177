import { BATCH_STATUSES, BatchStatus } from '../batches/batch-status';
import { BusyInterval } from '../brew-plan/busy-interval';
import { ReportBatch } from './batch-history';
import { buildProductionReport, ReportKitItem } from './production-report';

// A worked example with invented demo figures (not measurements); every expected figure is
// worked out by hand in the comments beside it. Times are whole days in UTC to keep the sums plain.
const at = (iso: string) => Date.parse(`${iso}Z`);
const DAY = 86_400_000;

function batch(id: number, litres: number, fermenter: number | null, reached: Partial<Record<BatchStatus, string>>): ReportBatch {
  const dates = Object.fromEntries(BATCH_STATUSES.map((s) => [s, reached[s] ? at(reached[s]!) : null])) as Record<BatchStatus, number | null>;
  return { id, name: `Demo batch ${id}`, litres, fermenterKitItemId: fermenter, reached: dates };
}

const F1: ReportKitItem = { id: 1, code: 'F1', name: 'Conical fermenter 1', turnaroundHours: 24, retired: false };
const F5: ReportKitItem = { id: 5, code: 'F5', name: 'Conical fermenter 5', turnaroundHours: 24, retired: false };

const batches = [
  // Brewed 3 Oct into F1, packaged 24 Oct: F1 held 3 Oct 00:00 → 25 Oct 00:00 (24 h turnaround) = 22 days.
  batch(1, 23, 1, { planned: '2026-09-20T00:00', brewing: '2026-10-03T00:00', fermenting: '2026-10-03T00:00', conditioning: '2026-10-17T00:00', packaged: '2026-10-24T00:00' }),
  // Brewed 28 Oct into F5, still fermenting: held from 28 Oct 00:00 until now.
  batch(2, 50, 5, { planned: '2026-10-01T00:00', brewing: '2026-10-28T00:00', fermenting: '2026-10-28T00:00' }),
  // Planned only: brews nothing and holds nothing.
  batch(3, 20, 1, { planned: '2026-10-10T00:00' }),
  // Given up in September: archived, never brewed.
  batch(4, 20, null, { planned: '2026-09-01T00:00', archived: '2026-09-05T00:00' }),
];
const holds: BusyInterval[] = [
  // A member's booking of F1, 2 Nov 08:00 → 4 Nov 08:00, cleaning until 5 Nov 08:00: 3 days held.
  { kitItemId: 1, kind: 'booking', start: at('2026-11-02T08:00'), end: at('2026-11-05T08:00'), refId: 11, label: 'booking' },
  // F1 blocked for maintenance on 10 Nov: 1 day.
  { kitItemId: 1, kind: 'maintenance', start: at('2026-11-10T00:00'), end: at('2026-11-11T00:00'), refId: 12, label: 'maintenance' },
];
const now = at('2026-11-15T00:00');

describe('buildProductionReport (worked example, invented demo figures)', () => {
  const report = buildProductionReport({ from: '2026-09', to: '2026-11', zone: 'UTC', now, batches, fermenters: [F1, F5], holds });
  const month = (m: string) => report.months.find((x) => x.month === m)!;

  it('counts the litres and batches brewed in the month of their brew day', () => {
    expect(month('2026-09')).toMatchObject({ batchesBrewed: 0, litresBrewed: 0 });
    // Batches 1 and 2: 23 L + 50 L = 73 L.
    expect(month('2026-10')).toMatchObject({ batchesBrewed: 2, litresBrewed: 73 });
    expect(month('2026-11')).toMatchObject({ batchesBrewed: 0, litresBrewed: 0 });
  });

  it('counts every batch by the status it had at the month’s end', () => {
    // End of September: batch 1 planned (20 Sep), batch 4 archived; batches 2 and 3 not yet planned.
    expect(month('2026-09').batchesByStatus).toEqual({ planned: 1, brewing: 0, fermenting: 0, conditioning: 0, packaged: 0, archived: 1 });
    // End of October: 1 packaged, 2 fermenting, 3 planned, 4 archived.
    expect(month('2026-10').batchesByStatus).toEqual({ planned: 1, brewing: 0, fermenting: 1, conditioning: 0, packaged: 1, archived: 1 });
  });

  it('shares each fermenter’s month between use and maintenance, and the room as their mean', () => {
    // October has 31 days. F1: 22 / 31 = 0.70968; F5: 4 days (28–31 Oct) / 31 = 0.12903.
    expect(month('2026-10').fermenters).toEqual([
      { kitItemId: 1, inUse: 0.7097, maintenance: 0 },
      { kitItemId: 5, inUse: 0.129, maintenance: 0 },
    ]);
    // Room: (22 + 4) / 62 = 0.41935.
    expect(month('2026-10').room).toEqual({ inUse: 0.4194, maintenance: 0 });
  });

  it('runs this month until now: 1–15 Nov is 14 days', () => {
    const november = month('2026-11');
    expect(november.complete).toBe(false);
    expect(month('2026-10').complete).toBe(true);
    // F1: booking 3 days / 14 = 0.21429, maintenance 1 / 14 = 0.07143. F5: held all 14 days = 1.
    expect(november.fermenters).toEqual([
      { kitItemId: 1, inUse: 0.2143, maintenance: 0.0714 },
      { kitItemId: 5, inUse: 1, maintenance: 0 },
    ]);
    // Room: (3/14 + 1) / 2 = 17/28 = 0.60714; maintenance (1/14) / 2 = 1/28 = 0.03571.
    expect(november.room).toEqual({ inUse: 0.6071, maintenance: 0.0357 });
  });

  it('counts a booking that serves a batch in the fermenter once', () => {
    const serving: BusyInterval = { kitItemId: 5, kind: 'booking', start: at('2026-10-27T00:00'), end: at('2026-10-30T00:00'), refId: 13, label: 'for batch 2' };
    const withBooking = buildProductionReport({ from: '2026-10', to: '2026-10', zone: 'UTC', now, batches, fermenters: [F1, F5], holds: [serving] });
    // F5: 27 Oct → 1 Nov = 5 days (the booking adds 27 Oct only) / 31 = 0.16129.
    expect(withBooking.months[0].fermenters[1]).toEqual({ kitItemId: 5, inUse: 0.1613, maintenance: 0 });
  });

  it('places a brew day in the month of the co-op’s zone, and leaves out months not begun', () => {
    // 31 Oct 23:30 UTC is 1 Nov 00:30 in Berlin (CET, UTC+1, after the change of 25 Oct 2026: Directive 2000/84/EC).
    const late = batch(9, 30, null, { planned: '2026-10-01T00:00', brewing: '2026-10-31T23:30' });
    const berlin = buildProductionReport({ from: '2026-10', to: '2026-12', zone: 'Europe/Berlin', now, batches: [late], fermenters: [], holds: [] });
    expect(berlin.months.map((m) => [m.month, m.litresBrewed])).toEqual([['2026-10', 0], ['2026-11', 30]]);
    expect(berlin.months[1].room).toEqual({ inUse: 0, maintenance: 0 });
  });

  it('lists the fermenters by id, code and name', () => {
    expect(report.fermenters).toEqual([{ id: 1, code: 'F1', name: 'Conical fermenter 1' }, { id: 5, code: 'F5', name: 'Conical fermenter 5' }]);
    expect(now - at('2026-11-01T00:00')).toBe(14 * DAY);
  });
});
