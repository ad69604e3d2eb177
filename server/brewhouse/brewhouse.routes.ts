import { Router } from 'express';
import { Knex } from 'knex';
import { z } from 'zod';
import { KETTLE_CAPACITY_MAX_LITRES } from '@shared/recipes';
import { recordAudit } from '../audit/audit-log';
import { requireRole, signedIn } from '../auth/route-access';
import { parseRequest } from '../http/parse-request';
import { brewhouseRepository } from './brewhouse.repository';

const amount = (max: number, unit: string) => z.number('must be a number').min(0, 'must not be negative').max(max, `must be at most ${max} ${unit}`);

const settingsSchema = z.object({
  boilOffLitresPerHour: amount(100, 'L/h'),
  grainAbsorptionLitresPerKg: amount(5, 'L/kg'),
  kettleLossLitres: amount(200, 'L'),
  fermenterLossLitres: amount(200, 'L'),
  mashThicknessLitresPerKg: z.number('must be a number').min(1.5, 'must be at least 1.5 L/kg').max(8, 'must be at most 8 L/kg'),
  grainTemperatureC: z.number('must be a number').min(-10).max(45),
  mashTunHeatCapacityKjPerK: amount(100, 'kJ/K').nullable(),
  kettleCapacityLitres: z
    .number('must be a number')
    .positive('must be more than 0')
    .max(KETTLE_CAPACITY_MAX_LITRES, `must be at most ${KETTLE_CAPACITY_MAX_LITRES} L`)
    .nullable()
    .default(null),
});

/** /api/brewhouse: read by everyone, set by brewers and admins. */
export function createBrewhouseRouter(db: Knex): Router {
  const router = Router();

  router.get('/', signedIn, async (_req, res) => {
    res.json(await brewhouseRepository.load(db));
  });

  router.put('/', requireRole('brewer', 'admin'), async (req, res) => {
    const settings = parseRequest(settingsSchema, req.body);
    await brewhouseRepository.save(db, settings, req.user!.id);
    await recordAudit(db, { actorUserId: req.user!.id, action: 'brewhouse-changed', subjectType: 'brewhouse', subjectId: 1 });
    res.json(settings);
  });

  return router;
}
