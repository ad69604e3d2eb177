import { KitItem } from './kit-item';
import { MaintenanceEntry } from './maintenance-entry';

export const KIT_PATH = '/api/kit';

/*
 * Routes (roles in brackets; "any" = any signed-in person):
 *   GET    /api/kit                               [any]    KitItemSummary[]
 *   POST   /api/kit                               [admin]  KitItemInput → KitItem (201)
 *   GET    /api/kit/:kitItemId                    [any]    KitItem
 *   PATCH  /api/kit/:kitItemId                    [admin]  Partial<KitItemInput> → KitItem
 *   GET    /api/kit/:kitItemId/maintenance        [any]    MaintenanceEntry[] (newest first)
 *   POST   /api/kit/:kitItemId/maintenance        [admin]  MaintenanceEntryInput → MaintenanceEntry (201)
 */

/** What an admin enters for an item: all of it but the id. */
export type KitItemInput = Omit<KitItem, 'id'>;

/** An item with the next service due from its log, for the register table. */
export interface KitItemSummary extends KitItem {
  nextMaintenanceDueOn: string | null;
}

export interface MaintenanceEntryInput {
  performedOn: string;
  work: string;
  performedBy: string;
  nextDueOn: string | null;
}

export type { MaintenanceEntry };
