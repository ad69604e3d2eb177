import { EnvironmentProviders, makeEnvironmentProviders } from '@angular/core';
import { MatDateFormats } from '@angular/material/core';
import { MAT_LUXON_DATE_ADAPTER_OPTIONS, MatLuxonDateAdapterOptions, provideLuxonDateAdapter } from '@angular/material-luxon-adapter';

/**
 * Every date field of the app is typed and shown as yyyy-MM-dd, which reads the same in any
 * country (03/04/2027 is March in one and April in another, so it is refused rather than guessed);
 * times are the 24-hour HH:mm. Month labels in the calendar are spelt out.
 */
export const COOP_DATE_FORMATS: MatDateFormats = {
  parse: { dateInput: ['yyyy-MM-dd', 'yyyy-M-d'], timeInput: ['HH:mm', 'H:mm', 't'] },
  display: {
    dateInput: 'yyyy-MM-dd',
    timeInput: 'HH:mm',
    monthYearLabel: 'LLL yyyy',
    dateA11yLabel: 'DDD',
    monthYearA11yLabel: 'LLLL yyyy',
    timeOptionLabel: 'HH:mm',
  },
};

/** Calendars start their weeks on Monday, as the ISO 8601 weeks of the brew plan do. */
const COOP_DATE_ADAPTER_OPTIONS: MatLuxonDateAdapterOptions = { useUtc: false, firstDayOfWeek: 1, defaultOutputCalendar: 'gregory' };

/** The luxon date adapter with the co-op's formats, provided once for the whole app. */
export function provideCoopDateAdapter(): EnvironmentProviders {
  return makeEnvironmentProviders([
    provideLuxonDateAdapter(COOP_DATE_FORMATS),
    { provide: MAT_LUXON_DATE_ADAPTER_OPTIONS, useValue: COOP_DATE_ADAPTER_OPTIONS },
  ]);
}
