import { Router } from 'express';
import { requireRole, signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { ledgerCsv } from './dues-ledger-csv';
import { DuesLedgerService } from './dues-ledger.service';
import { DuesPaymentsService } from './dues-payments.service';
import { cashPaymentSchema, createPlanSchema, payDuesSchema, planActiveSchema } from './dues.schemas';

const admin = requireRole('admin');

/** /api/dues: a member's own dues and card payments; the ledger, plans, cash and refunds for admins. */
export function createDuesRouter(ledger: DuesLedgerService, payments: DuesPaymentsService): Router {
  const router = Router();

  router.get('/me', signedIn, async (req, res) => {
    res.json(await ledger.overview(req.user!.id));
  });

  router.post('/payments', signedIn, async (req, res) => {
    const request = parseRequest(payDuesSchema, req.body);
    await payments.payByCard(req.user!.id, request);
    res.status(201).json(await ledger.overview(req.user!.id));
  });

  router.delete('/me/renewal', signedIn, async (req, res) => {
    await ledger.stopRenewal(req.user!.id);
    res.json(await ledger.overview(req.user!.id));
  });

  router.get('/ledger', admin, async (_req, res) => {
    res.json(await ledger.ledger());
  });

  router.get('/ledger.csv', admin, async (_req, res) => {
    res.type('text/csv').attachment('dues-ledger.csv').send(ledgerCsv(await ledger.ledger()));
  });

  router.post('/plans', admin, async (req, res) => {
    await ledger.createPlan(req.user!.id, parseRequest(createPlanSchema, req.body));
    res.status(201).json(await ledger.ledger());
  });

  router.patch('/plans/:planId', admin, async (req, res) => {
    const planId = parseId(req.params.planId, 'planId');
    await ledger.setPlanActive(req.user!.id, planId, parseRequest(planActiveSchema, req.body).active);
    res.json(await ledger.ledger());
  });

  router.post('/cash-payments', admin, async (req, res) => {
    await payments.recordCash(req.user!.id, parseRequest(cashPaymentSchema, req.body));
    res.status(201).json(await ledger.ledger());
  });

  router.post('/payments/:paymentId/refund', admin, async (req, res) => {
    await payments.refund(req.user!.id, parseId(req.params.paymentId, 'paymentId'));
    res.json(await ledger.ledger());
  });

  return router;
}
