import { Knex } from 'knex';
import { BookingPurpose } from '@shared/bookings';
import { KitKind, KitState } from '@shared/kit';

// The kit register, its maintenance log and bookings, and the calendar feed links.

export interface KitItemRow {
  id: number;
  code: string;
  name: string;
  kind: KitKind;
  /** DECIMAL: the driver returns a string. */
  capacity_litres: string | null;
  state: KitState;
  turnaround_hours: number;
  notes: string;
  created_at: Date;
  updated_at: Date;
}

export interface KitMaintenanceEntryRow {
  id: number;
  kit_item_id: number;
  /** DATE: written as yyyy-MM-dd, read back as a Date at midnight UTC. */
  performed_on: Date | string;
  work: string;
  performed_by: string;
  next_due_on: Date | string | null;
  recorded_by_user_id: number;
  created_at: Date;
}

export interface BookingRow {
  id: number;
  kit_item_id: number;
  user_id: number;
  created_by_user_id: number;
  purpose: BookingPurpose;
  starts_at: Date;
  ends_at: Date;
  held_until: Date;
  time_zone: string;
  batch_id: number | null;
  note: string;
  cancelled_at: Date | null;
  cancelled_by_user_id: number | null;
  created_at: Date;
  updated_at: Date;
}

export interface BookingFeedLinkRow {
  user_id: number;
  token_hash: string;
  created_at: Date;
}

declare module 'knex/types/tables' {
  interface Tables {
    kit_items: Knex.CompositeTableType<KitItemRow, Omit<KitItemRow, 'id' | 'created_at' | 'updated_at' | 'state' | 'notes' | 'capacity_litres'> & { state?: KitState; notes?: string; capacity_litres: number | null }, Partial<Omit<KitItemRow, 'capacity_litres'>> & { capacity_litres?: number | null }>;
    kit_maintenance_entries: Knex.CompositeTableType<KitMaintenanceEntryRow, Omit<KitMaintenanceEntryRow, 'id' | 'created_at'>>;
    bookings: Knex.CompositeTableType<BookingRow, Omit<BookingRow, 'id' | 'created_at' | 'updated_at' | 'cancelled_at' | 'cancelled_by_user_id'>, Partial<BookingRow>>;
    booking_feed_links: Knex.CompositeTableType<BookingFeedLinkRow, Omit<BookingFeedLinkRow, 'created_at'>>;
  }
}
