import { Booking } from '@shared/bookings';
import { BatchOccupancy, BusyInterval, TimelineEntry, TimelineLane, utilisationOver, Utilisation } from '@shared/brew-plan';
import { PlanCalendar } from './plan-calendar';

const iso = (ms: number) => new Date(ms).toISOString();

function bookingEntry(booking: Booking): TimelineEntry {
  const maintenance = booking.purpose === 'maintenance';
  return {
    kind: maintenance ? 'maintenance' : 'booking',
    label: maintenance ? booking.note || 'Maintenance' : `${booking.userName}${booking.note ? ` · ${booking.note}` : ''}`,
    start: booking.startsAt, end: booking.endsAt, heldUntil: booking.heldUntil,
    bookingId: booking.id, batchId: booking.batchId, batchStatus: null, phases: [], forecastFinish: null, freesEarlyByDays: null,
  };
}

/**
 * The lanes of the timeline over [from, to): per fermenter its batches (phases as expected, forecast
 * finish, early release), the other bookings and maintenance blocks, and its utilisation.
 */
export function timelineLanes(
  calendar: PlanCalendar,
  occupancy: ReadonlyMap<number, BatchOccupancy>,
  forecasts: ReadonlyMap<number, number>,
  busy: readonly BusyInterval[],
  from: number,
  to: number,
): { lanes: TimelineLane[]; room: Utilisation } {
  const shown = new Set(calendar.batches.map((b) => b.id));
  const { items, room } = utilisationOver(calendar.fermenters, busy, from, to);
  const lanes = calendar.fermenters.map((f, i): TimelineLane => {
    const batches = calendar.batches.filter((b) => b.fermenterId === f.id).map((b): TimelineEntry => {
      const occ = occupancy.get(b.id)!;
      return {
        kind: 'batch', label: b.name, start: iso(occ.start), end: iso(occ.end), heldUntil: iso(occ.end + f.turnaroundHours * 3_600_000),
        bookingId: b.booking?.id ?? null, batchId: b.id, batchStatus: b.status,
        phases: occ.phases.map((p) => ({ phase: p.phase, start: iso(p.start), end: iso(p.end) })),
        forecastFinish: forecasts.has(b.id) ? iso(forecasts.get(b.id)!) : null,
        freesEarlyByDays: occ.freesEarlyByDays,
      };
    });
    const bookings = calendar.bookings.filter((b) => b.kitItemId === f.id && (b.batchId === null || !shown.has(b.batchId))).map(bookingEntry);
    const entries = [...batches, ...bookings]
      .filter((e) => Date.parse(e.start) < to && Date.parse(e.heldUntil ?? e.end) > from)
      .sort((a, b) => Date.parse(a.start) - Date.parse(b.start));
    const { kitItemId: _id, ...utilisation } = items[i];
    return { kitItemId: f.id, code: f.code, name: f.name, capacityLitres: f.capacityLitres, inService: f.inService, turnaroundHours: f.turnaroundHours, entries, utilisation };
  });
  return { lanes, room };
}
