import { forecastOutlookText } from './forecast-outlook-text';

describe('forecastOutlookText', () => {
  it('gives final gravity and finish day with their bands, the days in the co-op time zone', () => {
    // 23:30 UTC on 4 Dec is already 5 Dec in Berlin (UTC+1 in winter).
    const finish = Date.UTC(2026, 11, 4, 23, 30);
    const text = forecastOutlookText({
      status: 'forecast', finalGravity: 1.01049, finalGravityLow: 1.0091, finalGravityHigh: 1.0118,
      finishTime: finish, finishTimeEarly: finish - 86_400_000, finishTimeLate: finish + 2 * 86_400_000,
    }, 'Europe/Berlin');
    expect(text).toBe('Forecast FG 1.010 (1.009–1.012), finished about 5 Dec (4 Dec–7 Dec)');
  });

  it('says why there is no forecast yet', () => {
    expect(forecastOutlookText({ status: 'not-enough-readings', message: 'A forecast needs at least 6 readings.' }, 'UTC')).toBe('A forecast needs at least 6 readings.');
  });
});
