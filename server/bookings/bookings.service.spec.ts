import { Knex } from 'knex';
import { AppError } from '../errors/app-error';
import { createBookingsService } from './bookings.service';

describe('bookings service: assertMayBook', () => {
  const unusedDb = {} as Knex;

  it('lets everyone book while no dues standing is wired in', async () => {
    const service = createBookingsService({ db: unusedDb, coopTimeZone: 'Europe/Berlin' });

    await expect(service.assertMayBook(7)).resolves.toBeUndefined();
  });

  it('refuses with 403 dues-lapsed, saying why and how to pay, when dues have lapsed', async () => {
    const duesStanding = jest.fn(async () => ({ mayBook: false as const, reason: 'Your dues ran out on 1 December.', howToPay: 'Pay them on the Dues page.' }));
    const service = createBookingsService({ db: unusedDb, coopTimeZone: 'Europe/Berlin', duesStanding });

    const refusal = await service.assertMayBook(7).catch((error: unknown) => error);

    expect(duesStanding).toHaveBeenCalledWith(7);
    expect(refusal).toBeInstanceOf(AppError);
    expect(refusal).toMatchObject({ status: 403, code: 'dues-lapsed', message: 'Your dues ran out on 1 December. Pay them on the Dues page.' });
  });
});
