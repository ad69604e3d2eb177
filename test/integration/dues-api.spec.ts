import { DateTime } from 'luxon';
import { DuesLedger, DuesOverview } from '@shared/dues';
import { freePort } from '../../scripts/setup/free-port';
import { ApiClient } from './helpers/api-client';
import { attemptKey, createPlan, paidThroughOf } from './helpers/dues-factory';
import { chargesOfMember, stripeFakeClient } from './helpers/stripe-fake-client';
import { createTestApp, useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

const today = () => DateTime.now().setZone(process.env.COOP_TIME_ZONE ?? 'Europe/Berlin').toISODate()!;
const plusMonthLessDay = (iso: string) => DateTime.fromISO(iso).plus({ months: 1 }).minus({ days: 1 }).toISODate();

describe('Dues API against the Stripe fake', () => {
  const t = useTestApp();

  const member = async () => {
    const user = await createUser(t.db, ['member']);
    return { user, client: await ApiClient.signedIn(t.app, user) };
  };
  const pay = (client: ApiClient, planId: number, cardToken = 'tok_visa', idempotencyKey = attemptKey(), saveCardForRenewal = false) =>
    client.send('post', '/api/dues/payments', { planId, cardToken, saveCardForRenewal, idempotencyKey });

  it('when a member pays with a good test card, then the charge is made, paid-through moves one period on and a receipt is queued', async () => {
    const plan = await createPlan(t.db);
    const { user, client } = await member();

    const res = await pay(client, plan.id);

    expect(res.status).toBe(201);
    const overview = res.body as DuesOverview;
    expect(overview.membership).toMatchObject({ paidThrough: plusMonthLessDay(today()), status: 'paid-up', planName: plan.name });
    expect(overview.payments).toEqual([expect.objectContaining({ amountCents: 1200, currency: 'EUR', method: 'card', status: 'succeeded' })]);
    const charges = await chargesOfMember(stripeFakeClient(), user.id);
    expect(charges.map((c) => [c.amount, c.currency, c.status])).toEqual([[1200, 'eur', 'succeeded']]);
    expect(await t.db('outbox_messages').where({ recipient: user.email, kind: 'dues-receipt' }).count({ n: '*' })).toEqual([{ n: 1 }]);
  });

  it('when dues are still running, then the next payment follows on from the paid-through date', async () => {
    const plan = await createPlan(t.db);
    const { user, client } = await member();
    await pay(client, plan.id);
    const first = await paidThroughOf(t.db, user.id);

    await pay(client, plan.id);

    expect(await paidThroughOf(t.db, user.id)).toBe(plusMonthLessDay(DateTime.fromISO(first!).plus({ days: 1 }).toISODate()!));
  });

  it.each(['tok_chargeDeclined', 'tok_chargeDeclinedInsufficientFunds'])('when the card %s is refused, then the answer says so and nothing changes', async (token) => {
    const plan = await createPlan(t.db);
    const { user, client } = await member();

    const res = await pay(client, plan.id, token);

    expect(res.status).toBe(402);
    expect(res.body.error.code).toBe('card-declined');
    expect(res.body.error.message).toMatch(/declined.*Nothing was charged/);
    expect(await paidThroughOf(t.db, user.id)).toBeNull();
    expect(await t.db('dues_payments').where({ user_id: user.id })).toEqual([]);
    expect(await t.db('outbox_messages').where({ recipient: user.email })).toEqual([]);
  });

  it('when the same payment request is sent again (and twice at once) with its idempotency key, then there is one charge and one payment', async () => {
    const plan = await createPlan(t.db);
    const { user, client } = await member();
    const key = attemptKey();

    const answers = await Promise.all([pay(client, plan.id, 'tok_visa', key), pay(client, plan.id, 'tok_visa', key)]);
    const retried = await pay(client, plan.id, 'tok_visa', key);

    expect([...answers, retried].map((r) => r.status)).toEqual([201, 201, 201]);
    expect(await t.db('dues_payments').where({ user_id: user.id }).count({ n: '*' })).toEqual([{ n: 1 }]);
    expect(await chargesOfMember(stripeFakeClient(), user.id)).toHaveLength(1);
    expect(await paidThroughOf(t.db, user.id)).toBe(plusMonthLessDay(today()));
  });

  it('when the renewal runs twice for one period (also from two app instances at once), then the saved card is charged once', async () => {
    const plan = await createPlan(t.db);
    const { user, client } = await member();
    await pay(client, plan.id, 'tok_visa', attemptKey(), true);
    // The period ends today: the renewal is due.
    await t.db('dues_memberships').where({ user_id: user.id }).update({ paid_through: today() });
    const second = createTestApp();

    await Promise.all([t.jobs.dues.runRenewals(), second.jobs.dues.runRenewals()]);
    await t.jobs.dues.runRenewals();
    second.close();
    await second.db.destroy();

    const renewals = await t.db('dues_payments').where({ user_id: user.id, kind: 'renewal' });
    expect(renewals).toHaveLength(1);
    expect(await chargesOfMember(stripeFakeClient(), user.id)).toHaveLength(2);
    expect(await paidThroughOf(t.db, user.id)).toBe(plusMonthLessDay(DateTime.fromISO(today()).plus({ days: 1 }).toISODate()!));
    expect(await t.db('outbox_messages').where({ recipient: user.email, kind: 'dues-renewal' }).count({ n: '*' })).toEqual([{ n: 1 }]);
  });

  it('when the saved card is refused at renewal, then nothing is paid, the paid-through date stays, renewal by card stops and the member is told why once', async () => {
    const plan = await createPlan(t.db);
    const { user } = await member();
    // tok_chargeCustomerFail: the fake's card that can be saved on a customer and is then refused at every charge.
    const customer = await stripeFakeClient().customers.create({ email: user.email, source: 'tok_chargeCustomerFail' });
    await t.db('dues_memberships').insert({ user_id: user.id, plan_id: plan.id, paid_through: today(), stripe_customer_id: customer.id, saved_card: 'Visa ending 0341', renew_by_card: true });

    await t.jobs.dues.runRenewals();
    await t.jobs.dues.runRenewals();

    expect(await t.db('dues_payments').where({ user_id: user.id })).toEqual([]);
    expect(await paidThroughOf(t.db, user.id)).toBe(today());
    expect(Boolean((await t.db('dues_memberships').where({ user_id: user.id }).first())!.renew_by_card)).toBe(false);
    const mails = await t.db('outbox_messages').where({ recipient: user.email, kind: 'dues-renewal' });
    expect(mails.map((m) => m.subject)).toEqual(['Your dues could not be renewed']);
    expect(mails[0].text_body).toContain('Nothing was charged');
    expect((await chargesOfMember(stripeFakeClient(), user.id)).filter((c) => c.status === 'succeeded')).toEqual([]);
  });

  it('when an admin refunds a card payment, then the ledger shows it refunded and the paid-through date steps back', async () => {
    const plan = await createPlan(t.db);
    const { user, client } = await member();
    await pay(client, plan.id);
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));
    const paymentId = (await t.db('dues_payments').where({ user_id: user.id }).first())!.id;

    const res = await admin.send('post', `/api/dues/payments/${paymentId}/refund`);

    expect(res.status).toBe(200);
    const ledger = res.body as DuesLedger;
    expect(ledger.payments.find((p) => p.id === paymentId)).toMatchObject({ status: 'refunded', refundedAt: expect.any(String) });
    expect(ledger.members.find((m) => m.userId === user.id)).toMatchObject({ paidThrough: null, status: 'overdue' });
    const [charge] = await chargesOfMember(stripeFakeClient(), user.id);
    expect(charge.amount_refunded).toBe(1200);
    expect((await admin.send('post', `/api/dues/payments/${paymentId}/refund`)).status).toBe(409);
  });

  it('when an admin records cash and exports the ledger, then the CSV lists it and neutralises formula-like cells', async () => {
    const plan = await createPlan(t.db);
    const user = await createUser(t.db, ['member'], { name: '=HYPERLINK("http://x.example")' });
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));

    const res = await admin.send('post', '/api/dues/cash-payments', { userId: user.id, planId: plan.id, idempotencyKey: attemptKey(), note: 'paid at the meeting' });
    const csv = await admin.get('/api/dues/ledger.csv');

    expect(res.status).toBe(201);
    expect(await paidThroughOf(t.db, user.id)).toBe(plusMonthLessDay(today()));
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const line = csv.text.split('\n').find((l) => l.includes(user.email))!;
    expect(line).toContain(`"'=HYPERLINK(""http://x.example"")"`);
    expect(line).toContain('12.00,EUR,cash,payment,succeeded');
  });

  it('when the payment request is malformed or carries a card number, then it answers 400 naming the fields', async () => {
    const { client } = await member();

    const res = await client.send('post', '/api/dues/payments', { planId: 'x', cardToken: '4242424242424242', saveCardForRenewal: 'yes', idempotencyKey: '1' });

    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['cardToken', 'idempotencyKey', 'planId', 'saveCardForRenewal']);
  });

  it('when an admin adds a plan, then members are offered it; a duplicate name is refused', async () => {
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));
    const name = `Family ${attemptKey().slice(0, 6)}`;

    const created = await admin.send('post', '/api/dues/plans', { name, amountCents: 3000, currency: 'EUR', period: 'year' });
    const again = await admin.send('post', '/api/dues/plans', { name, amountCents: 3000, currency: 'EUR', period: 'year' });
    const { client } = await member();

    expect(created.status).toBe(201);
    expect(again.status).toBe(409);
    expect(((await client.get('/api/dues/me')).body as DuesOverview).plans.map((p) => p.name)).toContain(name);
  });

  it('when the Stripe fake cannot be reached, then paying answers 503 with a message and leaves no record behind', async () => {
    const plan = await createPlan(t.db);
    const down = createTestApp({ env: { STRIPE_API_PORT: String(await freePort()) } });
    const user = await createUser(down.db, ['member']);
    const client = await ApiClient.signedIn(down.app, user);

    const res = await pay(client, plan.id);
    down.close();
    await down.db.destroy();

    expect(res.status).toBe(503);
    expect(res.body.error.message).toMatch(/not reachable.*nothing was charged/i);
    expect(await t.db('dues_payments').where({ user_id: user.id })).toEqual([]);
    expect(await t.db('dues_memberships').where({ user_id: user.id })).toEqual([]);
    expect(await t.db('outbox_messages').where({ recipient: user.email })).toEqual([]);
  });
});
