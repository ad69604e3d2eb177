/** A batch's life, in order; each status records the moment it was reached. */
export const BATCH_STATUSES = ['planned', 'brewing', 'fermenting', 'conditioning', 'packaged', 'archived'] as const;
export type BatchStatus = (typeof BATCH_STATUSES)[number];

/** Statuses in which the batch occupies its fermenter. */
export const FERMENTER_HOLDING_STATUSES: readonly BatchStatus[] = ['fermenting', 'conditioning'];

/** Statuses shown as active on Today. */
export const ACTIVE_STATUSES: readonly BatchStatus[] = ['planned', 'brewing', 'fermenting', 'conditioning'];

/** The status after `status`, or null at the end. */
export function nextStatus(status: BatchStatus): BatchStatus | null {
  return BATCH_STATUSES[BATCH_STATUSES.indexOf(status) + 1] ?? null;
}

/** The statuses a move from `from` to `to` passes over without recording; empty for a single step. */
export function skippedStatuses(from: BatchStatus, to: BatchStatus): BatchStatus[] {
  const start = BATCH_STATUSES.indexOf(from);
  const end = BATCH_STATUSES.indexOf(to);
  return end > start + 1 ? BATCH_STATUSES.slice(start + 1, end) : [];
}

/** True when a move goes back to an earlier status (not allowed: dates already recorded stay). */
export function isBackwardMove(from: BatchStatus, to: BatchStatus): boolean {
  return BATCH_STATUSES.indexOf(to) <= BATCH_STATUSES.indexOf(from);
}

/** Plain-language label of a status. */
export const BATCH_STATUS_LABELS: Record<BatchStatus, string> = {
  planned: 'Planned',
  brewing: 'Brewing',
  fermenting: 'Fermenting',
  conditioning: 'Conditioning',
  packaged: 'Packaged',
  archived: 'Archived',
};
