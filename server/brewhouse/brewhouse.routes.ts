import { Router } from 'express';
import { Knex } from 'knex';
import { z } from 'zod';
import { BrewhouseSettings, DEFAULT_BREWHOUSE_SETTINGS } from '@shared/recipes';
import { recordAudit } from '../audit/audit-log';
import { requireRole, signedIn } from '../auth/route-access';
import { parseRequest } from '../http/parse-request';

const amount = (max: number, unit: string) => z.number('must be a number').min(0, 'must not be negative').max(max, `must be at most ${max} ${unit}`);

const settingsSchema = z.object({
  boilOffLitresPerHour: amount(100, 'L/h'),
  grainAbsorptionLitresPerKg: amount(5, 'L/kg'),
  kettleLossLitres: amount(200, 'L'),
  fermenterLossLitres: amount(200, 'L'),
  mashThicknessLitresPerKg: z.number('must be a number').min(1.5, 'must be at least 1.5 L/kg').max(8, 'must be at most 8 L/kg'),
  grainTemperatureC: z.number('must be a number').min(-10).max(45),
  mashTunHeatCapacityKjPerK: amount(100, 'kJ/K').nullable(),
});

/** Loads the co-op's settings, or the defaults until someone saves them. */
export async function loadBrewhouseSettings(db: Knex): Promise<BrewhouseSettings> {
  const row = await db('brewhouse_settings').where({ id: 1 }).first();
  return row ? { ...DEFAULT_BREWHOUSE_SETTINGS, ...(row.settings as BrewhouseSettings) } : DEFAULT_BREWHOUSE_SETTINGS;
}

/** /api/brewhouse: read by everyone, set by brewers and admins. */
export function createBrewhouseRouter(db: Knex): Router {
  const router = Router();

  router.get('/', signedIn, async (_req, res) => {
    res.json(await loadBrewhouseSettings(db));
  });

  router.put('/', requireRole('brewer', 'admin'), async (req, res) => {
    const settings = parseRequest(settingsSchema, req.body);
    await db('brewhouse_settings')
      .insert({ id: 1, settings: JSON.stringify(settings), updated_by_user_id: req.user!.id, updated_at: new Date() })
      .onConflict('id')
      .merge();
    await recordAudit(db, { actorUserId: req.user!.id, action: 'brewhouse-changed', subjectType: 'brewhouse', subjectId: 1 });
    res.json(settings);
  });

  return router;
}
