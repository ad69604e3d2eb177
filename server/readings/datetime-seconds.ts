/** The digits of `text` from `at` to `end` (exclusive) as a whole number, read by character code. */
function digits(text: string, at: number, end: number): number {
  let value = 0;
  for (let i = at; i < end; i++) value = value * 10 + (text.charCodeAt(i) - 48);
  return value;
}

/**
 * A DATETIME as the database writes it ('YYYY-MM-DD HH:MM:SS', no time zone: the app keeps UTC)
 * into whole seconds since 1970. Reading the text costs far less than the driver's Date per value or
 * asking the database to convert, which counts for the tens of thousands of rows of a logger's batch.
 */
export function epochSecondsOfDatetime(text: string): number {
  if (text.length !== 19) return Math.floor(Date.parse(`${text.replace(' ', 'T')}Z`) / 1000);
  return Date.UTC(digits(text, 0, 4), digits(text, 5, 7) - 1, digits(text, 8, 10), digits(text, 11, 13), digits(text, 14, 16), digits(text, 17, 19)) / 1000;
}
