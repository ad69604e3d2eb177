/** What keeps a fermenter busy. */
export const BUSY_KINDS = ['booking', 'maintenance', 'batch'] as const;
export type BusyKind = (typeof BUSY_KINDS)[number];

/** A span a kit item is unavailable, already including any cleaning turnaround; ms since the epoch, end exclusive. */
export interface BusyInterval {
  kitItemId: number;
  kind: BusyKind;
  start: number;
  end: number;
  /** The booking's or batch's id, so a collision can be named. */
  refId: number;
  label: string;
}

/** A fermenter as the planner sees it. */
export interface PlanFermenter {
  id: number;
  code: string;
  name: string;
  capacityLitres: number | null;
  /** Only items in service can take a batch. */
  inService: boolean;
  turnaroundHours: number;
}

/** The busy spans that share a moment with [start, end). Touching ends do not collide. */
export function collisionsWith(busy: readonly BusyInterval[], kitItemId: number, start: number, end: number): BusyInterval[] {
  return busy.filter((b) => b.kitItemId === kitItemId && b.start < end && start < b.end);
}
