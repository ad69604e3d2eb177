import { Knex } from 'knex';
import { GravityUnit, ImportMode, Instrument, ReadingSource } from '@shared/readings';
import { Decimal, Writable } from './column-types';

// Gravity readings, the uploads they came in and the devices that push them.

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

declare module 'knex/types/tables' {
  interface Tables {
    gravity_readings: Knex.CompositeTableType<GravityReadingRow, Writable<GravityReadingRow>, Writable<GravityReadingRow>>;
    reading_uploads: Knex.CompositeTableType<ReadingUploadRow, Writable<ReadingUploadRow>, Writable<ReadingUploadRow>>;
    batch_push_tokens: Knex.CompositeTableType<BatchPushTokenRow, Writable<BatchPushTokenRow>, Writable<BatchPushTokenRow>>;
  }
}
