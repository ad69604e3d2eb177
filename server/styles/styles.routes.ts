import { Router } from 'express';
import { Knex } from 'knex';
import { z } from 'zod';
import { StyleTarget, StyleTargetInput } from '@shared/recipes';
import { recordAudit } from '../audit/audit-log';
import { requireRole, signedIn } from '../auth/route-access';
import { AppError } from '../errors/app-error';
import { parseId, parseRequest } from '../http/parse-request';

const TARGETS = ['og', 'fg', 'abv', 'ibu', 'colourSrm'] as const;
const COLUMN: Record<(typeof TARGETS)[number], string> = { og: 'og', fg: 'fg', abv: 'abv', ibu: 'ibu', colourSrm: 'colour_srm' };

const range = (min: number, max: number) =>
  z
    .object({ min: z.number('must be a number').min(min).max(max), max: z.number('must be a number').min(min).max(max) })
    .refine((r) => r.min <= r.max, { message: 'min must not exceed max', path: ['max'] });

const styleSchema = z.object({
  name: z.string('must be text').trim().min(1, 'must not be empty').max(100),
  og: range(1, 1.2),
  fg: range(0.98, 1.1),
  abv: range(0, 20),
  ibu: range(0, 150),
  colourSrm: range(0, 80),
});

function toStyle(row: Record<string, unknown>): StyleTarget {
  const style = { id: row.id as number, name: row.name as string } as StyleTarget;
  for (const t of TARGETS) style[t] = { min: row[`${COLUMN[t]}_min`] as number, max: row[`${COLUMN[t]}_max`] as number };
  return style;
}

function toRow(input: StyleTargetInput): Record<string, unknown> {
  const row: Record<string, unknown> = { name: input.name };
  for (const t of TARGETS) Object.assign(row, { [`${COLUMN[t]}_min`]: input[t].min, [`${COLUMN[t]}_max`]: input[t].max });
  return row;
}

async function saveOrConflict(work: () => Promise<unknown>): Promise<void> {
  try {
    await work();
  } catch (error) {
    if ((error as { code?: string }).code === 'ER_DUP_ENTRY') throw new AppError('name-taken', 'A style with this name exists.', 409, { name: 'is already used' });
    throw error;
  }
}

/** /api/styles: the co-op's own style list; brewers and admins keep it. */
export function createStylesRouter(db: Knex): Router {
  const router = Router();
  const find = async (id: number) => toStyle(await db('style_targets').where({ id }).first());

  router.get('/', signedIn, async (_req, res) => {
    res.json((await db('style_targets').orderBy('name')).map(toStyle));
  });

  router.post('/', requireRole('brewer', 'admin'), async (req, res) => {
    const input = parseRequest(styleSchema, req.body);
    let id = 0;
    await saveOrConflict(async () => ([id] = await db('style_targets').insert(toRow(input))));
    await recordAudit(db, { actorUserId: req.user!.id, action: 'style-added', subjectType: 'style_target', subjectId: id });
    res.status(201).json(await find(id));
  });

  router.put('/:styleId', requireRole('brewer', 'admin'), async (req, res) => {
    const id = parseId(req.params.styleId, 'styleId');
    const input = parseRequest(styleSchema, req.body);
    if (!(await db('style_targets').where({ id }).first('id'))) throw new AppError('style-not-found', 'No style has this id.', 404);
    await saveOrConflict(() => db('style_targets').where({ id }).update({ ...toRow(input), updated_at: new Date() }));
    await recordAudit(db, { actorUserId: req.user!.id, action: 'style-changed', subjectType: 'style_target', subjectId: id });
    res.json(await find(id));
  });

  return router;
}
