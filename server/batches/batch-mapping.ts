import { Batch, BATCH_STATUSES, BatchStatus, BatchStatusDates, BatchSummary, BrewDayMeasurements } from '@shared/batches';
import { forecastFromReadings, forecastOutlook } from '@shared/fermentation';
import { fermentationProgress, GravityPoint } from '@shared/readings';
import { BatchRecord } from './batches.repository';

const num = (value: string | number | null | undefined): number | null => (value === null || value === undefined ? null : Number(value));
const iso = (value: Date | null | undefined): string | null => (value ? value.toISOString() : null);

/** Column holding the moment a status was reached. */
export const STATUS_DATE_COLUMN: Record<BatchStatus, 'planned_at' | 'brewing_at' | 'fermenting_at' | 'conditioning_at' | 'packaged_at' | 'archived_at'> = {
  planned: 'planned_at',
  brewing: 'brewing_at',
  fermenting: 'fermenting_at',
  conditioning: 'conditioning_at',
  packaged: 'packaged_at',
  archived: 'archived_at',
};

/** When fermentation started: the pitch time entered, else the day the batch moved to fermenting. */
export function fermentationStart(record: BatchRecord): Date | null {
  return record.measured?.pitched_at ?? record.fermenting_at ?? null;
}

/** The OG the log is judged against: the brew day's, else the last reading before fermentation started. */
export function effectiveOg(record: BatchRecord, points: readonly GravityPoint[]): number | null {
  const measured = num(record.measured?.original_gravity);
  if (measured !== null) return measured;
  const start = fermentationStart(record)?.getTime();
  if (start === undefined) return null;
  const before = points.filter((p) => p.at < start);
  return before.length ? before[before.length - 1].sg : null;
}

function measuredOf(record: BatchRecord): BrewDayMeasurements {
  const m = record.measured;
  return {
    preBoilLitres: num(m?.pre_boil_litres),
    preBoilGravity: num(m?.pre_boil_gravity),
    fermenterLitres: num(m?.fermenter_litres),
    originalGravity: num(m?.original_gravity),
    originalGravityTemperatureC: num(m?.original_gravity_temperature_c),
    pitchedAt: iso(m?.pitched_at),
  };
}

/** Calendar date of a DATE column (the driver reads it as UTC midnight). */
export function dateOnly(value: Date): string {
  return value.toISOString().slice(0, 10);
}

export function toBatchSummary(record: BatchRecord, points: readonly GravityPoint[]): BatchSummary {
  const og = effectiveOg(record, points);
  return {
    id: record.id,
    name: record.name,
    status: record.status,
    brewerId: record.brewer_user_id,
    brewerName: record.brewer_name,
    brewDate: dateOnly(record.brew_date),
    plannedVolumeLitres: Number(record.planned_volume_litres),
    fermenterId: record.fermenter_kit_item_id,
    fermenterCode: record.fermenter_code,
    recipeId: record.recipe_id,
    recipeVersion: record.recipe_version,
    progress: fermentationProgress(points, og, record.predicted?.yeastAttenuationPercent ?? null),
    forecast: record.status === 'fermenting' ? forecastOutlook(forecastFromReadings(points.map((p) => ({ time: p.at, gravity: p.sg })), og)) : null,
  };
}

export function toBatch(record: BatchRecord, points: readonly GravityPoint[], editable: boolean): Batch {
  const statusDates = Object.fromEntries(BATCH_STATUSES.map((s) => [s, iso(record[STATUS_DATE_COLUMN[s]])])) as BatchStatusDates;
  return {
    ...toBatchSummary(record, points),
    recipeName: record.recipe_name,
    predicted: record.predicted,
    measured: measuredOf(record),
    statusDates,
    wortCorrectionFactor: Number(record.wort_correction_factor),
    notes: record.notes,
    editable,
    createdAt: record.created_at.toISOString(),
  };
}
