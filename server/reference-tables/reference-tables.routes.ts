import { Router } from 'express';
import { z } from 'zod';
import { DENSITY_TABLE_LIMITS as L } from '@shared/reference-tables';
import { requireRole, signedIn } from '../auth/route-access';
import { AppError } from '../errors/app-error';
import { parseId, parseRequest } from '../http/parse-request';
import { ReferenceTablesService } from './reference-tables.service';
import { tableUpload } from './table-upload';

const uploadSchema = z.object({
  name: z.string('is required').trim().min(1, 'is required').max(L.nameMax, `must be at most ${L.nameMax} characters`),
  resolution: z.coerce.number('must be a number').min(L.resolution.min, `must be at least ${L.resolution.min} kg/m³`).max(L.resolution.max, `must be at most ${L.resolution.max} kg/m³`),
});
const correctionSchema = z.object({
  density: z.number('must be a number').min(L.density.min, `must be at least ${L.density.min} kg/m³`).max(L.density.max, `must be at most ${L.density.max} kg/m³`),
  note: z.string('must be text').trim().max(L.noteMax, `must be at most ${L.noteMax} characters`).default(''),
});
const choiceSchema = z.object({ tableId: z.number('must be a table id or null').int().positive().nullable() });

/** /api/reference-tables: read by everyone signed in; uploaded, corrected and chosen by brewers. */
export function createReferenceTablesRouter(tables: ReferenceTablesService): Router {
  const router = Router();
  const brewers = requireRole('brewer');

  router.get('/', signedIn, async (_req, res) => {
    res.json(await tables.list());
  });

  router.post('/', brewers, tableUpload, async (req, res) => {
    const meta = parseRequest(uploadSchema, req.body);
    if (!req.file) throw new AppError('validation-failed', 'Please choose a CSV file.', 400, { file: 'is required' });
    res.status(201).json(await tables.upload(req.user!, meta, req.file.buffer.toString('utf8')));
  });

  router.put('/choice', brewers, async (req, res) => {
    const { tableId } = parseRequest(choiceSchema, req.body);
    res.json(await tables.chooseLabTable(req.user!, tableId));
  });

  router.get('/:tableId', signedIn, async (req, res) => {
    res.json(await tables.detail(parseId(req.params.tableId, 'tableId')));
  });

  router.put('/:tableId/rows/:rowId/correction', brewers, async (req, res) => {
    const correction = parseRequest(correctionSchema, req.body);
    res.json(await tables.correct(req.user!, parseId(req.params.tableId, 'tableId'), parseId(req.params.rowId, 'rowId'), correction));
  });

  return router;
}
