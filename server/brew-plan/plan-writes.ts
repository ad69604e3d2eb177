import { Knex } from 'knex';
import { DateTime } from 'luxon';
import { SessionUser } from '@shared/auth';
import { BOOKING_LIMITS } from '@shared/bookings';
import { AcceptSlotRequest, BrewSchedule, DEFAULT_SCHEDULES, heldEnd, MovePlannedBatchRequest, placeSchedule, PlannedBatch } from '@shared/brew-plan';
import { KitItem } from '@shared/kit';
import { recordAudit } from '../audit/audit-log.repository';
import { batchNotFound } from '../batches/batch-access';
import { dateOnly } from '../batches/batch-mapping';
import { batchesRepository } from '../batches/batches.repository';
import { assertItemFree, BookingNotices, BookingsService, bookingsRepository, bookingWritesRepository, HolderRelease, lockBookableItem } from '../bookings';
import { AppError } from '../errors/app-error';
import { predictVersion } from '../recipes/version-prediction';
import { RecipesService } from '../recipes';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { brewPlanRepository } from './brew-plan.repository';
import { holderRelease } from './holder-release';
import { plannedBrewer } from './plan-brewer';
import { assertScheduleFits } from './plan-schedule';

export interface BrewPlanWritesDeps {
  db: Knex;
  coopTimeZone: string;
  recipes: RecipesService;
  bookings: Pick<BookingsService, 'assertMayBook'>;
  notices?: Pick<BookingNotices, 'bookingMade'>;
  now?: () => Date;
}

const refuse = (field: string, reason: string) => new AppError('validation-failed', `Please check these fields: ${field}.`, 400, { [field]: reason });

/** The item must be a fermenter that holds the batch; checked under the item's lock. */
function assertFermenterHolds(item: KitItem, volumeLitres: number): void {
  if (item.kind !== 'fermenter') throw refuse('kitItemId', `${item.code} is not a fermenter`);
  if (item.capacityLitres === null || item.capacityLitres < volumeLitres) {
    throw refuse('kitItemId', `${item.code} holds ${item.capacityLitres ?? 0} L, less than the batch's ${volumeLitres} L`);
  }
}

/**
 * Accepting a slot and moving a planned batch: the batch, its schedule and its fermenter booking are
 * written in one transaction under the fermenter's row lock, by the kit room's own booking rule.
 */
