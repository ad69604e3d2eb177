import { Knex } from 'knex';
import { BatchPrediction, BatchStatus } from '@shared/batches';
import { Decimal, Writable } from './column-types';

// Batches, their plans and brew-day measurements.

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

declare module 'knex/types/tables' {
  interface Tables {
    batches: Knex.CompositeTableType<BatchRow, Writable<Omit<BatchRow, 'predicted'>> & { predicted?: string | null }, Writable<Omit<BatchRow, 'predicted'>>>;
    batch_plans: Knex.CompositeTableType<BatchPlanRow, Pick<BatchPlanRow, 'batch_id' | 'fermentation_days' | 'conditioning_days'>, Partial<BatchPlanRow>>;
    brew_day_measurements: Knex.CompositeTableType<BrewDayMeasurementsRow, Writable<BrewDayMeasurementsRow>, Writable<BrewDayMeasurementsRow>>;
  }
}
