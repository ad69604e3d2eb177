import { TestBed } from '@angular/core/testing';
import { DateAdapter, MAT_DATE_FORMATS, MatDateFormats } from '@angular/material/core';
import { DateTime } from 'luxon';
import { appConfig } from '../app.config';

describe('the app-wide date formats', () => {
  function fromAppConfig() {
    TestBed.configureTestingModule({ providers: appConfig.providers });
    return { adapter: TestBed.inject(DateAdapter<DateTime>), formats: TestBed.inject<MatDateFormats>(MAT_DATE_FORMATS) };
  }

  it('reads a typed 2027-04-03 as 3 April 2027, whatever the browser locale', () => {
    const { adapter, formats } = fromAppConfig();
    adapter.setLocale('en-US');

    const day = adapter.parse('2027-04-03', formats.parse.dateInput)!;

    expect([day.year, day.month, day.day]).toEqual([2027, 4, 3]);
  });

  it('refuses 03/04/2027, which is March in one country and April in another', () => {
    const { adapter, formats } = fromAppConfig();
    adapter.setLocale('en-US');

    expect(adapter.isValid(adapter.parse('03/04/2027', formats.parse.dateInput)!)).toBe(false);
  });

  it('shows a day as yyyy-MM-dd and a time on the 24-hour clock', () => {
    const { adapter, formats } = fromAppConfig();
    adapter.setLocale('en-US');
    const at = DateTime.fromObject({ year: 2027, month: 4, day: 3, hour: 21, minute: 5 });

    expect(adapter.format(at, formats.display.dateInput)).toBe('2027-04-03');
    expect(adapter.format(at, formats.display.timeInput)).toBe('21:05');
  });

  it('starts the calendar week on Monday whatever the browser locale (ISO 8601 weeks, as the brew plan counts them)', () => {
    const { adapter } = fromAppConfig();
    adapter.setLocale('en-US');

    expect(adapter.getFirstDayOfWeek()).toBe(1);
  });
});
