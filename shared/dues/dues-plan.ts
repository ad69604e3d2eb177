/** How long one payment of a plan keeps a member paid up. */
export const DUES_PERIODS = ['month', 'year'] as const;
export type DuesPeriod = (typeof DUES_PERIODS)[number];

/** Currencies a plan may be priced in (ISO 4217, two decimal places each). */
export const DUES_CURRENCIES = ['EUR', 'GBP', 'USD', 'CHF', 'SEK', 'DKK', 'NOK', 'PLN', 'CZK'] as const;
export type DuesCurrency = (typeof DUES_CURRENCIES)[number];

/** Limits shared by the server's schema and the client's form. */
export const DUES_LIMITS = {
  planNameMax: 60,
  /** Smallest amount a card charge may carry (0.50 in the major unit, the card networks' usual floor: common practice). */
  amountMinCents: 50,
  amountMaxCents: 1_000_000,
  cashNoteMax: 200,
} as const;

/** A plan the co-op offers, e.g. "Standard", 12.00 EUR a month. */
export interface DuesPlan {
  id: number;
  name: string;
  amountCents: number;
  currency: DuesCurrency;
  period: DuesPeriod;
  active: boolean;
}

/** "12.00 EUR" — the plain form used in e-mails, receipts and the CSV. */
export function formatDuesAmount(amountCents: number, currency: string): string {
  return `${(amountCents / 100).toFixed(2)} ${currency}`;
}

/** "12.00 EUR a month" */
export function describePlanPrice(plan: Pick<DuesPlan, 'amountCents' | 'currency' | 'period'>): string {
  return `${formatDuesAmount(plan.amountCents, plan.currency)} a ${plan.period}`;
}
