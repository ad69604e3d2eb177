import { FermentationForecast, forecastFermentation, NoForecast } from './fermentation-forecast';

/** A forecast as a list shows it: final gravity and finish (epoch ms) with their 95 % bands, or why there is none yet. */
export type ForecastOutlook =
  | Pick<FermentationForecast, 'status' | 'finalGravity' | 'finalGravityLow' | 'finalGravityHigh' | 'finishTime' | 'finishTimeEarly' | 'finishTimeLate'>
  | Omit<NoForecast, 'readingsUsed'>;

/**
 * The forecast from a batch's readings (oldest first). With an OG known, readings above it (wort
 * samples before pitching, a stray reading) are left out of the fit, as the chart does.
 */
export function forecastFromReadings(readings: readonly { time: number; gravity: number }[], og: number | null): FermentationForecast | NoForecast {
  return forecastFermentation(og === null ? readings : readings.filter((r) => r.gravity <= og));
}

/** The forecast without its curve and parameters. */
export function forecastOutlook(forecast: FermentationForecast | NoForecast): ForecastOutlook {
  if (forecast.status !== 'forecast') return { status: forecast.status, message: forecast.message };
  const { finalGravity, finalGravityLow, finalGravityHigh, finishTime, finishTimeEarly, finishTimeLate } = forecast;
  return { status: 'forecast', finalGravity, finalGravityLow, finalGravityHigh, finishTime, finishTimeEarly, finishTimeLate };
}