export function createBrewPlanWrites({ db, coopTimeZone, recipes, bookings, notices, now = () => new Date() }: BrewPlanWritesDeps) {
  function placeInTime(brewDate: string, schedule: BrewSchedule) {
    const placed = placeSchedule(brewDate, schedule, coopTimeZone);
    const nowMs = now().getTime();
    if (placed.start < nowMs) throw refuse('brewDate', 'is in the past');
    if (placed.start > DateTime.fromMillis(nowMs).plus({ days: BOOKING_LIMITS.maxDaysAhead }).toMillis()) throw refuse('brewDate', `must be within ${BOOKING_LIMITS.maxDaysAhead} days from today`);
    return placed;
  }

  /** The plan books a held fermenter from its holder's expected release on, as it proposed it. */
  const releaseOn = (trx: Knex.Transaction, item: KitItem): HolderRelease => (holderId) => holderRelease(trx, item, holderId, coopTimeZone, now().getTime());

  async function planned(id: number): Promise<PlannedBatch> {
    const booking = (await brewPlanRepository.linkedBookings(db, [id])).get(id)!;
    const found = (await bookingsRepository.findById(db, booking.id))!;
    return { batchId: id, bookingId: found.id, kitItemId: found.kitItemId, kitItemCode: found.kitItemCode, brewDate: found.startLocal.slice(0, 10), startLocal: found.startLocal, endLocal: found.endLocal };
  }

  return {
    async accept(user: SessionUser, request: AcceptSlotRequest): Promise<PlannedBatch> {
      const schedule = { fermentationDays: request.fermentationDays, conditioningDays: request.conditioningDays };
      assertScheduleFits(schedule);
      const placed = placeInTime(request.brewDate, schedule);
      const version = await recipes.version(user, request.recipeId, request.recipeVersion);
      await bookings.assertMayBook(await plannedBrewer(db, user, request.brewerId));
      const batchId = await transactionWithRetry(db, async (trx) => {
        const brewerId = await plannedBrewer(trx, user, request.brewerId);
        const item = await lockBookableItem(trx, request.kitItemId, 'use');
        assertFermenterHolds(item, request.volumeLitres);
        const id = await batchesRepository.insert(trx, {
          name: request.name, brewer_user_id: brewerId, created_by_user_id: user.id, recipe_id: request.recipeId, recipe_version: request.recipeVersion,
          predicted: predictVersion(version), brew_date: new Date(`${request.brewDate}T00:00:00Z`), planned_volume_litres: request.volumeLitres,
          fermenter_kit_item_id: item.id, notes: '',
        });
        const until = new Date(heldEnd(placed, item.turnaroundHours));
        await assertItemFree(trx, item, new Date(placed.start), until, { batchId: id, holderRelease: releaseOn(trx, item) });
        await brewPlanRepository.saveSchedule(trx, id, schedule);
        const bookingId = await bookingWritesRepository.insert(trx, {
          kitItemId: item.id, userId: brewerId, createdByUserId: user.id, purpose: 'use', startsAt: new Date(placed.start), endsAt: new Date(placed.end),
          heldUntil: until, timeZone: coopTimeZone, note: `Brew plan: ${request.name}`, batchId: id,
        });
        await recordAudit(trx, { actorUserId: user.id, action: 'batch-planned', subjectType: 'batch', subjectId: id, detail: { ...schedule, brewerUserId: brewerId, kitItemId: item.id, brewDate: request.brewDate, bookingId, recipeId: request.recipeId, recipeVersion: request.recipeVersion } });
        await notices?.bookingMade(trx, bookingId);
        return id;
      });
      return planned(batchId);
    },

    /** Moves a batch still planned to another brew date (and fermenter); every rule is checked again. */
    async move(user: SessionUser, batchId: number, request: MovePlannedBatchRequest): Promise<PlannedBatch> {
      await transactionWithRetry(db, async (trx) => {
        const batch = await batchesRepository.lock(trx, batchId);
        if (!batch) throw batchNotFound();
        if (batch.status !== 'planned') throw new AppError('batch-not-planned', `Only a planned batch can be moved on the plan; this one is ${batch.status}.`, 409);
        const targetId = request.kitItemId ?? batch.fermenter_kit_item_id;
        if (targetId === null) throw refuse('kitItemId', 'must name a fermenter: the batch has none');
        const schedule = (await brewPlanRepository.schedulesOf(trx, [batchId])).get(batchId) ?? DEFAULT_SCHEDULES.ale;
        const placed = placeInTime(request.brewDate, schedule);
        const booking = (await brewPlanRepository.linkedBookings(trx, [batchId])).get(batchId) ?? null;
        const item = await lockBookableItem(trx, targetId, 'use');
        assertFermenterHolds(item, Number(batch.planned_volume_litres));
        const until = new Date(heldEnd(placed, item.turnaroundHours));
        await assertItemFree(trx, item, new Date(placed.start), until, { exceptBookingId: booking?.id, batchId, holderRelease: releaseOn(trx, item) });
        const times = { kitItemId: item.id, startsAt: new Date(placed.start), endsAt: new Date(placed.end), heldUntil: until, timeZone: coopTimeZone };
        if (booking) await bookingWritesRepository.reassign(trx, booking.id, times);
        else await bookingWritesRepository.insert(trx, { ...times, userId: batch.brewer_user_id, createdByUserId: user.id, purpose: 'use', note: `Brew plan: ${batch.name}`, batchId });
        await brewPlanRepository.saveSchedule(trx, batchId, schedule);
        await batchesRepository.update(trx, batchId, { brew_date: new Date(`${request.brewDate}T00:00:00Z`), fermenter_kit_item_id: item.id });
        await recordAudit(trx, { actorUserId: user.id, action: 'batch-plan-moved', subjectType: 'batch', subjectId: batchId, detail: { from: dateOnly(batch.brew_date), to: request.brewDate, kitItemId: item.id } });
      });
      return planned(batchId);
    },
  };
}

export type BrewPlanWrites = ReturnType<typeof createBrewPlanWrites>;
