/** The span an item is unavailable for one booking: from its start to the end of its cleaning turnaround. */
export interface HeldInterval {
  start: Date;
  /** Exclusive: the next booking may begin exactly here. */
  end: Date;
}

const HOUR_MS = 3_600_000;

/**
 * End of the hold after a booking. Cleaning takes elapsed hours, not wall-clock ones, so the
 * turnaround is added on the time line (a 24 h turnaround across a clock change ends at 23:00 or 01:00).
 */
export function heldUntil(end: Date, turnaroundHours: number): Date {
  return new Date(end.getTime() + turnaroundHours * HOUR_MS);
}

/** True when two half-open spans share any moment. Touching ends do not overlap. */
export function heldIntervalsOverlap(a: HeldInterval, b: HeldInterval): boolean {
  return a.start.getTime() < b.end.getTime() && b.start.getTime() < a.end.getTime();
}
