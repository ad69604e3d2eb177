import knex, { Knex } from 'knex';
import { join } from 'node:path';
import { Config } from './config';
import { Role } from '@shared/auth';
import { BookingPurpose } from '@shared/bookings';
import { KitKind, KitState } from '@shared/kit';
import { IngredientKind } from '@shared/recipes';
import { BatchPrediction, BatchStatus } from '@shared/batches';
import { AdjustmentReason, StockMovementKind, StockUnit } from '@shared/stock';
import { GravityUnit, ImportMode, Instrument, ReadingSource } from '@shared/readings';

export interface UserRow {
  id: number;
  email: string;
  name: string;
  password_hash: string;
  active: number | boolean;
  password_reset_requested_at: Date | null;
  unit_system: 'metric' | 'us';
  created_at: Date;
  updated_at: Date;
}

export interface UserRoleRow {
  user_id: number;
  role: Role;
}

export interface InvitationRow {
  id: number;
  email: string;
  roles: Role[];
  token_hash: string;
  invited_by_user_id: number;
  expires_at: Date;
  accepted_at: Date | null;
  revoked_at: Date | null;
  created_at: Date;
}

export interface PasswordResetRow {
  id: number;
  user_id: number;
  token_hash: string;
  issued_by_user_id: number | null;
  expires_at: Date;
  used_at: Date | null;
  created_at: Date;
}

export interface AuditLogRow {
  id: number;
  actor_user_id: number | null;
  action: string;
  subject_type: string;
  subject_id: number | null;
  detail: Record<string, unknown> | null;
  created_at: Date;
}

