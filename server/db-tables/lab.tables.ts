import { Knex } from 'knex';
import { NumericInsert } from './column-types';

// Reference density tables, lab settings and tolerance classes.

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

declare module 'knex/types/tables' {
  interface Tables {
    density_tables: Knex.CompositeTableType<DensityTableRow, Omit<NumericInsert<DensityTableRow, 'temperature_c' | 'resolution'>, 'id' | 'created_at'>>;
    density_table_rows: Knex.CompositeTableType<DensityTableRowRow, Omit<NumericInsert<DensityTableRowRow, 'mass_percent' | 'density'>, 'id'>>;
    density_table_corrections: Knex.CompositeTableType<DensityTableCorrectionRow, Omit<NumericInsert<DensityTableCorrectionRow, 'density'>, 'id' | 'created_at'>>;
    lab_settings: Knex.CompositeTableType<LabSettingsRow, Omit<LabSettingsRow, 'updated_at'>, Partial<LabSettingsRow>>;
    tolerance_classes: Knex.CompositeTableType<ToleranceClassRow, Omit<NumericInsert<ToleranceClassRow, 'tolerance_percent_volume'>, 'id' | 'created_at' | 'updated_at' | 'retired'>, Partial<Omit<ToleranceClassRow, 'tolerance_percent_volume'>> & { tolerance_percent_volume?: number }>;
  }
}
