import Stripe from 'stripe';

/** The SDK pointed at the Stripe fake of `npm test`, to check from outside what the app charged. */
export function stripeFakeClient(): Stripe {
  if (!process.env.STRIPE_API_PORT) throw new Error('No Stripe fake: run the tests with `npm test`, which starts one.');
  return new Stripe(process.env.STRIPE_SECRET_KEY!, { host: '127.0.0.1', port: Number(process.env.STRIPE_API_PORT), protocol: 'http', maxNetworkRetries: 0, telemetry: false });
}

/** Every charge the fake holds for a member, by the member id the app puts in each charge's metadata. */
export async function chargesOfMember(stripe: Stripe, memberId: number): Promise<Stripe.Charge[]> {
  const found: Stripe.Charge[] = [];
  for await (const charge of stripe.charges.list({ limit: 100 })) if (charge.metadata?.memberId === String(memberId)) found.push(charge);
  return found;
}
