import Stripe from 'stripe';
import { Config } from '../config';
import { AppError } from '../errors/app-error';

/** A charge the card network refused: nothing was taken. */
export class CardDeclined extends Error {
  constructor(readonly reason: string) {
    super(reason);
  }
}

/** A saved card, as far as the app keeps it: the customer and a label such as "Visa ending 4242". */
export interface SavedCard {
  customerId: string;
  label: string;
}

const unreachable = () =>
  new AppError('payments-unavailable', 'Card payments are not reachable right now, so nothing was charged. Please try again in a few minutes.', 503);

/** Maps the SDK's errors: a card refusal to CardDeclined, anything on the way to a 503 (never a 500). */
async function call<T>(request: () => Promise<T>): Promise<T> {
  try {
    return await request();
  } catch (error) {
    const type = (error as { type?: string }).type;
    if (type === 'StripeCardError') throw new CardDeclined((error as Error).message);
    throw unreachable();
  }
}

/** Customers with a card token, charges and refunds through the official SDK; every write carries an idempotency key. */
export function createStripeGateway(config: Config['stripe']) {
  const stripe = new Stripe(config.secretKey, {
    ...(config.host ? { host: config.host, port: config.port, protocol: config.protocol } : {}),
    maxNetworkRetries: 0,
    timeout: 10_000,
    telemetry: false,
  });

  return {
    /** Makes a customer holding the card behind `token` (the card is checked here and may be declined). */
    async saveCard(token: string, email: string, idempotencyKey: string): Promise<SavedCard> {
      const customer = await call(() => stripe.customers.create({ email, source: token }, { idempotencyKey: `${idempotencyKey}:customer` }));
      const sourceId = typeof customer.default_source === 'string' ? customer.default_source : customer.default_source?.id;
      const card = sourceId ? await call(() => stripe.customers.retrieveSource(customer.id, sourceId)) : null;
      const brand = card && 'brand' in card ? card.brand : 'Card';
      const last4 = card && 'last4' in card ? card.last4 : '????';
      return { customerId: customer.id, label: `${brand} ending ${last4}` };
    },

    /** Charges the customer's saved card; the same key always yields the same charge. */
    async charge(input: { customerId: string; memberId: number; amountCents: number; currency: string; description: string; idempotencyKey: string }): Promise<string> {
      const charge = await call(() =>
        stripe.charges.create(
          { amount: input.amountCents, currency: input.currency.toLowerCase(), customer: input.customerId, description: input.description, metadata: { memberId: String(input.memberId), duesKey: input.idempotencyKey } },
          { idempotencyKey: `${input.idempotencyKey}:charge` },
        ),
      );
      if (charge.status !== 'succeeded') throw new CardDeclined(charge.failure_message ?? 'The card was not charged.');
      return charge.id;
    },

    /** Refunds a charge in full. */
    async refund(chargeId: string, idempotencyKey: string): Promise<string> {
      const refund = await call(() => stripe.refunds.create({ charge: chargeId }, { idempotencyKey: `${idempotencyKey}:refund` }));
      return refund.id;
    },
  };
}

export type StripeGateway = ReturnType<typeof createStripeGateway>;
