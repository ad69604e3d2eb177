import { DateTime } from 'luxon';
import { BATCH_STATUS_LABELS } from '@shared/batches';
import { BrewPlanTimeline, PLAN_PHASE_LABELS, TimelineEntry, TimelineLane } from '@shared/brew-plan';
import { formatCalendarDay, formatZoned, ZonedForm } from '@app/ui/zoned-date-time-pipe';

/** A stretch of an entry's bar, as a share of the window (percent). */
export interface BarSegment {
  kind: string;
  label: string;
  left: number;
  width: number;
}

export interface EntryView {
  key: string;
  kind: TimelineEntry['kind'];
  label: string;
  /** Status of a batch, or "Booking" / "Maintenance". */
  tag: string;
  when: string;
  heldUntil: string | null;
  segments: BarSegment[];
  forecast: string | null;
  freesEarly: string | null;
  batchId: number | null;
  /** Planned batches can be moved on the plan. */
  movable: boolean;
  brewDate: string | null;
}

export interface LaneView {
  kitItemId: number;
  code: string;
  name: string;
  capacity: string;
  inService: boolean;
  inUsePercent: number;
  maintenancePercent: number;
  /** Set when a batch in it is forecast to hand it back before its planned end. */
  freesEarly: boolean;
  entries: EntryView[];
}

export interface TimelineView {
  from: string;
  to: string;
  period: string;
  roomInUsePercent: number;
  roomMaintenancePercent: number;
  lanes: LaneView[];
}

const percent = (share: number) => Math.round(share * 100);

/** Batches are planned in whole days; a booking or maintenance block keeps its hours. */
const precisionOf = (entry: TimelineEntry): ZonedForm => (entry.kind === 'batch' ? 'date' : 'dateTime');

function segment(kind: string, label: string, start: string, end: string, from: number, to: number): BarSegment | null {
  const s = Math.max(Date.parse(start), from);
  const e = Math.min(Date.parse(end), to);
  if (e <= s) return null;
  return { kind, label, left: ((s - from) / (to - from)) * 100, width: ((e - s) / (to - from)) * 100 };
}

function entryView(entry: TimelineEntry, zone: string, from: number, to: number): EntryView {
  const shown = (iso: string) => formatZoned(iso, zone, precisionOf(entry));
  const parts = entry.kind === 'batch' ? entry.phases.map((p) => segment(p.phase, PLAN_PHASE_LABELS[p.phase], p.start, p.end, from, to)) : [segment(entry.kind, entry.label, entry.start, entry.end, from, to)];
  const held = entry.heldUntil && entry.heldUntil !== entry.end ? entry.heldUntil : null;
  const cleaning = held ? segment('turnaround', 'Cleaning turnaround', entry.end, held, from, to) : null;
  const tag = entry.kind === 'batch' ? BATCH_STATUS_LABELS[entry.batchStatus!] : entry.kind === 'booking' ? 'Booking' : 'Maintenance';
  return {
    key: `${entry.kind}-${entry.batchId ?? entry.bookingId}`,
    kind: entry.kind,
    label: entry.label,
    tag,
    when: `${shown(entry.start)} – ${shown(entry.end)}`,
    heldUntil: held ? shown(held) : null,
    segments: [...parts, cleaning].filter((s): s is BarSegment => s !== null),
    forecast: entry.forecastFinish ? `Forecast: fermentation finishes ${formatZoned(entry.forecastFinish, zone, 'date')}` : null,
    freesEarly: entry.freesEarlyByDays ? `Frees up ${entry.freesEarlyByDays} day${entry.freesEarlyByDays === 1 ? '' : 's'} early, by the gravity forecast` : null,
    batchId: entry.batchId,
    movable: entry.kind === 'batch' && entry.batchStatus === 'planned',
    brewDate: entry.kind === 'batch' ? DateTime.fromISO(entry.start, { zone: 'utc' }).setZone(zone).toISODate() : null,
  };
}

function laneView(lane: TimelineLane, zone: string, from: number, to: number): LaneView {
  return {
    kitItemId: lane.kitItemId,
    code: lane.code,
    name: lane.name,
    capacity: lane.capacityLitres === null ? 'no capacity set' : `${lane.capacityLitres} L`,
    inService: lane.inService,
    inUsePercent: percent(lane.utilisation.inUse),
    maintenancePercent: percent(lane.utilisation.maintenance),
    freesEarly: lane.entries.some((e) => e.freesEarlyByDays !== null),
    entries: lane.entries.map((e) => entryView(e, zone, from, to)),
  };
}

/** The timeline as the page shows it: in the co-op's zone, bars as shares of the window. */
export function buildTimelineView(timeline: BrewPlanTimeline | null): TimelineView | null {
  if (!timeline) return null;
  const zone = timeline.timeZone;
  const from = DateTime.fromISO(timeline.from, { zone }).toMillis();
  const to = DateTime.fromISO(timeline.to, { zone }).plus({ days: 1 }).toMillis();
  return {
    from: timeline.from,
    to: timeline.to,
    period: `${formatCalendarDay(timeline.from)} – ${formatCalendarDay(timeline.to)}`,
    roomInUsePercent: percent(timeline.room.inUse),
    roomMaintenancePercent: percent(timeline.room.maintenance),
    lanes: timeline.lanes.map((l) => laneView(l, zone, from, to)),
  };
}
