import { DateTime } from 'luxon';
import type { ForecastOutlook } from '@shared/fermentation';

/** One line for a batch's forecast: final gravity and finish day with their 95 % bands, in the co-op's zone. */
export function forecastOutlookText(outlook: ForecastOutlook, timeZone: string): string {
  if (outlook.status !== 'forecast') return outlook.message;
  const day = (ms: number) => DateTime.fromMillis(ms, { zone: timeZone }).toFormat('d LLL');
  const sg = (value: number) => value.toFixed(3);
  return `Forecast FG ${sg(outlook.finalGravity)} (${sg(outlook.finalGravityLow)}–${sg(outlook.finalGravityHigh)}), ` +
    `finished about ${day(outlook.finishTime)} (${day(outlook.finishTimeEarly)}–${day(outlook.finishTimeLate)})`;
}
