import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import {
  BatchStrengthCheck, batchStrengthFigures, DECLARED_STRENGTH_CAUTION, declaredStrengthVerdict, SignOffRequest, StrengthRecord,
} from '@shared/strength-check';
import { recordAudit } from '../audit/audit-log.repository';
import { batchNotFound } from '../batches/batch-access';
import { batchesRepository } from '../batches/batches.repository';
import { AppError } from '../errors/app-error';
import { ToleranceClassesService } from '../lab/tolerance-classes.service';
import { LatestLabResult } from '../lab/distillate-analyses.service';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { gravitiesUsed, readingsFingerprint } from './readings-used';
import { strengthCheckRepository as repo } from './strength-check.repository';

const METHOD = 'OG and FG as SG 20/20 °C; Balling\'s relations give real extract and alcohol by mass; % vol at 20 °C = ABW × beer density ÷ ethanol density (OIML R 22). '
  + 'Uncertainty from the instruments\' resolution (rectangular, GUM 4.3.7), propagated to first order, expanded with k = 2.';

/** The strength check of a batch, the brewer's sign-off and the printed record. */
export function createStrengthCheckService(db: Knex, toleranceClasses: ToleranceClassesService, latestLab: LatestLabResult) {
  async function working(batchId: number) {
    const batch = await batchesRepository.findById(db, batchId);
    if (!batch) throw batchNotFound();
    const readings = await repo.readings(db, batchId);
    const used = gravitiesUsed(batch, readings);
    const figures = used.og ? batchStrengthFigures(used.og, used.fg) : null;
    return { batch, used, figures, fingerprint: readingsFingerprint(batch, readings) };
  }

  async function toleranceClass(id: number) {
    const found = await toleranceClasses.find(id);
    if (!found || found.retired) throw new AppError('validation-failed', 'Please check these fields: toleranceClassId.', 400, { toleranceClassId: 'must be a product class in use' });
    return found;
  }

  return {
    async check(batchId: number, declared: { declaredPercentVolume?: number; toleranceClassId?: number }): Promise<BatchStrengthCheck> {
      const { batch, used, figures, fingerprint } = await working(batchId);
      const verdict = figures && declared.declaredPercentVolume !== undefined && declared.toleranceClassId !== undefined
        ? declaredStrengthVerdict(figures, declared.declaredPercentVolume, await toleranceClass(declared.toleranceClassId)) : null;
      const signOffs = (await repo.signOffs(db, batchId)).map((s) => ({
        id: s.id, declaredPercentVolume: s.record.verdict.declaredPercentVolume, verdict: s.record.verdict.verdict, signedBy: s.record.signedBy, signedAt: s.record.signedAt, stale: s.fingerprint !== fingerprint,
      }));
      return {
        batchId, batchName: batch.name, figures, missing: used.missing, readingsUsed: used.og ? [used.og, used.fg] : [], verdict,
        latestLab: await latestLab(batchId), signOffs, caution: DECLARED_STRENGTH_CAUTION,
      };
    },

    /** Signs the declared strength off as the working stands now; a figure outside the tolerance is refused. */
    async signOff(user: SessionUser, batchId: number, request: SignOffRequest): Promise<StrengthRecord> {
      const { batch, used, figures, fingerprint } = await working(batchId);
      if (!figures || !used.og) throw new AppError('strength-not-ready', used.missing ?? 'The strength cannot be worked out yet.', 409);
      const verdict = declaredStrengthVerdict(figures, request.declaredPercentVolume, await toleranceClass(request.toleranceClassId));
      if (verdict.verdict === 'outside') {
        throw new AppError('declared-outside-tolerance', `${request.declaredPercentVolume} % vol is outside ± ${verdict.tolerancePercentVolume} % vol of the measured strength; it cannot be signed off.`, 409);
      }
      const record: Omit<StrengthRecord, 'id' | 'stale'> = {
        batchId, batchName: batch.name, method: METHOD, readingsUsed: [used.og, used.fg], steps: figures.steps, densityBased: figures.densityBased,
        linearEstimate: figures.linearEstimate, nonLinearEstimate: figures.nonLinearEstimate, verdict, signedBy: user.name, signedAt: new Date().toISOString(), caution: DECLARED_STRENGTH_CAUTION,
      };
      const id = await transactionWithRetry(db, async (trx) => {
        const newId = await repo.insertSignOff(trx, { batchId, declared: request.declaredPercentVolume, toleranceClassId: request.toleranceClassId, verdict: verdict.verdict, record, fingerprint, userId: user.id });
        await recordAudit(trx, { actorUserId: user.id, action: 'strength-signed-off', subjectType: 'batch', subjectId: batchId, detail: { signOffId: newId, declared: request.declaredPercentVolume, verdict: verdict.verdict } });
        return newId;
      });
      return { ...record, id, stale: false };
    },

    async record(batchId: number, signOffId: number): Promise<StrengthRecord> {
      const stored = await repo.signOff(db, batchId, signOffId);
      if (!stored) throw new AppError('sign-off-not-found', 'This batch has no sign-off with this id.', 404);
      const { fingerprint } = await working(batchId);
      return { ...stored.record, id: stored.id, stale: stored.fingerprint !== fingerprint };
    },
  };
}

export type StrengthCheckService = ReturnType<typeof createStrengthCheckService>;
