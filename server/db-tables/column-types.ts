// Column types shared by the table rows: what the driver reads back and what a write may give.

/** A DATE or DATETIME a write may give as a Date or an ISO string. */
export type DateInput = Date | string;

/** DECIMAL columns come back from the driver as strings. */
export type Decimal = string;

/** Values a write may give where the driver reads back a DECIMAL string. */
export type Writable<Row> = { [K in keyof Row]?: Row[K] extends Decimal | null ? number | string | null : Row[K] };

/** An insert that gives the named DECIMAL columns as numbers. */
export type NumericInsert<Row, Keys extends keyof Row> = Omit<Row, Keys> & { [K in Keys]: number };
