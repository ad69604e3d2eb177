import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { batchBill, BillLine, DrawableLot, DrawLineView, DrawPlanLine, DrawPreview, hasShortfall, planDraw, roundQuantity, StockDraw } from '@shared/stock';
import { recordAudit } from '../audit/audit-log.repository';
import { AppError } from '../errors/app-error';
import { StockLotRow } from '../db';
import { calendarDay } from '../kit/kit.repository';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { BillSource, stockBillsRepository } from './stock-bills.repository';
import { stockLotsRepository } from './stock-lots.repository';

const DRAWING_STATUSES = ['planned', 'brewing'];
const batchNotFound = () => new AppError('batch-not-found', 'There is no batch with this id.', 404);

/** Why this batch cannot draw its bill now, or null. */
function blockedReason(source: BillSource, drawn: StockDraw | null): string | null {
  if (drawn) return `The bill was drawn on ${drawn.createdAt.slice(0, 10)} by ${drawn.byName}.`;
  if (source.recipeVersionId === null || source.versionVolumeLitres === null) return 'This batch has no recipe version, so it has no bill to draw.';
  if (!DRAWING_STATUSES.includes(source.status)) return 'Only a planned or brewing batch draws its bill from stock.';
  return null;
}

const toDrawable = (row: StockLotRow): DrawableLot => ({
  id: row.id, ingredientId: row.ingredient_id, unit: row.unit, onHand: Number(row.quantity_on_hand), bestBefore: calendarDay(row.best_before), receivedOn: calendarDay(row.received_on)!,
});

/** Drawing a batch's bill from stock: first-expiring first, shortfalls shown and only drawn past when accepted. */
export function createStockDrawService(db: Knex) {
  async function billOf(trx: Knex, source: BillSource): Promise<BillLine[]> {
    if (source.recipeVersionId === null || source.versionVolumeLitres === null) return [];
    const items = await stockBillsRepository.versionItems(trx, [source.recipeVersionId]);
    return batchBill(items.get(source.recipeVersionId)!, source.versionVolumeLitres, source.batchVolumeLitres);
  }

  async function describe(plan: DrawPlanLine[], lots: DrawableLot[]): Promise<DrawLineView[]> {
    const names = await stockBillsRepository.ingredientNames(db, plan.map((line) => line.ingredientId));
    const bestBefore = new Map(lots.map((lot) => [lot.id, lot.bestBefore]));
    return plan.map((line) => ({
      ...line,
      ingredientName: names.get(line.ingredientId)?.name ?? '',
      ingredientKind: names.get(line.ingredientId)?.kind ?? 'others',
      takes: line.takes.map((take) => ({ ...take, bestBefore: bestBefore.get(take.lotId) ?? null })),
    }));
  }

  return {
    /** What a draw would take now (nothing is locked or written). */
    async preview(batchId: number): Promise<DrawPreview> {
      const source = await stockBillsRepository.batch(db, batchId);
      if (!source) throw batchNotFound();
      const drawn = await stockBillsRepository.drawOf(db, batchId);
      const bill = await billOf(db, source);
      const lots = (await stockLotsRepository.drawable(db, bill.map((line) => line.ingredientId), false)).map(toDrawable);
      return { batchId, batchName: source.name, blockedReason: blockedReason(source, drawn), lines: await describe(planDraw(bill, lots), lots), drawn };
    },

    /**
     * Takes the bill from stock under row locks on the batch and every lot of its ingredients, so two
     * draws of the same last lot run one after the other and the second sees it empty. A shortfall
     * is refused (409 with the lines) unless the person accepted it; then it is recorded on the draw.
     */
    async draw(user: SessionUser, batchId: number, acceptShortfall: boolean): Promise<StockDraw> {
      await transactionWithRetry(db, async (trx) => {
        const source = await stockBillsRepository.batch(trx, batchId, true);
        if (!source) throw batchNotFound();
        const blocked = blockedReason(source, await stockBillsRepository.drawOf(trx, batchId));
        if (blocked) throw new AppError('stock-draw-blocked', blocked, 409);
        const bill = await billOf(trx, source);
        const lots = (await stockLotsRepository.drawable(trx, bill.map((line) => line.ingredientId), true)).map(toDrawable);
        const plan = planDraw(bill, lots);
        if (hasShortfall(plan) && !acceptShortfall) {
          const lines = await describe(plan, lots);
          const short = lines.filter((line) => line.shortfall > 0).map((line) => line.ingredientName).join(', ');
          throw new AppError('stock-shortfall', `Stock is short of ${short}. Draw what there is and record the shortfall, or receive more first.`, 409, undefined, undefined, { lines });
        }
        const drawId = await stockBillsRepository.insertDraw(trx, batchId, user.id, hasShortfall(plan), plan.map((line) => ({ ...line, needed: line.amount })));
        const onHand = new Map(lots.map((lot) => [lot.id, lot.onHand]));
        for (const take of plan.flatMap((line) => line.takes)) {
          const after = roundQuantity(onHand.get(take.lotId)! - take.quantity);
          if (after < 0) throw new Error(`Draw plan took more than lot ${take.lotId} holds.`);
          onHand.set(take.lotId, after);
          await stockLotsRepository.recordMovement(trx, take.lotId, { kind: 'draw', change: -take.quantity, onHandAfter: after, drawId, userId: user.id });
        }
        await recordAudit(trx, {
          actorUserId: user.id, action: 'stock-drawn', subjectType: 'batch', subjectId: batchId,
          detail: { drawId, shortfallAccepted: hasShortfall(plan), lines: plan.map(({ ingredientId, unit, amount, drawn, shortfall, takes }) => ({ ingredientId, unit, amount, drawn, shortfall, takes })) },
        });
      });
      return (await stockBillsRepository.drawOf(db, batchId))!;
    },
  };
}

export type StockDrawService = ReturnType<typeof createStockDrawService>;
