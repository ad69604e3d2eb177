import { Router } from 'express';
import { addDays, STOCK_LIMITS } from '@shared/stock';
import { requireRole, signedIn } from '../auth/route-access';
import { coopToday } from '../dues/dues-clock';
import { parseId, parseRequest } from '../http/parse-request';
import { shoppingListFor } from './shopping-list.service';
import { shoppingListCsv } from './shopping-list-csv';
import { StockDrawService } from './stock-draw.service';
import { adjustLotSchema, drawSchema, horizonSchema, receiveLotSchema, reorderLevelSchema } from './stock.schemas';
import { StockService } from './stock.service';
import { Knex } from 'knex';

const keepers = requireRole('brewer', 'admin');

/** /api/stock: every member reads stock and the shopping list; brewers and admins keep stock and draw from it. */
export function createStockRouter(stock: StockService, draws: StockDrawService, db: Knex, coopTimeZone: string): Router {
  const router = Router();
  const lotId = (params: Record<string, unknown>) => parseId(params.lotId, 'lotId');
  const batchId = (params: Record<string, unknown>) => parseId(params.batchId, 'batchId');
  const horizon = (query: Record<string, unknown>) => {
    const from = typeof query.from === 'string' ? query.from : coopToday(new Date(), coopTimeZone);
    const to = typeof query.to === 'string' ? query.to : /^\d{4}-\d{2}-\d{2}$/.test(from) ? addDays(from, STOCK_LIMITS.horizonDefaultDays) : '';
    return parseRequest(horizonSchema, { from, to });
  };

  router.get('/lots', signedIn, async (_req, res) => {
    res.json(await stock.list());
  });

  router.post('/lots', keepers, async (req, res) => {
    res.status(201).json(await stock.receive(req.user!, parseRequest(receiveLotSchema, req.body)));
  });

  router.get('/lots/:lotId/movements', signedIn, async (req, res) => {
    res.json(await stock.movements(lotId(req.params)));
  });

  router.post('/lots/:lotId/adjustments', keepers, async (req, res) => {
    res.json(await stock.adjust(req.user!, lotId(req.params), parseRequest(adjustLotSchema, req.body)));
  });

  router.put('/reorder-levels/:ingredientId', keepers, async (req, res) => {
    await stock.setReorderLevel(req.user!, parseId(req.params.ingredientId, 'ingredientId'), parseRequest(reorderLevelSchema, req.body));
    res.status(204).end();
  });

  router.get('/alerts', keepers, async (_req, res) => {
    res.json(await stock.alerts());
  });

  router.get('/batches/:batchId/draw', signedIn, async (req, res) => {
    res.json(await draws.preview(batchId(req.params)));
  });

  router.post('/batches/:batchId/draw', keepers, async (req, res) => {
    const { acceptShortfall } = parseRequest(drawSchema, req.body);
    res.status(201).json(await draws.draw(req.user!, batchId(req.params), acceptShortfall));
  });

  router.get('/shopping-list', signedIn, async (req, res) => {
    const { from, to } = horizon(req.query);
    res.json(await shoppingListFor(db, from, to));
  });

  router.get('/shopping-list/export', signedIn, async (req, res) => {
    const { from, to } = horizon(req.query);
    res.type('text/csv').attachment(`shopping-list-${from}-to-${to}.csv`).send(shoppingListCsv(await shoppingListFor(db, from, to)));
  });

  return router;
}
