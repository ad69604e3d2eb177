/** What a piece of the co-op's equipment is. */
export const KIT_KINDS = ['fermenter', 'kettle', 'chiller', 'kegging', 'other'] as const;
export type KitKind = (typeof KIT_KINDS)[number];

/** Whether an item can be used: only items in service can be booked or hold a batch. */
export const KIT_STATES = ['in_service', 'maintenance', 'retired'] as const;
export type KitState = (typeof KIT_STATES)[number];

/** One item of the kit register. */
export interface KitItem {
  id: number;
  /** Short label painted on the item, e.g. "F2". */
  code: string;
  name: string;
  kind: KitKind;
  /** Working volume in litres; null for items without one (a chiller). */
  capacityLitres: number | null;
  state: KitState;
  /** Cleaning time held after every use, in hours. */
  turnaroundHours: number;
  notes: string;
}
