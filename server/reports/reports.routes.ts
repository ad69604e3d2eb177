import { Router } from 'express';
import { requireRole } from '../auth/route-access';
import { parseRequest } from '../http/parse-request';
import { productionReportCsv } from './production-report-csv';
import { productionRangeSchema } from './production-report.schemas';
import { ProductionReportService } from './production-report.service';

const admin = requireRole('admin');

/** /api/reports: the officers' reports. */
export function createReportsRouter(production: ProductionReportService): Router {
  const router = Router();
  const range = (query: unknown) => parseRequest(productionRangeSchema(production.thisMonth()), query);

  router.get('/production', admin, async (req, res) => {
    const { from, to } = range(req.query);
    res.json(await production.report(from, to));
  });

  router.get('/production.csv', admin, async (req, res) => {
    const { from, to } = range(req.query);
    res.type('text/csv').attachment(`production-${from}-to-${to}.csv`).send(productionReportCsv(await production.report(from, to)));
  });

  return router;
}
