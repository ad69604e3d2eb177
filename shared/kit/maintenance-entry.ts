/** One line of an item's maintenance log; entries are kept as written. */
export interface MaintenanceEntry {
  id: number;
  kitItemId: number;
  /** Calendar date the work was done, yyyy-MM-dd in the co-op's zone. */
  performedOn: string;
  work: string;
  /** Who did the work, as the admin wrote it (may be someone outside the co-op). */
  performedBy: string;
  /** When the next service is due, yyyy-MM-dd, if any. */
  nextDueOn: string | null;
  recordedByName: string;
  createdAt: string;
}
