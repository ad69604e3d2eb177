import { z } from 'zod';
import { CARD_TOKEN_PATTERN, DUES_CURRENCIES, DUES_LIMITS, DUES_PERIODS } from '@shared/dues';

const id = (what: string) => z.number(`must be the id of ${what}`).int('must be a whole number').positive('must be positive');
const idempotencyKey = z.string('must be text').regex(/^[A-Za-z0-9_-]{8,64}$/, 'must be 8 to 64 letters, digits, - or _');

export const payDuesSchema = z.object({
  planId: id('a plan'),
  cardToken: z.string('must be a card token').regex(CARD_TOKEN_PATTERN, 'must be a card token (tok_…), never a card number'),
  saveCardForRenewal: z.boolean('must be true or false'),
  idempotencyKey,
});

export const createPlanSchema = z.object({
  name: z.string('must be text').trim().min(1, 'is required').max(DUES_LIMITS.planNameMax, `must be at most ${DUES_LIMITS.planNameMax} characters`),
  amountCents: z
    .number('must be a number')
    .int('must be whole cents')
    .min(DUES_LIMITS.amountMinCents, `must be at least ${DUES_LIMITS.amountMinCents / 100}`)
    .max(DUES_LIMITS.amountMaxCents, `must be at most ${DUES_LIMITS.amountMaxCents / 100}`),
  currency: z.enum(DUES_CURRENCIES, `must be one of ${DUES_CURRENCIES.join(', ')}`),
  period: z.enum(DUES_PERIODS, 'must be month or year'),
});

export const planActiveSchema = z.object({ active: z.boolean('must be true or false') });

export const cashPaymentSchema = z.object({
  userId: id('a member'),
  planId: id('a plan'),
  idempotencyKey,
  note: z.string('must be text').max(DUES_LIMITS.cashNoteMax, `must be at most ${DUES_LIMITS.cashNoteMax} characters`).default(''),
});
