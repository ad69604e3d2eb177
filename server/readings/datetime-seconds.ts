/** The digits of `text` from `at` to `end` (exclusive) as a whole number, read by character code. */
function digits(text: string, at: number, end: number): number {
  let value = 0;
  for (let i = at; i < end; i++) value = value * 10 + (text.charCodeAt(i) - 48);
  return value;
}

/**
 * Days from 1970-01-01 to a date of the proleptic Gregorian calendar, in whole-number arithmetic
 * (Howard Hinnant, "chrono-Compatible Low-Level Date Algorithms", days_from_civil).
 */
export function daysFromCivil(year: number, month: number, day: number): number {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yearOfEra = y - era * 400;
  const dayOfYear = Math.floor((153 * (month > 2 ? month - 3 : month + 9) + 2) / 5) + day - 1;
  const dayOfEra = yearOfEra * 365 + Math.floor(yearOfEra / 4) - Math.floor(yearOfEra / 100) + dayOfYear;
  return era * 146_097 + dayOfEra - 719_468;
}

/**
 * A DATETIME as the database writes it ('YYYY-MM-DD HH:MM:SS', no time zone: the app keeps UTC)
 * into whole seconds since 1970. Reading the text costs far less than the driver's Date per value or
 * asking the database to convert, which counts for the tens of thousands of rows of a logger's batch.
 */
export function epochSecondsOfDatetime(text: string): number {
  if (text.length !== 19) return Math.floor(Date.parse(`${text.replace(' ', 'T')}Z`) / 1000);
  const days = daysFromCivil(digits(text, 0, 4), digits(text, 5, 7), digits(text, 8, 10));
  return days * 86_400 + digits(text, 11, 13) * 3600 + digits(text, 14, 16) * 60 + digits(text, 17, 19);
}
