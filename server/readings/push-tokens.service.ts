import { createHash, randomBytes } from 'node:crypto';
import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { IssuedPushToken, PushReadingsRequest, PushReadingsResult, PushTokenSummary } from '@shared/readings';
import { recordAudit } from '../audit/audit-log.repository';
import { assertMayEditBatch, batchNotFound } from '../batches/batch-access';
import { batchesRepository } from '../batches/batches.repository';
import { AppError } from '../errors/app-error';
import { BatchPushTokenRow } from '../db';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { createCorrector } from './reading-correction';
import { newReadingRow } from './reading-rows';
import { NewReadingRow, readingsRepository } from './readings.repository';
import { pushTokensRepository } from './push-tokens.repository';

/** SHA-256 of the token: tokens are long and random, so a fast hash is enough to keep them unreadable at rest. */
export function hashPushToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

function toSummary(row: BatchPushTokenRow): PushTokenSummary {
  return { id: row.id, label: row.label, createdAt: row.created_at.toISOString(), lastUsedAt: row.last_used_at?.toISOString() ?? null, revokedAt: row.revoked_at?.toISOString() ?? null };
}

const refused = () => new AppError('push-token-refused', 'The push token is unknown or revoked.', 401);

/** Per-batch tokens for gravity loggers, and the readings they push. */
export function createPushTokensService(db: Knex) {
  async function editableBatch(user: SessionUser, batchId: number) {
    const batch = await batchesRepository.findById(db, batchId);
    if (!batch) throw batchNotFound();
    assertMayEditBatch(user, batch);
    return batch;
  }

  return {
    async list(user: SessionUser, batchId: number): Promise<PushTokenSummary[]> {
      await editableBatch(user, batchId);
      return (await pushTokensRepository.list(db, batchId)).map(toSummary);
    },

    /** A new token, returned this once; only its hash is stored. */
    async create(user: SessionUser, batchId: number, label: string): Promise<IssuedPushToken> {
      await editableBatch(user, batchId);
      const token = `cwp_${randomBytes(32).toString('base64url')}`;
      const id = await transactionWithRetry(db, async (trx) => {
        const newId = await pushTokensRepository.insert(trx, { batch_id: batchId, label, token_hash: hashPushToken(token), created_by_user_id: user.id });
        await recordAudit(trx, { actorUserId: user.id, action: 'push-token-created', subjectType: 'batch', subjectId: batchId, detail: { tokenId: newId, label } });
        return newId;
      });
      return { ...toSummary((await pushTokensRepository.findById(db, id))!), token };
    },

    async revoke(user: SessionUser, batchId: number, tokenId: number): Promise<void> {
      await editableBatch(user, batchId);
      const row = await pushTokensRepository.findById(db, tokenId);
      if (!row || row.batch_id !== batchId) throw new AppError('push-token-not-found', 'This batch has no such push token.', 404);
      await transactionWithRetry(db, async (trx) => {
        await pushTokensRepository.revoke(trx, tokenId);
        await recordAudit(trx, { actorUserId: user.id, action: 'push-token-revoked', subjectType: 'batch', subjectId: batchId, detail: { tokenId } });
      });
    },

    /** The live token row for a token as sent, or 401. */
    async authenticate(token: string): Promise<BatchPushTokenRow> {
      const row = token ? await pushTokensRepository.findByHash(db, hashPushToken(token)) : undefined;
      if (!row || row.revoked_at) throw refused();
      return row;
    },

    /** Stores pushed readings as logger readings; a reading already stored for its device time is counted, not doubled. */
    async push(tokenRow: BatchPushTokenRow, request: PushReadingsRequest): Promise<PushReadingsResult> {
      const batch = await batchesRepository.findById(db, tokenRow.batch_id);
      if (!batch) throw refused();
      const correct = await createCorrector(db, batch);
      const rows: NewReadingRow[] = [];
      for (const r of request.readings) {
        const input = { measuredAt: r.deviceTime, instrument: 'logger' as const, rawValue: r.value, rawUnit: r.unit ?? 'sg', sampleTemperatureC: r.temperatureC ?? null, calibrationTemperatureC: null };
        rows.push(newReadingRow(batch.id, input, await correct(input, new Date(r.deviceTime)), { source: 'push', userId: null, pushTokenId: tokenRow.id }));
      }
      const stored = await transactionWithRetry(db, async (trx) => {
        const count = await readingsRepository.insertNew(trx, rows);
        await pushTokensRepository.touch(trx, tokenRow.id);
        await recordAudit(trx, { actorUserId: null, action: 'readings-pushed', subjectType: 'batch', subjectId: batch.id, detail: { tokenId: tokenRow.id, stored: count, sent: rows.length } });
        return count;
      });
      return { stored, alreadyPresent: rows.length - stored };
    },
  };
}

export type PushTokensService = ReturnType<typeof createPushTokensService>;
