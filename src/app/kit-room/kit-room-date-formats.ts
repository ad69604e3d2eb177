import { MatDateFormats } from '@angular/material/core';

/** Dates typed as yyyy-MM-dd (unambiguous in any locale) and shown with the weekday. */
export const KIT_ROOM_DATE_FORMATS: MatDateFormats = {
  parse: { dateInput: ['yyyy-MM-dd', 'd/M/yyyy', 'D'] },
  display: { dateInput: 'yyyy-MM-dd', monthYearLabel: 'LLL yyyy', dateA11yLabel: 'DDD', monthYearA11yLabel: 'LLLL yyyy' },
};
