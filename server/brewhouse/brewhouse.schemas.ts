import { z } from 'zod';
import { BREWHOUSE_LIMITS, KETTLE_CAPACITY_MAX_LITRES, NumberLimit } from '@shared/recipes';

const within = ({ min, max, unit }: NumberLimit) =>
  z.number('must be a number').min(min, `must be at least ${min} ${unit}`).max(max, `must be at most ${max} ${unit}`);

/** Brewhouse settings as the API accepts them and as a version's snapshot stores them. */
export const brewhouseSettingsSchema = z.object({
  boilOffLitresPerHour: within(BREWHOUSE_LIMITS.boilOffLitresPerHour),
  grainAbsorptionLitresPerKg: within(BREWHOUSE_LIMITS.grainAbsorptionLitresPerKg),
  kettleLossLitres: within(BREWHOUSE_LIMITS.kettleLossLitres),
  fermenterLossLitres: within(BREWHOUSE_LIMITS.fermenterLossLitres),
  mashThicknessLitresPerKg: within(BREWHOUSE_LIMITS.mashThicknessLitresPerKg),
  grainTemperatureC: within(BREWHOUSE_LIMITS.grainTemperatureC),
  mashTunHeatCapacityKjPerK: within(BREWHOUSE_LIMITS.mashTunHeatCapacityKjPerK).nullable(),
  kettleCapacityLitres: z
    .number('must be a number')
    .positive('must be more than 0')
    .max(KETTLE_CAPACITY_MAX_LITRES, `must be at most ${KETTLE_CAPACITY_MAX_LITRES} L`)
    .nullable()
    .default(null),
});
