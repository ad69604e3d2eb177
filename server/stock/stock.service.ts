import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { AdjustLotRequest, ReceiveLotRequest, ReorderLevelRequest, roundQuantity, STOCK_LIMITS, STOCK_UNITS_BY_KIND, StockAlerts, stockAlerts, addDays, StockLot, StockMovement, StockUnit } from '@shared/stock';
import { recordAudit } from '../audit/audit-log.repository';
import { coopToday } from '../dues/dues-clock';
import { AppError } from '../errors/app-error';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { stockLevelsRepository } from './stock-levels.repository';
import { stockLotsRepository } from './stock-lots.repository';

const lotNotFound = () => new AppError('stock-lot-not-found', 'There is no stock lot with this id.', 404);
const invalid = (field: string, reason: string) => new AppError('validation-failed', `Please check these fields: ${field}.`, 400, { [field]: reason });

/** Lots, their movements, reorder levels and the alerts Today shows brewers. */
export function createStockService(db: Knex, coopTimeZone: string) {
  async function get(id: number): Promise<StockLot> {
    const lot = await stockLotsRepository.find(db, id);
    if (!lot) throw lotNotFound();
    return lot;
  }

  /** The ingredient must exist and be counted in a unit its kind allows (malt by mass, yeast by the pack). */
  async function assertUnit(ingredientId: number, unit: StockUnit): Promise<void> {
    const kind = await stockLotsRepository.ingredientKind(db, ingredientId);
    if (!kind) throw invalid('ingredientId', 'is not an ingredient of the catalogue');
    if (!STOCK_UNITS_BY_KIND[kind].includes(unit)) throw invalid('unit', `must be ${STOCK_UNITS_BY_KIND[kind].join(' or ')} for this ingredient`);
  }

  return {
    get,

    list(): Promise<StockLot[]> {
      return stockLotsRepository.list(db);
    },

    async receive(user: SessionUser, request: ReceiveLotRequest): Promise<StockLot> {
      await assertUnit(request.ingredientId, request.unit);
      const id = await transactionWithRetry(db, async (trx) => {
        const lotId = await stockLotsRepository.insert(trx, { ...request, userId: user.id });
        await recordAudit(trx, { actorUserId: user.id, action: 'stock-lot-received', subjectType: 'stock_lot', subjectId: lotId, detail: { ...request } });
        return lotId;
      });
      return get(id);
    },

    /** A hand change of one lot with its reason; refused (409) when it would take the lot below zero. */
    async adjust(user: SessionUser, lotId: number, request: AdjustLotRequest): Promise<StockLot> {
      await transactionWithRetry(db, async (trx) => {
        const lot = await stockLotsRepository.lock(trx, lotId);
        if (!lot) throw lotNotFound();
        const before = Number(lot.quantity_on_hand);
        const after = roundQuantity(request.reason === 'count' ? request.countedQuantity : before + request.change);
        if (after < 0) {
          throw new AppError('stock-below-zero', `The lot holds ${before} ${lot.unit}; this adjustment would take it below zero.`, 409, { change: `must not remove more than ${before} ${lot.unit}` });
        }
        const change = roundQuantity(after - before);
        if (change > STOCK_LIMITS.quantityMax || after > STOCK_LIMITS.quantityMax) throw invalid('change', `must keep the lot at most ${STOCK_LIMITS.quantityMax} ${lot.unit}`);
        await stockLotsRepository.recordMovement(trx, lotId, { kind: 'adjustment', change, onHandAfter: after, reason: request.reason, note: request.note, userId: user.id });
        await recordAudit(trx, { actorUserId: user.id, action: 'stock-lot-adjusted', subjectType: 'stock_lot', subjectId: lotId, detail: { reason: request.reason, note: request.note, before, change, after } });
      });
      return get(lotId);
    },

    async movements(lotId: number): Promise<StockMovement[]> {
      await get(lotId);
      return stockLotsRepository.movements(db, lotId);
    },

    async setReorderLevel(user: SessionUser, ingredientId: number, request: ReorderLevelRequest): Promise<void> {
      await assertUnit(ingredientId, request.unit);
      await transactionWithRetry(db, async (trx) => {
        await stockLevelsRepository.setReorderLevel(trx, ingredientId, request.unit, request.level);
        await recordAudit(trx, { actorUserId: user.id, action: 'stock-reorder-level-set', subjectType: 'ingredient', subjectId: ingredientId, detail: { ...request } });
      });
    },

    /** Low stock and lots near their best-before, as of today in the co-op's time zone. */
    async alerts(now = new Date()): Promise<StockAlerts> {
      const today = coopToday(now, coopTimeZone);
      const [levels, lots] = await Promise.all([
        stockLevelsRepository.levels(db),
        stockLevelsRepository.lotsBestBeforeBy(db, addDays(today, STOCK_LIMITS.bestBeforeWarningDays)),
      ]);
      return stockAlerts(levels, lots, today, STOCK_LIMITS.bestBeforeWarningDays);
    },
  };
}

export type StockService = ReturnType<typeof createStockService>;
