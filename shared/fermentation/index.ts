// Public entry of fermentation: the apparent-extract forecast of a batch from its readings.
/** Fits a four-parameter logistic curve to the readings; final gravity and finish day with 95 % bands. */
export { forecastFermentation, MIN_FORECAST_READINGS } from './fermentation-forecast';
export type { FermentationForecast, NoForecast, ForecastCurvePoint, GravityPoint, ForecastOptions } from './fermentation-forecast';
/** Apparent extract of the logistic model at a day. */
export { logisticExtract } from './logistic-extract-model';
export type { LogisticParameters } from './logistic-extract-model';
export * from './fermentation-chart-api';
/** Averages readings into equal stretches of time before a fit. */
export { binReadings } from './reading-bins';
/** A small Levenberg–Marquardt fit with the covariance of its estimate. */
export { levenbergMarquardt } from './levenberg-marquardt';
export { forecastFromReadings, forecastOutlook } from './forecast-outlook';
export type { ForecastOutlook } from './forecast-outlook';