export interface RecipeRow {
  id: number;
  owner_user_id: number;
  name: string;
  visibility: 'private' | 'coop';
  current_version: number;
  cloned_from_recipe_id: number | null;
  archived_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

/** JSON columns arrive as text or parsed, by driver version: repositories parse and check them. */
export interface RecipeVersionRow {
  id: number;
  recipe_id: number;
  version: number;
  design: unknown;
  design_format: number;
  ingredients: unknown;
  brewhouse: unknown;
  created_by_user_id: number;
  created_at: Date;
}

export interface IngredientRow {
  id: number;
  kind: IngredientKind;
  created_at: Date;
}

export interface RecipeVersionItemRow {
  id: number;
  recipe_version_id: number;
  position: number;
  ingredient_id: number;
  amount: number;
  amount_unit: 'kg' | 'L' | 'each';
  use: string;
}

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

export interface DuesPlanRow {
  id: number;
  name: string;
  amount_cents: number;
  currency: string;
  period: 'month' | 'year';
  active: number | boolean;
  created_by_user_id: number | null;
  created_at: Date;
  updated_at: Date;
}

export interface DuesMembershipRow {
  user_id: number;
  plan_id: number | null;
  /** DATE: comes back as a Date at midnight UTC. */
  paid_through: Date | null;
  stripe_customer_id: string | null;
  saved_card: string | null;
  renew_by_card: number | boolean;
  updated_at: Date;
}

export interface DuesPaymentRow {
  id: number;
  user_id: number;
  plan_id: number | null;
  plan_name: string;
  amount_cents: number;
  currency: string;
  method: 'card' | 'cash';
  kind: 'payment' | 'renewal';
  status: 'succeeded' | 'refunded';
  idempotency_key: string;
  stripe_charge_id: string | null;
  stripe_refund_id: string | null;
  period_start: Date;
  period_end: Date;
  previous_paid_through: Date | null;
  note: string;
  recorded_by_user_id: number | null;
  refunded_at: Date | null;
  refunded_by_user_id: number | null;
  created_at: Date;
}

export interface OutboxMessageRow {
  id: number;
  kind: string;
  recipient: string;
  subject: string;
  text_body: string;
  html_body: string;
  state: 'queued' | 'sending' | 'sent' | 'failed' | 'abandoned';
  attempts: number;
  next_attempt_at: Date;
  claimed_by: string | null;
  claim_expires_at: Date | null;
  last_error: string | null;
  sent_at: Date | null;
  dedupe_key: string | null;
  created_at: Date;
}

export interface JobLeaseRow {
  name: string;
  holder: string | null;
  lease_until: Date;
  last_run_at: Date | null;
}

type DateInput = Date | string;

/** DECIMAL columns come back from the driver as strings. */
type Decimal = string;

export interface BatchRow {
  id: number;
  name: string;
  brewer_user_id: number;
  created_by_user_id: number;
  recipe_id: number | null;
  recipe_version: number | null;
  predicted: BatchPrediction | null;
  brew_date: Date;
  planned_volume_litres: Decimal;
  fermenter_kit_item_id: number | null;
  status: BatchStatus;
  planned_at: Date;
  brewing_at: Date | null;
  fermenting_at: Date | null;
  conditioning_at: Date | null;
  packaged_at: Date | null;
  archived_at: Date | null;
  wort_correction_factor: Decimal;
  notes: string;
  created_at: Date;
  updated_at: Date;
}

export interface BatchPlanRow {
  batch_id: number;
  fermentation_days: number;
  conditioning_days: number;
  created_at: Date;
  updated_at: Date;
}

export interface BrewDayMeasurementsRow {
  batch_id: number;
  pre_boil_litres: Decimal | null;
  pre_boil_gravity: Decimal | null;
  fermenter_litres: Decimal | null;
  original_gravity: Decimal | null;
  original_gravity_temperature_c: Decimal | null;
  pitched_at: Date | null;
  updated_by_user_id: number;
  updated_at: Date;
}

export interface GravityReadingRow {
  id: number;
  batch_id: number;
  measured_at: Date;
  instrument: Instrument;
  raw_value: Decimal;
  raw_unit: GravityUnit;
  sample_temperature_c: Decimal | null;
  calibration_temperature_c: Decimal | null;
  correction_factor: Decimal | null;
  original_brix: Decimal | null;
  corrected_sg: Decimal;
  source: ReadingSource;
  upload_id: number | null;
  push_token_id: number | null;
  note: string;
  created_by_user_id: number | null;
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

export interface ReadingUploadRow {
  id: number;
  batch_id: number;
  file_name: string;
  mode: ImportMode;
  rows_total: number;
  rows_imported: number;
  rows_duplicate: number;
  rows_rejected: number;
  created_by_user_id: number;
  created_at: Date;
}

export interface BatchPushTokenRow {
  id: number;
  batch_id: number;
  label: string;
  token_hash: string;
  created_by_user_id: number;
  created_at: Date;
  last_used_at: Date | null;
  revoked_at: Date | null;
}

/** Values a write may give where the driver reads back a DECIMAL string. */
type Writable<Row> = { [K in keyof Row]?: Row[K] extends Decimal | null ? number | string | null : Row[K] };

export interface DensityTableRow {
  id: number;
  name: string;
  /** DECIMAL columns come back as strings. */
  temperature_c: string;
  resolution: string;
  uploaded_by_user_id: number;
  created_at: Date;
}

export interface DensityTableRowRow {
  id: number;
  density_table_id: number;
  line: number;
  mass_percent: string;
  density: string;
}

export interface DensityTableCorrectionRow {
  id: number;
  density_table_row_id: number;
  density: string;
  note: string;
  corrected_by_user_id: number;
  created_at: Date;
}

export interface LabSettingsRow {
  id: number;
  density_table_id: number | null;
  updated_by_user_id: number | null;
  updated_at: Date;
}

export interface ToleranceClassRow {
  id: number;
  name: string;
  tolerance_percent_volume: string;
  note: string;
  retired: number | boolean;
  created_at: Date;
  updated_at: Date;
}

export interface StockLotRow {
  id: number;
  ingredient_id: number;
  unit: StockUnit;
  received_quantity: Decimal;
  quantity_on_hand: Decimal;
  received_on: Date;
  best_before: Date | null;
  supplier_note: string;
  created_by_user_id: number;
  created_at: Date;
}

export interface StockDrawRow {
  id: number;
  batch_id: number;
  shortfall_accepted: number | boolean;
  drawn_by_user_id: number;
  created_at: Date;
}

export interface StockDrawLineRow {
  id: number;
  stock_draw_id: number;
  ingredient_id: number;
  unit: StockUnit;
  needed: Decimal;
  drawn: Decimal;
  shortfall: Decimal;
}

export interface StockMovementRow {
  id: number;
  stock_lot_id: number;
  kind: StockMovementKind;
  quantity_change: Decimal;
  on_hand_after: Decimal;
  stock_draw_id: number | null;
  reason: AdjustmentReason | null;
  note: string;
  user_id: number;
  created_at: Date;
}

export interface StockReorderLevelRow {
  ingredient_id: number;
  unit: StockUnit;
  reorder_level: Decimal;
  updated_at: Date;
}

type NumericInsert<Row, Keys extends keyof Row> = Omit<Row, Keys> & { [K in Keys]: number };

declare module 'knex/types/tables' {
  interface Tables {
    users: Knex.CompositeTableType<UserRow, Omit<UserRow, 'id' | 'created_at' | 'updated_at' | 'password_reset_requested_at' | 'unit_system'>, Partial<UserRow>>;
    user_roles: UserRoleRow;
    invitations: Knex.CompositeTableType<InvitationRow, Omit<InvitationRow, 'id' | 'created_at' | 'accepted_at' | 'revoked_at' | 'roles'> & { roles: string }, Partial<InvitationRow>>;
    password_resets: Knex.CompositeTableType<PasswordResetRow, Omit<PasswordResetRow, 'id' | 'created_at' | 'used_at'>, Partial<PasswordResetRow>>;
    recipes: Knex.CompositeTableType<RecipeRow, Omit<RecipeRow, 'id' | 'created_at' | 'updated_at' | 'archived_at' | 'current_version'> & { current_version?: number }, Partial<RecipeRow>>;
    recipe_versions: Knex.CompositeTableType<
      RecipeVersionRow,
      Omit<RecipeVersionRow, 'id' | 'created_at' | 'design' | 'ingredients' | 'brewhouse'> & { design: string; ingredients: string; brewhouse: string },
      Partial<Omit<RecipeVersionRow, 'design' | 'ingredients' | 'brewhouse'>> & { design?: string; ingredients?: string; brewhouse?: string }
    >;
    recipe_version_items: Knex.CompositeTableType<RecipeVersionItemRow, Omit<RecipeVersionItemRow, 'id'>>;
    ingredients: Knex.CompositeTableType<IngredientRow, Omit<IngredientRow, 'id' | 'created_at'>>;
    kit_items: Knex.CompositeTableType<KitItemRow, Omit<KitItemRow, 'id' | 'created_at' | 'updated_at' | 'state' | 'notes' | 'capacity_litres'> & { state?: KitState; notes?: string; capacity_litres: number | null }, Partial<Omit<KitItemRow, 'capacity_litres'>> & { capacity_litres?: number | null }>;
    dues_plans: Knex.CompositeTableType<DuesPlanRow, Pick<DuesPlanRow, 'name' | 'amount_cents' | 'currency' | 'period'> & { created_by_user_id?: number | null }, Partial<DuesPlanRow>>;
    dues_memberships: Knex.CompositeTableType<DuesMembershipRow, Omit<Partial<DuesMembershipRow>, 'paid_through'> & { user_id: number; paid_through?: DateInput | null }, Omit<Partial<DuesMembershipRow>, 'paid_through'> & { paid_through?: DateInput | null }>;
    dues_payments: Knex.CompositeTableType<
      DuesPaymentRow,
      Omit<DuesPaymentRow, 'id' | 'created_at' | 'status' | 'stripe_refund_id' | 'refunded_at' | 'refunded_by_user_id' | 'period_start' | 'period_end' | 'previous_paid_through'> & { period_start: DateInput; period_end: DateInput; previous_paid_through: DateInput | null },
      Partial<Pick<DuesPaymentRow, 'status' | 'stripe_refund_id' | 'refunded_at' | 'refunded_by_user_id'>>
    >;
    outbox_messages: Knex.CompositeTableType<OutboxMessageRow, Pick<OutboxMessageRow, 'kind' | 'recipient' | 'subject' | 'text_body' | 'html_body'> & { dedupe_key?: string | null }, Partial<OutboxMessageRow>>;
    job_leases: JobLeaseRow;
    batches: Knex.CompositeTableType<BatchRow, Writable<Omit<BatchRow, 'predicted'>> & { predicted?: string | null }, Writable<Omit<BatchRow, 'predicted'>>>;
    batch_plans: Knex.CompositeTableType<BatchPlanRow, Pick<BatchPlanRow, 'batch_id' | 'fermentation_days' | 'conditioning_days'>, Partial<BatchPlanRow>>;
    brew_day_measurements: Knex.CompositeTableType<BrewDayMeasurementsRow, Writable<BrewDayMeasurementsRow>, Writable<BrewDayMeasurementsRow>>;
    gravity_readings: Knex.CompositeTableType<GravityReadingRow, Writable<GravityReadingRow>, Writable<GravityReadingRow>>;
    reading_uploads: Knex.CompositeTableType<ReadingUploadRow, Writable<ReadingUploadRow>, Writable<ReadingUploadRow>>;
    batch_push_tokens: Knex.CompositeTableType<BatchPushTokenRow, Writable<BatchPushTokenRow>, Writable<BatchPushTokenRow>>;
    kit_maintenance_entries: Knex.CompositeTableType<KitMaintenanceEntryRow, Omit<KitMaintenanceEntryRow, 'id' | 'created_at'>>;
    bookings: Knex.CompositeTableType<BookingRow, Omit<BookingRow, 'id' | 'created_at' | 'updated_at' | 'cancelled_at' | 'cancelled_by_user_id'>, Partial<BookingRow>>;
    booking_feed_links: Knex.CompositeTableType<BookingFeedLinkRow, Omit<BookingFeedLinkRow, 'created_at'>>;
    density_tables: Knex.CompositeTableType<DensityTableRow, Omit<NumericInsert<DensityTableRow, 'temperature_c' | 'resolution'>, 'id' | 'created_at'>>;
    density_table_rows: Knex.CompositeTableType<DensityTableRowRow, Omit<NumericInsert<DensityTableRowRow, 'mass_percent' | 'density'>, 'id'>>;
    density_table_corrections: Knex.CompositeTableType<DensityTableCorrectionRow, Omit<NumericInsert<DensityTableCorrectionRow, 'density'>, 'id' | 'created_at'>>;
    lab_settings: Knex.CompositeTableType<LabSettingsRow, Omit<LabSettingsRow, 'updated_at'>, Partial<LabSettingsRow>>;
    tolerance_classes: Knex.CompositeTableType<ToleranceClassRow, Omit<NumericInsert<ToleranceClassRow, 'tolerance_percent_volume'>, 'id' | 'created_at' | 'updated_at' | 'retired'>, Partial<Omit<ToleranceClassRow, 'tolerance_percent_volume'>> & { tolerance_percent_volume?: number }>;
    stock_lots: Knex.CompositeTableType<StockLotRow, Omit<NumericInsert<StockLotRow, 'received_quantity' | 'quantity_on_hand'>, 'id' | 'created_at' | 'received_on' | 'best_before'> & { received_on: DateInput; best_before: DateInput | null }, { quantity_on_hand: number }>;
    stock_draws: Knex.CompositeTableType<StockDrawRow, Omit<StockDrawRow, 'id' | 'created_at'>>;
    stock_draw_lines: Knex.CompositeTableType<StockDrawLineRow, Omit<NumericInsert<StockDrawLineRow, 'needed' | 'drawn' | 'shortfall'>, 'id'>>;
    stock_movements: Knex.CompositeTableType<StockMovementRow, Omit<NumericInsert<StockMovementRow, 'quantity_change' | 'on_hand_after'>, 'id' | 'created_at'>>;
    stock_reorder_levels: Knex.CompositeTableType<StockReorderLevelRow, Omit<NumericInsert<StockReorderLevelRow, 'reorder_level'>, 'updated_at'>, { reorder_level: number; updated_at: Date }>;
    audit_log: Knex.CompositeTableType<AuditLogRow, Omit<AuditLogRow, 'id' | 'created_at' | 'detail'> & { detail: string | null }>;
  }
}

export const MIGRATIONS_DIR = join(__dirname, '..', 'migrations');
export const SEEDS_DIR = join(__dirname, '..', 'seeds');

/** Knex settings for the configured database. */
export function knexConfig(db: Config['db']): Knex.Config {
  return {
    client: 'mysql2',
    connection: { ...db, charset: 'utf8mb4', timezone: 'Z', dateStrings: false },
    pool: { min: 0, max: 10 },
    // While the database is down a request waits at most this long for a connection, then gets a 503.
    acquireConnectionTimeout: 10_000,
    migrations: { directory: MIGRATIONS_DIR, loadExtensions: ['.ts'], tableName: 'knex_migrations' },
    seeds: { directory: SEEDS_DIR, loadExtensions: ['.ts'] },
  };
}

/** Opens the connection pool; callers own `destroy()`. */
export function createDb(db: Config['db']): Knex {
  return knex(knexConfig(db));
}
